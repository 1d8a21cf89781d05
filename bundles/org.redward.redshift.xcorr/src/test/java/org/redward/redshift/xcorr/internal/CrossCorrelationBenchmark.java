package org.redward.redshift.xcorr.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.api.redshift.EstimationContext;
import org.redward.api.templates.Template;
import org.redward.redshift.kit.FftCorrelator;
import org.redward.redshift.kit.GriddedSpectrum;
import org.redward.redshift.kit.GriddedTemplate;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.SimpleTemplateSet;
import org.redward.testkit.SyntheticSpectra;

/**
 * Speed of cross-correlation (prints figures; run with
 * {@code java -cp ... org.redward.redshift.xcorr.internal.CrossCorrelationBenchmark}, or through
 * the test class path). One thread; times are the thread's CPU time (the machine is shared). Both sides of each ratio are measured in this run:
 *
 * <ol>
 * <li>core: a prepared 4,000-pixel spectrum against 10 prepared 4,000-pixel templates, all
 * lags, by FFT (one forward and 10 inverse transforms of 8,192 points) and directly (sum over the
 * overlap at every lag);</li>
 * <li>whole estimator: {@code estimate()} of 4,000-pixel synthetic spectra against a 10-template
 * set (standard templates cut to 3,000-9,000 A rest), including resampling, continuum removal,
 * peak fits and the solution object.</li>
 * </ol>
 */
public final class CrossCorrelationBenchmark {

    /** Runs {@link #main} under {@code mvn -B verify -Pbenchmarks} (surefire runs only *Benchmark classes there). */
    @org.junit.jupiter.api.Test
    void benchmark() throws Exception {
        main(new String[0]);
    }

    public static void main(String[] args) {
        FftCorrelator.singleThreaded();
        int n = 4000;
        java.util.Random rnd = new java.util.Random(1);
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            g[i] = rnd.nextGaussian();
        }
        double[][] t = new double[10][n];
        for (double[] row : t) {
            for (int i = 0; i < n; i++) {
                row[i] = rnd.nextGaussian();
            }
        }
        int size = 8192;
        CrossCorrelation.Filtered[] th = new CrossCorrelation.Filtered[10];
        for (int j = 0; j < 10; j++) {
            th[j] = CrossCorrelation.Filtered.of(t[j], size);
        }
        // warm-up
        double sink = 0;
        for (int rep = 0; rep < 300; rep++) {
            sink += fftCore(g, th, size);
        }
        int reps = 1000;
        long t0 = cpuNanos();
        for (int rep = 0; rep < reps; rep++) {
            sink += fftCore(g, th, size);
        }
        double fftUs = (cpuNanos() - t0) / 1e3 / reps;
        for (int rep = 0; rep < 300; rep++) {
            sink += allocatingCore(g, th, size);
        }
        t0 = cpuNanos();
        for (int rep = 0; rep < reps; rep++) {
            sink += allocatingCore(g, th, size);
        }
        double allocUs = (cpuNanos() - t0) / 1e3 / reps;
        for (int rep = 0; rep < 3; rep++) {
            sink += direct(g, t);
        }
        int dreps = 10;
        t0 = cpuNanos();
        for (int rep = 0; rep < dreps; rep++) {
            sink += direct(g, t);
        }
        double directUs = (cpuNanos() - t0) / 1e3 / dreps;
        System.out.println(String.format(Locale.ROOT,
                "BENCHMARK xcorr core, 4000 px x 10 templates, all %d lags: FFT %.0f us (%.0f spectra/s/core; goal >= 1000),"
                        + " direct %.0f us; ratio %.0fx (goal >= 30); thread CPU time, load average %.2f at the end",
                2 * n - 1, fftUs, 1e6 / fftUs, directUs, directUs / fftUs, loadAverage()));
        System.out.println(String.format(Locale.ROOT,
                "BENCHMARK xcorr core with a new result array per template and separate scaling passes: %.0f us (%.0f spectra/s/core)",
                allocUs, 1e6 / allocUs));

