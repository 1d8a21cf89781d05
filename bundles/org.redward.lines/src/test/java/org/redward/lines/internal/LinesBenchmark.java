package org.redward.lines.internal;

import java.util.Arrays;
import java.util.Random;

import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.LineSearch;
import org.redward.spectrum.Spectrum;

/**
 * Benchmark (not a test): time to find and fit the lines of an invented 4,000-pixel spectrum
 * (log-linear grid, 69 km/s pixels, 12 emission and absorption lines, Gaussian noise) on one
 * thread, and to identify them. Run:
 * <pre>java -cp ... org.redward.lines.internal.LinesBenchmark</pre>
 * Goal: lines found and fitted in under 5 ms on one core. Thread CPU time is reported beside wall
 * time because the machines here are shared: wall time is inflated by other processes.
 */
public final class LinesBenchmark {

    /** Run by {@code mvn -B verify -Pbenchmarks}. */
    @org.junit.jupiter.api.Test
    void findAndFit() {
        main(new String[0]);
    }

    /** Runs {@link #main} under {@code mvn -B verify -Pbenchmarks} (surefire runs only *Benchmark classes there). */
    @org.junit.jupiter.api.Test
    void benchmark() throws Exception {
        main(new String[0]);
    }

    public static void main(String[] args) {
        double z = 0.08;
        double[][] lines = {
                {3727.092 * (1 + z), 6, 250}, {3729.875 * (1 + z), 8, 250}, {3934.777 * (1 + z), -3, 400}, {3969.591 * (1 + z), -3, 400},
                {4862.683 * (1 + z), 5, 250}, {4960.295 * (1 + z), 4, 250}, {5008.240 * (1 + z), 12, 250},
                {5891.583 * (1 + z), -2, 300}, {6549.86 * (1 + z), 3, 250}, {6564.614 * (1 + z), 20, 250},
                {6585.27 * (1 + z), 9, 250}, {6718.29 * (1 + z), 4, 250}, {6732.67 * (1 + z), 3, 250}};
        Spectrum s = Synthetic.spectrum(Synthetic.axis(3800, 4000), 10, lines, 0.7, new Random(42), true);
        MatchedFilterFinder finder = new MatchedFilterFinder();
        PairVoteIdentifier idf = new PairVoteIdentifier();
        FinderSettings fs = FinderSettings.defaults();
        LineSearch ls = null;
        for (int i = 0; i < 3000; i++) {
            ls = finder.find(s, fs);
        }
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 2000;
        java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
        double[] t = new double[runs];
        double[] cpu = new double[runs];
        for (int i = 0; i < runs; i++) {
            long c0 = mx.getCurrentThreadCpuTime();
            long t0 = System.nanoTime();
            ls = finder.find(s, fs);
            t[i] = (System.nanoTime() - t0) / 1e6;
            cpu[i] = (mx.getCurrentThreadCpuTime() - c0) / 1e6;
        }
        Arrays.sort(t);
        Arrays.sort(cpu);
        var list = LineListFile.standard();
        double[] ti = new double[runs];
        for (int i = 0; i < runs; i++) {
            long c0 = mx.getCurrentThreadCpuTime();
            idf.identify(ls.lines(), list, IdentifySettings.defaults(), 3800, 9500);
            ti[i] = (mx.getCurrentThreadCpuTime() - c0) / 1e6;
        }
        Arrays.sort(ti);
        System.out.printf("BENCHMARK lines  find + fit, 4000 px, %d lines: thread CPU time median %.3f ms, p90 %.3f ms; wall median %.3f ms, min %.3f ms (%d runs, one thread; machine load %.1f; goal < 5 ms)%n",
                ls.lines().size(), cpu[runs / 2], cpu[runs * 9 / 10], t[runs / 2], t[0], runs,
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        System.out.printf("BENCHMARK lines  identify: thread CPU time median %.3f ms, p90 %.3f ms%n", ti[runs / 2], ti[runs * 9 / 10]);
    }
}
