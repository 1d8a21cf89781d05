package org.redward.mock.internal;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.catalog.CatalogWriterRegistry;
import org.redward.api.catalog.Column;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.cosmology.CosmologySet;
import org.redward.api.cosmology.Distances;
import org.redward.api.frames.Frame;
import org.redward.api.frames.FrameCorrection;
import org.redward.api.frames.FrameCorrector;
import org.redward.api.frames.FrameRequest;
import org.redward.api.frames.FrameStep;
import org.redward.api.redshift.Alternative;
import org.redward.api.registry.Provided;
import org.redward.spectrum.ObjectClass;

/**
 * The demo's steps after measuring: frame corrections, distances, the catalogue. Each returns
 * the step as reported; a missing service makes the step "not available" and leaves the rows as
 * they were. Stateless apart from the cautions it adds.
 */
final class DemoSteps {

    /** The cosmology of the demo's distances. */
    static final String COSMOLOGY = "planck2018";

    private final List<String> cautions;

    DemoSteps(List<String> cautions) {
        this.cautions = cautions;
    }

    /**
     * Barycentric and CMB-frame redshifts of every measured row (one correction to the CMB frame,
     * whose first step is the barycentric one), and a cross-check of the barycentric step against
     * the velocity the generator applied (computed independently, see {@link ObserverMotion}).
     */
    DemoRun.Step frames(FrameCorrector corrector, List<Row> rows) {
        if (corrector == null) {
            return new DemoRun.Step("frame corrections", "not available", "no frame-correction service installed", 0);
        }
        long t = System.nanoTime();
        Map<String, Integer> notes = new TreeMap<>();
        FrameRequest cmb = FrameRequest.of(Frame.TOPOCENTRIC, Frame.CMB);
        int done = 0;
        double worst = 0;
        int compared = 0;
        for (Row r : rows) {
            if (!r.measured || r.metadata == null) {
                continue;
            }
            FrameCorrection c = corrector.correct(r.z, r.metadata, cmb);
            r.zCmb = c.reached() == Frame.CMB ? c.z() : Double.NaN;
            for (FrameStep s : c.steps()) {
                if (s.to() == Frame.BARYCENTRIC) {
                    r.zBary = (1 + r.z) * s.factor() - 1;
                    if (r.truth != null && r.truth.kind().hasRedshift()) {
                        worst = Math.max(worst, Math.abs(s.projectedVelocityKmPerS() - r.truth.vBaryKmPerS()));
                        compared++;
                    }
                }
            }
            for (String n : c.notes()) {
                notes.merge(n, 1, Integer::sum);
            }
            done++;
        }
        for (Map.Entry<String, Integer> e : notes.entrySet()) {
            cautions.add(e.getValue() + " spectra, frames: " + e.getKey());
        }
        String check = compared == 0 ? "" : String.format(Locale.ROOT,
                "; barycentric velocities agree with the generator's to %.2f km/s at worst", worst);
        return new DemoRun.Step("frame corrections", "done", done + " redshifts to the barycentric and CMB frames" + check,
                DemoRun.secs(t));
    }

    /** Distances of galaxies and quasars under planck2018, from the CMB-frame redshift. */
    DemoRun.Step distances(CosmologyRegistry registry, CosmologyCalculator calculator, List<Row> rows) {
        if (registry == null || calculator == null) {
            return new DemoRun.Step("distances", "not available", "no cosmology service installed", 0);
        }
        Optional<Provided<CosmologySet>> set = registry.find(COSMOLOGY);
        if (set.isEmpty()) {
            return new DemoRun.Step("distances", "not available", "cosmology " + COSMOLOGY + " is not installed", 0);
        }
        long t = System.nanoTime();
        Cosmology cosmo = calculator.of(set.get().service().parameters());
        Map<String, Integer> warnings = new TreeMap<>();
        int n = 0;
        for (Row r : rows) {
            if (!r.measured || r.objectClass == ObjectClass.STAR) {
                continue;
            }
            double z = Double.isFinite(r.zCmb) ? r.zCmb : r.z;
            if (!(z > 0) || z > Cosmology.MAX_REDSHIFT) {
                continue;
            }
            Distances d = cosmo.distances(z);
            r.comovingMpc = d.comovingMpc();
            r.luminosityMpc = d.luminosityMpc();
            r.angularDiameterMpc = d.angularDiameterMpc();
            r.distanceModulusMag = d.distanceModulusMag();
            r.lookbackGyr = d.lookbackGyr();
            r.hubbleLawMpc = d.hubbleLawMpc();
            for (String w : d.warnings()) {
                warnings.merge(w.replaceAll("[-+]?\\d+(\\.\\d+)?", "#"), 1, Integer::sum);
            }
            n++;
        }
        if (!warnings.isEmpty()) {
            long far = rows.stream().filter(r -> Double.isFinite(r.hubbleLawMpc) && Math.abs(r.hubbleLawMpc - r.comovingMpc)
                    > Cosmology.HUBBLE_LAW_WARNING * r.comovingMpc).count();
            cautions.add(far + " objects are at redshifts where the Hubble law v = H0 d misleads by more than "
                    + Math.round(100 * Cosmology.HUBBLE_LAW_WARNING) + "%: use the " + COSMOLOGY
                    + " distances of the catalogue, not hubble_law_mpc");
        }
        cautions.add("stars have no cosmological distance: their redshift is a radial velocity in the Galaxy");
        return new DemoRun.Step("distances", "done", n + " galaxies and quasars under " + COSMOLOGY + " (H0 = "
                + set.get().service().parameters().h0() + "), from the CMB-frame z", DemoRun.secs(t));
    }

