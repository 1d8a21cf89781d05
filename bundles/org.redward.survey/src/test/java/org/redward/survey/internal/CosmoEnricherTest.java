package org.redward.survey.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.frames.Frame;
import org.redward.api.survey.MeasuredRow;
import org.redward.cosmology.internal.Calculator;
import org.redward.cosmology.internal.Planck2018Set;

/** Distances and velocities of a catalogue row, through the platform's cosmology calculator. */
class CosmoEnricherTest {

    private static final Cosmology PLANCK = new Calculator().of(new Planck2018Set().parameters());

    private static MeasuredRow enrich(CosmoEnricher e, double z, double err) {
        MeasuredRow.Builder b = MeasuredRow.builder().id("OBJ-1").z(z, err);
        e.enrich(Synthetic.spectrum(1), z, err, b);
        return b.build();
    }

    @Test
    void distancesObeyTheDistanceDualityAndCarryErrors() {
        CosmoEnricher e = new CosmoEnricher(PLANCK, "planck2018", Optional.empty(), Optional.empty(), "");
        MeasuredRow r = enrich(e, 0.5, 0.0002);
        double dl = r.derived("luminosity_mpc");
        double da = r.derived("angular_diameter_mpc");
        // Etherington's distance-duality relation: D_L = (1 + z)^2 D_A (holds in any FLRW metric)
        assertEquals(dl, 1.5 * 1.5 * da, 1e-9 * dl);
        // distance modulus: mu = 5 log10(D_L / 10 pc) (definition)
        assertEquals(5 * Math.log10(dl * 1e6 / 10), r.derived("distance_modulus_mag"), 1e-9);
        assertEquals(PLANCK.distances(0.5).comovingMpc(), r.derived("comoving_mpc"), 0.0, "same numbers as the cosmology service");
        assertTrue(r.derived("luminosity_err_mpc") > 0);
        // cz with c = 299792.458 km/s (exact)
        assertEquals(0.5 * 299792.458, r.derived("cz_km_s"), 1e-9);
        List<String> names = e.columns().stream().map(c -> c.name()).toList();
        for (String k : r.derived().keySet()) {
            assertTrue(names.contains(k), k + " is a declared column");
        }
        assertTrue(r.warnings().stream().anyMatch(w -> w.toLowerCase(java.util.Locale.ROOT).contains("hubble")),
                "at z = 0.5 the Hubble law misleads, and the row says so: " + r.warnings());
    }

    @Test
    void aMissingFrameServiceOrABlueshiftIsSaidNotHidden() {
        CosmoEnricher e = new CosmoEnricher(PLANCK, "planck2018", Optional.empty(), Optional.of(Frame.CMB), "cmb");
        MeasuredRow r = enrich(e, 0.1, 0.0001);
        assertTrue(Double.isNaN(r.derived("z_cmb")));
        assertTrue(r.warnings().get(0).startsWith("no cmb correction"), r.warnings().toString());
        MeasuredRow blue = enrich(new CosmoEnricher(PLANCK, "planck2018", Optional.empty(), Optional.empty(), ""), -0.001, 0.0001);
        assertTrue(Double.isNaN(blue.derived("luminosity_mpc")));
        assertTrue(blue.warnings().get(0).startsWith("no distances"), blue.warnings().toString());
    }
}
