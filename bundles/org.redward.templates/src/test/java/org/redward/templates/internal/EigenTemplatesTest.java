package org.redward.templates.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.redward.api.templates.Template;
import org.redward.spectrum.Medium;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.Spectrum;

/**
 * PCA eigen-templates. Reference: the Eckart-Young theorem (Eckart &amp; Young 1936,
 * Psychometrika 1, 211; common linear algebra): noise-free spectra that are combinations of k
 * rest-frame shapes form a rank-k matrix, spanned exactly by its first k right singular vectors.
 * So the components built from such spectra, shifted to many redshifts, must span the shapes
 * up to the resampling error.
 */
class EigenTemplatesTest {

    /** Two rest-frame shapes: a sloped continuum with an emission line, and an absorption pattern. */
    private static double shapeA(double w) {
        return 1.0 + 2e-4 * (w - 5000) + 3.0 * gauss(w, 4862.68, 6) + 6.0 * gauss(w, 5008.24, 6) + 5.0 * gauss(w, 6564.61, 7);
    }

    private static double shapeB(double w) {
        return 1.0 - 0.6 * gauss(w, 3934.78, 8) - 0.6 * gauss(w, 3969.59, 8) - 0.4 * gauss(w, 5175.0, 10) - 0.3 * gauss(w, 5891.6, 8);
    }

    private static double gauss(double w, double c, double s) {
        double x = (w - c) / s;
        return Math.exp(-0.5 * x * x);
    }

    private static List<EigenTemplates.Input> mixtures(int n) {
        List<EigenTemplates.Input> out = new ArrayList<>();
        for (int s = 0; s < n; s++) {
            double z = 0.01 + 0.25 * s / (n - 1);
            double a = 0.2 + 0.8 * ((s * 7) % n) / (double) n;
            double b = 1.0 - 0.5 * a;
            SpectralAxis axis = SpectralAxis.logLinear(Math.log10(3800), 1e-4, 3800, Medium.VACUUM);
            double[] w = axis.vacuumAngstrom();
            double[] f = new double[w.length];
            for (int i = 0; i < w.length; i++) {
                double rest = w[i] / (1 + z);
                f[i] = (s + 1) * (a * shapeA(rest) + b * shapeB(rest));
            }
            out.add(new EigenTemplates.Input("mix" + s, Spectrum.of(axis, f, null, null, "", null), z));
        }
        return out;
    }

    @Test
    void componentsSpanTheShapesTheSpectraWereMadeOf() {
        EigenTemplates.Result r = EigenTemplates.build(ObjectClass.GALAXY, mixtures(12), 1e-4, 2, 0.5);
        assertEquals(2, r.templates().size());
        double[] w = r.templates().get(0).restVacuumAngstrom();
        double[] c1 = r.templates().get(0).flux();
        double[] c2 = r.templates().get(1).flux();
        // both components together carry all but a sliver of the power (rank 2)
        assertTrue(r.varianceFraction()[0] + r.varianceFraction()[1] > 0.99999, "fractions " + r.varianceFraction()[0] + " " + r.varianceFraction()[1]);
        for (int shape = 0; shape < 2; shape++) {
            double[] v = new double[w.length];
            for (int i = 0; i < w.length; i++) {
                v[i] = shape == 0 ? shapeA(w[i]) : shapeB(w[i]);
            }
            double p1 = dot(v, c1);
            double p2 = dot(v, c2);
            double res = 0;
            for (int i = 0; i < v.length; i++) {
                double d = v[i] - p1 * c1[i] - p2 * c2[i];
                res += d * d;
            }
            double rel = Math.sqrt(res / dot(v, v));
            assertTrue(rel < 2e-3, "shape " + (shape == 0 ? "A" : "B") + " left out by " + rel);
        }
        System.out.println("eigen-templates from 12 invented mixtures: " + r.note());
    }

    @Test
    void componentsAreOrthonormalAndSigned() {
        EigenTemplates.Result r = EigenTemplates.build(ObjectClass.GALAXY, mixtures(8), 1e-4, 2, 0.5);
        double[] c1 = r.templates().get(0).flux();
        double[] c2 = r.templates().get(1).flux();
        assertEquals(1.0, dot(c1, c1), 1e-9);
        assertEquals(1.0, dot(c2, c2), 1e-9);
        assertEquals(0.0, dot(c1, c2), 1e-9);
        double sum = 0;
        for (double v : c1) {
            sum += v;
        }
        assertTrue(sum > 0, "the first component follows the mean spectrum, so it is positive on the whole");
        for (Template t : r.templates()) {
            assertEquals(ObjectClass.GALAXY, t.objectClass());
        }
    }

    @Test
    void tooFewSpectraOrNoCommonCoverageAreExplained() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> EigenTemplates.build(ObjectClass.STAR, mixtures(12).subList(0, 1), 1e-4, 2, 0.5));
        assertTrue(e.getMessage().contains("need at least 2"), e.getMessage());
        List<EigenTemplates.Input> far = new ArrayList<>(mixtures(2));
        SpectralAxis axis = SpectralAxis.logLinear(Math.log10(3800), 1e-4, 100, Medium.VACUUM);
        double[] f = new double[100];
        java.util.Arrays.fill(f, 1.0);
        far.set(1, new EigenTemplates.Input("far", Spectrum.of(axis, f, null, null, "", null), 3.0));
        far.set(0, new EigenTemplates.Input("near", Spectrum.of(axis, f, null, null, "", null), 0.0));
        e = assertThrows(IllegalArgumentException.class, () -> EigenTemplates.build(ObjectClass.GALAXY, far, 1e-4, 2, 1.0));
        assertTrue(e.getMessage().contains("covered by 2 of the 2 spectra"), e.getMessage());
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }
}
