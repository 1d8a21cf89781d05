package org.redward.example.estimator.internal;

import java.util.Arrays;
import java.util.List;

import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;
import org.osgi.service.component.annotations.Component;
import org.redward.api.redshift.Alternative;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.registry.Provided;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.Spectrum;

/**
 * An example estimator a research group can copy as the shape of its own: it finds the emission
 * peak of highest signal-to-noise above a running-median continuum and assumes it is H-alpha
 * (6564.614 Angstrom in vacuum; NIST value as listed in the team's reference table). It is wrong
 * whenever the strongest line is another one ([O III], [O II], Lyman-alpha...), and says so in
 * every solution it returns.
 */
@Component(property = {
        Provided.ID + "=" + BrightestLineEstimator.ID,
        Provided.DESCRIPTION + "=example: strongest emission peak taken as H-alpha (single-line guess, no check)",
        RedshiftEstimator.USES_TEMPLATES + ":Boolean=false"})
public final class BrightestLineEstimator implements RedshiftEstimator {

    static final String ID = "example-brightest-line";
    static final double H_ALPHA_VACUUM_ANGSTROM = 6564.614;
    static final double MIN_SNR = 5.0;
    static final int WINDOW_PIXELS = 101;

    @Override
    public RedshiftSolution estimate(Spectrum spectrum, EstimationContext context) {
        int n = spectrum.size();
        if (spectrum.usablePixels() < WINDOW_PIXELS) {
            return withProvenance(RedshiftSolution.failed("fewer than " + WINDOW_PIXELS + " usable pixels"));
        }
        double[] continuum = runningMedian(spectrum);
        int best = -1;
        double bestSnr = MIN_SNR;
        for (int i = 0; i < n; i++) {
            if (spectrum.masked(i)) {
                continue;
            }
            double snr = (spectrum.flux(i) - continuum[i]) * Math.sqrt(spectrum.inverseVariance(i));
            if (snr > bestSnr) {
                bestSnr = snr;
                best = i;
            }
        }
        if (best < 0) {
            return withProvenance(RedshiftSolution.failed("no emission peak above S/N " + MIN_SNR));
        }
        double z = spectrum.axis().vacuumAngstrom(best) / H_ALPHA_VACUUM_ANGSTROM - 1.0;
        if (z < context.zMin() || z > context.zMax()) {
            return withProvenance(RedshiftSolution.failed(String.format(java.util.Locale.ROOT,
                    "strongest peak taken as H-alpha gives z = %.4f, outside the searched range", z)));
        }
        double pixelWidth = best + 1 < n ? spectrum.axis().vacuumAngstrom(best + 1) - spectrum.axis().vacuumAngstrom(best)
                : spectrum.axis().vacuumAngstrom(best) - spectrum.axis().vacuumAngstrom(best - 1);
        double zErr = pixelWidth / H_ALPHA_VACUUM_ANGSTROM;
        return withProvenance(RedshiftSolution.builder()
                .z(z, zErr)
                .objectClass(ObjectClass.GALAXY, "emission-line")
                .grade("guess", Double.NaN)
                .alternatives(List.of(new Alternative(z, zErr, bestSnr, 0.0, ObjectClass.GALAXY, "H-alpha")))
                .warning("redshift from a single line assumed to be H-alpha; the identity was not checked against other lines")
                .diagnostic("peak_snr", bestSnr)
                .build());
    }

    private static RedshiftSolution withProvenance(RedshiftSolution s) {
        Bundle b = FrameworkUtil.getBundle(BrightestLineEstimator.class);
        return s.toBuilder().provenance("estimator", ID)
                .provenance("estimator_bundle", b == null ? "org.redward.example.estimator" : b.getSymbolicName())
                .provenance("estimator_version", b == null ? "" : b.getVersion().toString())
                .provenance("parameters", "min_snr=" + MIN_SNR + ",window_pixels=" + WINDOW_PIXELS)
                .build();
    }

    /** Median of the usable pixels within WINDOW_PIXELS of each pixel. */
    private static double[] runningMedian(Spectrum s) {
        int n = s.size();
        int half = WINDOW_PIXELS / 2;
        double[] out = new double[n];
        double[] buf = new double[WINDOW_PIXELS];
        for (int i = 0; i < n; i++) {
            int k = 0;
            for (int j = Math.max(0, i - half); j <= Math.min(n - 1, i + half); j++) {
                if (!s.masked(j)) {
                    buf[k++] = s.flux(j);
                }
            }
            if (k == 0) {
                out[i] = 0;
                continue;
            }
            Arrays.sort(buf, 0, k);
            out[i] = k % 2 == 1 ? buf[k / 2] : 0.5 * (buf[k / 2 - 1] + buf[k / 2]);
        }
        return out;
    }
}