    /** The catalogue in FITS, VOTable and CSV through the installed catalogue writers. */
    DemoRun.Step catalogue(CatalogWriterRegistry writers, List<Row> rows, Path folder, Map<String, String> provenance) {
        if (writers == null) {
            return new DemoRun.Step("catalogue", "not available", "no catalogue writers installed", 0);
        }
        long t = System.nanoTime();
        Catalog cat = Catalog.of("Redward demo catalogue: the invented Ember survey", provenance, List.of(table(rows)));
        List<String> written = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        for (String name : List.of("catalogue.fits", "catalogue.vot", "catalogue.csv")) {
            Path file = folder.resolve(name);
            Optional<Provided<CatalogWriter>> w = writers.forFile(file);
            if (w.isEmpty()) {
                missing.add(name.substring(name.indexOf('.') + 1));
                continue;
            }
            Path tmp = folder.resolve(".tmp-" + name);
            try {
                w.get().service().write(cat, tmp);
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
                written.add(name);
            } catch (IOException | UncheckedIOException e) {
                missing.add(name + " (" + e.getMessage() + ")");
            }
        }
        String detail = String.join(", ", written) + (missing.isEmpty() ? "" : "; not written: " + String.join(", ", missing));
        return new DemoRun.Step("catalogue", written.isEmpty() ? "not available" : "done", detail, DemoRun.secs(t));
    }

    static CatalogTable table(List<Row> rows) {
        List<Column> cols = List.of(
                Column.ofString("source", "meta.file", "file the spectrum was read from"),
                Column.ofInt("index", "meta.number", "0-based index of the spectrum in its file"),
                Column.ofString("id", "meta.id", "object identifier"),
                Column.ofString("status", "meta.code.status", "ok or failed"),
                Column.ofString("error", "meta.note", "why no redshift was measured"),
                Column.ofDouble("z", "", "src.redshift", "redshift as observed at the telescope (topocentric)"),
                Column.ofDouble("z_err", "", "stat.error;src.redshift", "1-sigma error of z"),
                Column.ofString("class", "src.class", "galaxy, quasar, star or unknown"),
                Column.ofString("grade", "meta.code.qual", "confidence grade of the estimator"),
                Column.ofString("estimator", "meta.software", "estimator id"),
                Column.ofString("alternatives", "src.redshift", "runner-up redshifts: z:score, best first"),
                Column.ofDouble("ra_deg", "deg", "pos.eq.ra", "fibre right ascension, ICRS"),
                Column.ofDouble("dec_deg", "deg", "pos.eq.dec", "fibre declination, ICRS"),
                Column.ofDouble("z_bary", "", "src.redshift", "redshift in the solar-system barycentric frame"),
                Column.ofDouble("z_cmb", "", "src.redshift", "redshift in the CMB frame"),
                Column.ofDouble("comoving_mpc", "Mpc", "pos.distance", "line-of-sight comoving distance, planck2018"),
                Column.ofDouble("luminosity_mpc", "Mpc", "pos.distance", "luminosity distance, planck2018"),
                Column.ofDouble("angular_diameter_mpc", "Mpc", "pos.distance", "angular-diameter distance, planck2018"),
                Column.ofDouble("distance_modulus_mag", "mag", "phot.mag.distMod", "distance modulus, planck2018"),
                Column.ofDouble("lookback_gyr", "Gyr", "time.age", "lookback time, planck2018"),
                Column.ofDouble("hubble_law_mpc", "Mpc", "pos.distance", "c z / H0: misleading beyond z of a few hundredths"),
                Column.ofString("warnings", "meta.note", "what a user must know about this row"));
        List<Object[]> data = new ArrayList<>();
        for (Row r : rows) {
            StringBuilder alts = new StringBuilder();
            for (Alternative a : r.alternatives) {
                if (alts.length() > 0) {
                    alts.append(' ');
                }
                alts.append(String.format(Locale.ROOT, "%.5f:%.3g", a.z(), a.score()));
            }
            double ra = r.metadata == null ? Double.NaN : r.metadata.raDeg();
            double dec = r.metadata == null ? Double.NaN : r.metadata.decDeg();
            data.add(new Object[] {r.file, r.index, r.objectId, r.measured ? "ok" : "failed", r.error, r.z, r.zErr,
                r.measured ? r.objectClass.key() : "unknown", r.grade, r.estimator, alts.toString(), ra, dec, r.zBary, r.zCmb,
                r.comovingMpc, r.luminosityMpc, r.angularDiameterMpc, r.distanceModulusMag, r.lookbackGyr, r.hubbleLawMpc,
                String.join("; ", r.warnings)});
        }
        return new CatalogTable("redshifts", "one row per fibre of the invented Ember survey", cols, data.size(), data);
    }

    static Map<String, String> provenance(long seed, int size, String estimator) {
        Map<String, String> p = new LinkedHashMap<>();
        p.put("survey", "invented Ember field, Quill spectrograph (invented), seed " + seed + ", " + size + " fibres");
        p.put("survey_generator_version", SurveyGenerator.VERSION);
        p.put("estimator", estimator);
        p.put("cosmology", COSMOLOGY);
        p.put("frames", "barycentric and CMB from the topocentric z");
        return p;
    }
}
