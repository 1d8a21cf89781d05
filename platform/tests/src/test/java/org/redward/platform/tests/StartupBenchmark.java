package org.redward.platform.tests;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;

/**
 * Start-up cost of small commands of the assembled product (goal: at most 1.5 s wall, median of
 * 5, once built): {@code --version}, {@code plugins}, {@code distance 0.5} and {@code info} of a
 * real spectrum. Prints the figures; asserts nothing about time (machines here are noisy).
 * Run with {@code mvn -B verify -Pbenchmarks}, or alone, without Maven, as {@link StartupFigures}
 * says.
 */
class StartupBenchmark {

    @Test
    void smallCommands() throws Exception {
        StartupFigures.report(Product.home(), Path.of(System.getProperty("redward.shared", "../../../shared")), 5);
    }
}