        List<Template> ten = new ArrayList<>();
        for (Template tp : new StandardTemplateSet().templates()) {
            if (ten.size() < 10) {
                double[] w = tp.restVacuumAngstrom();
                double[] f = tp.flux();
                int a = 0, b = w.length - 1;
                while (w[a] < 3000) {
                    a++;
                }
                while (w[b] > 9000) {
                    b--;
                }
                ten.add(Template.of(tp.id(), tp.objectClass(), tp.subclass(), java.util.Arrays.copyOfRange(w, a, b + 1),
                        java.util.Arrays.copyOfRange(f, a, b + 1)));
            }
        }
        EstimationContext ctx = EstimationContext.defaults().withTemplates(new SimpleTemplateSet("bench10", ten)).withRedshiftRange(0, 0.8);
        CrossCorrelationEstimator est = new CrossCorrelationEstimator();
        List<org.redward.spectrum.Spectrum> spectra = new ArrayList<>();
        for (int i = 0; i < 50; i++) {
            spectra.add(SyntheticSpectra.emissionGalaxy(0.05 + 0.01 * i, 10, i));
        }
        GriddedSpectrum gs = GriddedSpectrum.of(spectra.get(0), 1e-4, null);
        GriddedTemplate gt = GriddedTemplate.of(ten.get(0), 1e-4);
        for (int rep = 0; rep < 4; rep++) {
            for (org.redward.spectrum.Spectrum s : spectra) {
                sink += est.estimate(s, ctx).z();
            }
        }
        // rounds of 50 spectra; the median and the best round (the machine is shared: the best round is the least disturbed)
        double[] rounds = new double[15];
        for (int round = 0; round < rounds.length; round++) {
            t0 = cpuNanos();
            for (org.redward.spectrum.Spectrum s : spectra) {
                sink += est.estimate(s, ctx).z();
            }
            rounds[round] = (cpuNanos() - t0) / 1e3 / spectra.size();
        }
        java.util.Arrays.sort(rounds);
        double perUs = rounds[rounds.length / 2];
        System.out.println(String.format(Locale.ROOT,
                "BENCHMARK xcorr estimate(), %d px spectrum x 10 templates of %d px, z 0-0.8: median %.0f us per spectrum"
                        + " (%.0f spectra/s/core), best round %.0f us (%.0f spectra/s/core); load average %.2f",
                gs.size(), gt.size(), perUs, 1e6 / perUs, rounds[0], 1e6 / rounds[0], loadAverage()));
        System.out.println("(checksum " + (sink != 0) + ")");
    }

    /** The system's one-minute load average (how busy the shared machine was). */
    static double loadAverage() {
        return java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
    }

    /** CPU time of this thread (ns): robust to other processes sharing the cores; wall time is not. */
    private static long cpuNanos() {
        return java.lang.management.ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }

    private static double fftCore(double[] g, CrossCorrelation.Filtered[] th, int size) {
        CrossCorrelation.Filtered gh = CrossCorrelation.Filtered.of(g, size);
        double s = 0;
        double[] work = CrossCorrelation.work(size);
        for (CrossCorrelation.Filtered t : th) {
            s += CrossCorrelation.correlate(gh, t, work)[17];
        }
        return s;
    }

    /** The core as first written: a new array per correlation, then the inverse's scale and the normalisation as extra passes. */
    private static double allocatingCore(double[] g, CrossCorrelation.Filtered[] th, int size) {
        CrossCorrelation.Filtered gh = CrossCorrelation.Filtered.of(g, size);
        double s = 0;
        for (CrossCorrelation.Filtered t : th) {
            double[] c = FftCorrelator.correlate(gh.hat(), t.hat());
            double norm = Math.sqrt(gh.energy() * t.energy());
            for (int i = 0; i < c.length; i++) {
                c[i] /= norm;
            }
            s += c[17];
        }
        return s;
    }

    private static double direct(double[] g, double[][] t) {
        double s = 0;
        int n = g.length;
        for (double[] tt : t) {
            int m = tt.length;
            for (int k = -(m - 1); k <= n - 1; k++) {
                double c = 0;
                int lo = Math.max(0, k), hi = Math.min(n, m + k);
                for (int i = lo; i < hi; i++) {
                    c += g[i] * tt[i - k];
                }
                s += c;
            }
        }
        return s;
    }
}
