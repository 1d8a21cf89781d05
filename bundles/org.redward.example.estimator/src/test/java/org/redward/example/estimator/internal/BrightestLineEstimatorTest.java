package org.redward.example.estimator.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.Spectrum;

class BrightestLineEstimatorTest {

    /** A flat continuum with one Gaussian line; noise-free, inverse variance 100. */
    private static Spectrum oneLine(double centreAngstrom) {
        SpectralAxis axis = SpectralAxis.logLinear(Math.log10(3800), 1e-4, 3800, Medium.VACUUM);
        double[] f = new double[axis.size()];
        double[] iv = new double[axis.size()];
        for (int i = 0; i < f.length; i++) {
            double d = (axis.vacuumAngstrom(i) - centreAngstrom) / 2.0;
            f[i] = 1.0 + 5.0 * Math.exp(-0.5 * d * d);
            iv[i] = 100.0;
        }
        return Spectrum.of(axis, f, iv, null, "arbitrary", null);
    }

    @Test
    void findsTheLineAsHalphaAndWarns() {
        // H-alpha vacuum rest wavelength 6564.614 A (NIST value, as listed in the team's reference table).
        double z = 0.05;
        RedshiftSolution s = new BrightestLineEstimator().estimate(oneLine(6564.614 * (1 + z)), EstimationContext.defaults());
        assertTrue(s.ok());
        assertEquals(z, s.z(), 2e-4);
        assertFalse(s.warnings().isEmpty(), "a single-line redshift must carry a warning");
        assertEquals("example-brightest-line", s.provenance().get("estimator"));
    }

    @Test
    void flatSpectrumFailsWithAReason() {
        SpectralAxis axis = SpectralAxis.logLinear(Math.log10(3800), 1e-4, 3800, Medium.VACUUM);
        double[] f = new double[axis.size()];
        java.util.Arrays.fill(f, 1.0);
        RedshiftSolution s = new BrightestLineEstimator().estimate(Spectrum.of(axis, f, null, null, "", null), EstimationContext.defaults());
        assertFalse(s.ok());
        assertTrue(s.error().contains("no emission peak"));
    }
}
