package org.redward.templates.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.spectrum.Medium;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.Spectrum;

/**
 * How long {@code templates build} takes to derive eigen-templates as the training set grows:
 * invented noise-free mixtures of two shapes, 3,800 pixels each (log10 step 1e-4), spread over
 * 0.01 &lt; z &lt; 0.3 so that the rest-frame coverage has gaps. Prints seconds per build; run with
 * {@code java -cp ... org.redward.templates.internal.EigenTemplatesBenchmark [N...]}.
 */
public final class EigenTemplatesBenchmark {

    EigenTemplatesBenchmark() {
    }

    /** Runs {@link #main} under {@code mvn -B verify -Pbenchmarks} (surefire runs only *Benchmark classes there). */
    @org.junit.jupiter.api.Test
    void benchmark() throws Exception {
        main(new String[0]);
    }

    public static void main(String[] args) {
        int[] sizes = args.length == 0 ? new int[] {25, 50, 100, 200} : java.util.Arrays.stream(args).mapToInt(Integer::parseInt).toArray();
        for (int n : sizes) {
            List<EigenTemplates.Input> in = inputs(n);
            EigenTemplates.build(ObjectClass.GALAXY, in, 1e-4, 4, 0.5); // warm-up
            long t0 = System.nanoTime();
            EigenTemplates.Result r = EigenTemplates.build(ObjectClass.GALAXY, in, 1e-4, 4, 0.5);
            double s = (System.nanoTime() - t0) / 1e9;
            System.out.printf(Locale.ROOT, "%4d spectra x 3800 px -> %d components: %.2f s  (%s)%n", n, r.templates().size(), s, r.note());
        }
    }

    private static List<EigenTemplates.Input> inputs(int n) {
        List<EigenTemplates.Input> out = new ArrayList<>();
        SpectralAxis axis = SpectralAxis.logLinear(Math.log10(3800), 1e-4, 3800, Medium.VACUUM);
        double[] w = axis.vacuumAngstrom();
        for (int s = 0; s < n; s++) {
            double z = 0.01 + 0.29 * s / (n - 1);
            double a = 0.2 + 0.8 * ((s * 7) % n) / (double) n;
            double[] f = new double[w.length];
            for (int i = 0; i < w.length; i++) {
                double rest = w[i] / (1 + z);
                double x = (rest - 6564.6) / 7;
                double y = (rest - 3934.8) / 8;
                f[i] = a * (1 + 5 * Math.exp(-0.5 * x * x)) + (1 - 0.5 * a) * (1 - 0.6 * Math.exp(-0.5 * y * y));
            }
            out.add(new EigenTemplates.Input("b" + s, Spectrum.of(axis, f, null, null, "", null), z));
        }
        return out;
    }
}
