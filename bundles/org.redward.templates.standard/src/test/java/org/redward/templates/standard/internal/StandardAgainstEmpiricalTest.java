package org.redward.templates.standard.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.testkit.EmpiricalTemplates;

/**
 * How the generated standard templates compare with published empirical ones (../shared/templates:
 * Pickles 1998 stars, Kinney et al. 1996 galaxies, Vanden Berk et al. 2001 quasar composite): the
 * colour F(4400-4600 A) / F(6400-6600 A) of each pair, and the correlation coefficient of the
 * continuum-divided spectra over 3,800-7,000 A (do the absorption and emission features sit in the
 * same places with the same signs?). Tolerances are generous: the recipes use typical values
 * from memory (see Recipes), and this test guards against gross errors, not detail.
 */
class StandardAgainstEmpiricalTest {

    /** standard template id -> empirical template id */
    private static final Map<String, String> PAIRS = Map.of(
            "star-A0", "star-a0v", "star-F5", "star-f5v", "star-G0", "star-g0v", "star-K5", "star-k5v",
            "star-M3", "star-m2v", "galaxy-passive", "galaxy-elliptical", "galaxy-starforming", "galaxy-sc",
            "quasar-broadline", "quasar-vandenberk2001");

    @Test
    void coloursAndFeaturesAgree() {
        TemplateSet std = new StandardTemplateSet();
        TemplateSet emp = EmpiricalTemplates.load();
        int bad = 0;
        for (Map.Entry<String, String> p : new java.util.TreeMap<>(PAIRS).entrySet()) {
            Template a = find(std, p.getKey()), b = find(emp, p.getValue());
            double ca = colour(a), cb = colour(b);
            double r = featureCorrelation(a, b);
            boolean ok = Math.abs(Math.log(ca / cb)) < Math.log(1.5) && r > 0.3;
            System.out.println(String.format(Locale.ROOT, "%-20s vs %-24s colour %.3f vs %.3f  feature correlation %.2f %s",
                    p.getKey(), p.getValue(), ca, cb, r, ok ? "" : "<-- differs"));
            if (!ok) {
                bad++;
            }
        }
        assertTrue(bad <= 2, bad + " of " + PAIRS.size() + " standard templates differ grossly from their published counterparts");
    }

    private static Template find(TemplateSet s, String id) {
        return s.templates().stream().filter(t -> t.id().equals(id)).findFirst().orElseThrow(() -> new AssertionError("no template " + id));
    }

    private static double mean(Template t, double lo, double hi) {
        double[] w = t.restVacuumAngstrom(), f = t.flux();
        double s = 0;
        int n = 0;
        for (int i = 0; i < w.length; i++) {
            if (w[i] >= lo && w[i] <= hi) {
                s += f[i];
                n++;
            }
        }
        return s / n;
    }

    private static double colour(Template t) {
        return mean(t, 4400, 4600) / mean(t, 6400, 6600);
    }

    /** Pearson correlation of F / (running 200 A mean of F) - 1 on a 2 A grid over 3,800-7,000 A. */
    private static double featureCorrelation(Template a, Template b) {
        int n = 1600;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            double lam = 3800 + 2 * i;
            x[i] = at(a, lam) / mean(a, lam - 100, lam + 100) - 1;
            y[i] = at(b, lam) / mean(b, lam - 100, lam + 100) - 1;
        }
        return new org.apache.commons.math3.stat.correlation.PearsonsCorrelation().correlation(x, y);
    }

    private static double at(Template t, double lam) {
        double[] w = t.restVacuumAngstrom(), f = t.flux();
        int j = java.util.Arrays.binarySearch(w, lam);
        if (j >= 0) {
            return f[j];
        }
        j = -j - 1;
        if (j <= 0 || j >= w.length) {
            return f[Math.max(0, Math.min(w.length - 1, j))];
        }
        double u = (lam - w[j - 1]) / (w[j] - w[j - 1]);
        return f[j - 1] + u * (f[j] - f[j - 1]);
    }
}
