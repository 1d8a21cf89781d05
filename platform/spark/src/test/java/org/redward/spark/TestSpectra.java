package org.redward.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.redward.testkit.SharedData;

/** Spectra for the Spark tests. */
final class TestSpectra {

    static final String ESTIMATOR = "lines";

    private TestSpectra() {
    }

    /** Copies of the real spectra of the team's reference data, several times over under different names. */
    static Path write(Path dir) throws IOException {
        Files.createDirectories(dir);
        Path real = SharedData.realData();
        try (var s = Files.list(real)) {
            for (Path f : (Iterable<Path>) s.filter(p -> p.toString().endsWith(".fits"))::iterator) {
                for (int copy = 0; copy < 4; copy++) {
                    Files.copy(f, dir.resolve("c" + copy + "-" + f.getFileName()));
                }
            }
        }
        return dir;
    }
}
