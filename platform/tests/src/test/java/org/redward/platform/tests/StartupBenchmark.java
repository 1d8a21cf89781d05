package org.redward.platform.tests;

import java.util.Arrays;
import java.util.Locale;

import org.junit.jupiter.api.Test;

/**
 * Start-up cost of small commands of the assembled product (goal: at most 1.5 s wall, median of
 * 5, once built). Prints the figures; asserts nothing about time (machines here are noisy).
 * Run with {@code mvn -B verify -Pbenchmarks}.
 */
class StartupBenchmark {

    @Test
    void smallCommands() throws Exception {
        report("plugins");
        report("distance", "0.5");
    }

    private static void report(String... args) throws Exception {
        Product.run(args); // warm the file cache
        double[] seconds = new double[5];
        int status = 0;
        for (int i = 0; i < seconds.length; i++) {
            long t0 = System.nanoTime();
            status = Product.run(args).status();
            seconds[i] = (System.nanoTime() - t0) / 1e9;
        }
        Arrays.sort(seconds);
        System.out.printf(Locale.ROOT, "BENCHMARK start-up  redward %-14s median %.3f s  (min %.3f, max %.3f, exit %d; goal <= 1.5 s)%n",
                String.join(" ", args), seconds[2], seconds[0], seconds[4], status);
    }
}
