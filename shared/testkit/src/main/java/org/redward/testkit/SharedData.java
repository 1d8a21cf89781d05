package org.redward.testkit;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Assumptions;

/**
 * Locates the team's read-only reference data (real spectra with published redshifts, published
 * template spectra) that lives beside the checkout in {@code ../shared}, never inside the
 * repository. The location can be overridden with the system property {@code redward.shared}
 * (the build sets it). In CI ({@code CI=true}) the data must be present: a missing folder fails
 * the test; elsewhere the test is skipped with a clear message.
 */
public final class SharedData {

    private SharedData() {
    }

    /** The shared folder; fails (CI) or skips (elsewhere) when absent. */
    public static Path root() {
        String p = System.getProperty("redward.shared");
        Path root = p != null ? Path.of(p) : Path.of("..", "shared");
        if (!Files.isDirectory(root.resolve("realdata"))) {
            String message = "reference data not found at " + root.toAbsolutePath().normalize()
                    + " (set -Dredward.shared=DIR to the folder holding realdata/ and templates/)";
            if ("true".equalsIgnoreCase(System.getenv("CI"))) {
                throw new AssertionError(message + "; CI must have it");
            }
            Assumptions.abort(message);
        }
        return root.toAbsolutePath().normalize();
    }

    /** {@code realdata/}: 12 real spectra and truth.tsv (see its README). */
    public static Path realData() {
        return root().resolve("realdata");
    }

    /** {@code templates/}: published empirical templates (see its README). */
    public static Path templates() {
        return root().resolve("templates");
    }
}
