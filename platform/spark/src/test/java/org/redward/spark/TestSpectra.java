package org.redward.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.redward.mock.internal.SurveyGenerator;

/** Spectra for the Spark tests: an invented mock survey (the demo's generator), several spectra per file. */
final class TestSpectra {

    /** The estimator both runs use: the product's default. */
    static final String ESTIMATOR = "xcorr";

    /** Number of spectra; overridable with -Dredward.spark.testSpectra=N. */
    static final int SIZE = Integer.getInteger("redward.spark.testSpectra", 2000);

    private TestSpectra() {
    }

    static Path write(Path dir) throws IOException {
        Files.createDirectories(dir);
        new SurveyGenerator(4242, SIZE).write(dir, n -> { });
        Files.deleteIfExists(dir.resolve("truth.csv"));
        return dir;
    }
}
