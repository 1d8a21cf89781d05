package org.redward.platform.tests;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * Runs the assembled product ({@code platform/product/target/redward/bin/redward}) as a user does,
 * in a separate process: a real Felix with the built bundles.
 */
public final class Product {

    /** The outcome of one run. */
    public record Run(int status, String out, String err) {
        @Override
        public String toString() {
            return "exit " + status + "\n--- stdout ---\n" + out + "\n--- stderr ---\n" + err;
        }
    }

    private Product() {
    }

    public static Path home() {
        Path p = Path.of(System.getProperty("redward.product", "../product/target/redward"));
        if (!Files.isExecutable(p.resolve("bin").resolve("redward"))) {
            throw new IllegalStateException("the product is not assembled at " + p.toAbsolutePath() + " (run mvn verify from the root)");
        }
        return p.toAbsolutePath().normalize();
    }

    /** Runs {@code redward args...} in {@code workingDirectory} with a time bound. */
    public static Run run(Path workingDirectory, Map<String, String> env, long timeoutSeconds, String... args)
            throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        cmd.add(home().resolve("bin").resolve("redward").toString());
        cmd.addAll(Arrays.asList(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(workingDirectory.toFile());
        pb.environment().putAll(env);
        Path out = Files.createTempFile("redward-out", ".txt");
        Path err = Files.createTempFile("redward-err", ".txt");
        pb.redirectOutput(out.toFile()).redirectError(err.toFile());
        Process p = pb.start();
        if (!p.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("redward " + String.join(" ", args) + " did not finish within " + timeoutSeconds + " s");
        }
        Run r = new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
        Files.deleteIfExists(out);
        Files.deleteIfExists(err);
        return r;
    }

    public static Run run(String... args) throws IOException, InterruptedException {
        return run(Path.of("").toAbsolutePath(), Map.of(), 300, args);
    }
}
