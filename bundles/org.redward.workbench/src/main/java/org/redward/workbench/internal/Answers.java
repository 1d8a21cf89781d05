package org.redward.workbench.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.Distances;
import org.redward.api.frames.VelocityConvention;
import org.redward.api.redshift.Alternative;
import org.redward.api.redshift.RedshiftSolution;

/** Turns platform results into what the panels show. Pure functions; thread-safe. */
final class Answers {

    /** Above this z a Hubble-law distance is no longer a fair approximation (common practice). */
    static final double HUBBLE_LAW_LIMIT_Z = 0.05;

    private Answers() {
    }

    static MachineAnswer of(String estimatorId, RedshiftSolution s) {
        if (!s.ok()) {
            return MachineAnswer.failed(estimatorId, s.error());
        }
        List<Double> alts = new ArrayList<>();
        for (Alternative a : s.alternatives()) {
            alts.add(a.z());
        }
        if (alts.isEmpty()) {
            alts.add(s.z());
        }
        return new MachineAnswer(estimatorId, true, "", s.z(), s.zError(), s.objectClass().key(), s.grade(), alts,
                s.scoreCurve().orElse(null), s.warnings());
    }

    /**
     * Rows {quantity, value, caution} for the velocity panel: the three velocity conventions and a
     * Hubble-law distance for H0 = 67.66 and 73.04 km/s/Mpc (Planck Collaboration 2020, A&amp;A 641, A6,
     * Table 2; Riess et al. 2022, ApJL 934, L7), with the caution that it only holds at low z.
     */
    static List<String[]> velocityRows(double z) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"z", String.format(Locale.ROOT, "%.6f", z), ""});
        rows.add(new String[] {"cz (optical)", kms(VelocityConvention.OPTICAL.velocityKmPerS(z)), z > 0.1 ? "cz is not a velocity at this z" : ""});
        rows.add(new String[] {"radio cz/(1+z)", kms(VelocityConvention.RADIO.velocityKmPerS(z)), ""});
        rows.add(new String[] {"relativistic", kms(VelocityConvention.RELATIVISTIC.velocityKmPerS(z)), ""});
        String caution = z > HUBBLE_LAW_LIMIT_Z ? "Hubble law misleads at z > " + HUBBLE_LAW_LIMIT_Z + ": use a cosmology"
                : z < 0.003 ? "peculiar velocities dominate at this z" : "";
        rows.add(new String[] {"cz/H0, H0 = 67.66", mpc(VelocityConvention.OPTICAL.velocityKmPerS(z) / 67.66), caution});
        rows.add(new String[] {"cz/H0, H0 = 73.04", mpc(VelocityConvention.OPTICAL.velocityKmPerS(z) / 73.04), caution});
        return rows;
    }

    /**
     * Rows {quantity, value, caution} of the distances under a cosmology, and the luminosity
     * distance again under the same parameters with H0 = 73.04 km/s/Mpc (Riess et al. 2022, ApJL
     * 934, L7) so that the reader sees how much the choice of H0 moves it. The cosmology's own
     * warnings become cautions.
     */
    static List<String[]> distanceRows(String setId, Cosmology cosmology, Cosmology withLocalH0, double z) {
        List<String[]> rows = new ArrayList<>();
        if (!(z > 0)) {
            rows.add(new String[] {"distances (" + setId + ")", "–", "z ≤ 0: no cosmological distance"});
            return rows;
        }
        Distances d = cosmology.distances(z);
        String caution = String.join("; ", d.warnings());
        rows.add(new String[] {"comoving (" + setId + ")", mpc(d.comovingMpc()), caution});
        rows.add(new String[] {"luminosity", mpc(d.luminosityMpc()), ""});
        rows.add(new String[] {"angular diameter", mpc(d.angularDiameterMpc()), ""});
        rows.add(new String[] {"distance modulus", String.format(Locale.ROOT, "%.3f mag", d.distanceModulusMag()), ""});
        rows.add(new String[] {"lookback time", String.format(Locale.ROOT, "%.3f Gyr", d.lookbackGyr()), ""});
        rows.add(new String[] {"age at z", String.format(Locale.ROOT, "%.3f Gyr", d.ageGyr()), ""});
        CosmologyParameters p = cosmology.parameters();
        double dl73 = withLocalH0.luminosityDistanceMpc(z);
        rows.add(new String[] {"luminosity if H0 = 73.04", mpc(dl73),
            String.format(Locale.ROOT, "H0 %.2f → 73.04 moves distances by %.1f%%", p.h0(), 100 * (dl73 / d.luminosityMpc() - 1))});
        return rows;
    }

    private static String kms(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.1f km/s", v) : "–";
    }

    private static String mpc(double d) {
        return Double.isFinite(d) ? String.format(Locale.ROOT, "%.1f Mpc", d) : "–";
    }
}
