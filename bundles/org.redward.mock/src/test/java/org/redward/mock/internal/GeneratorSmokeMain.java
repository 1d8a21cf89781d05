package org.redward.mock.internal;

import java.nio.file.Files;
import java.nio.file.Path;

/** Generates a survey and prints timing: {@code GeneratorSmokeMain DIR SIZE}. A benchmark-style main, not a test. */
public final class GeneratorSmokeMain {
    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args[0]);
        Files.createDirectories(dir);
        int size = Integer.parseInt(args[1]);
        long t0 = System.nanoTime();
        var truth = new SurveyGenerator(42, size).write(dir, n -> { });
        System.out.printf("%d fibres in %.2f s%n", truth.size(), (System.nanoTime() - t0) / 1e9);
    }
}
