package org.redward.platform.tests;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

/**
 * Start-up figures of the assembled product's small commands: each command is run once to warm
 * the file cache, then {@code runs} times (default 5); prints the median, min and max wall time
 * and, where {@code /usr/bin/time} exists, the median CPU time (user + system) of the process,
 * with the load average before and after (the figures mean little on a busy machine). The goal
 * is a median of at most 1.5 s wall. Asserts nothing.
 *
 * <p>Plain JDK only, so that it runs alone, without Maven, once the product is built:
 * <pre>
 *   java platform/tests/src/test/java/org/redward/platform/tests/StartupFigures.java [--runs N] [--product DIR] [--shared DIR]
 * </pre>
 * from the root of a checkout ({@code --product} defaults to {@code platform/product/target/redward},
 * {@code --shared} to the system property {@code redward.shared}, then {@code ../shared}).
 * {@link StartupBenchmark} runs it under {@code mvn -B verify -Pbenchmarks}.
 */
public final class StartupFigures {

    /** The goal of the start-up issue: median wall seconds of a small command. */
    static final double GOAL_SECONDS = 1.5;

    private StartupFigures() {
    }

    public static void main(String[] args) throws Exception {
        int runs = 5;
        Path product = Path.of("platform/product/target/redward");
        String shared = System.getProperty("redward.shared", "../shared");
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--runs" -> runs = Integer.parseInt(args[++i]);
                case "--product" -> product = Path.of(args[++i]);
                case "--shared" -> shared = args[++i];
                default -> throw new IllegalArgumentException("unknown option " + args[i]
                        + " (options: --runs N, --product DIR, --shared DIR)");
            }
        }
        report(product, Path.of(shared), runs);
    }

    static void report(Path product, Path shared, int runs) throws Exception {
        Path script = product.resolve("bin").resolve("redward").toAbsolutePath();
        if (!Files.isExecutable(script)) {
            throw new IllegalStateException("no product at " + product.toAbsolutePath() + " (build it first: mvn -B -q -o package -DskipTests)");
        }
        System.out.println("BENCHMARK start-up  load average before: " + loadAverage());
        measure(script, runs, "--version");
        measure(script, runs, "plugins");
        measure(script, runs, "distance", "0.5");
        Path spectrum = shared.resolve("realdata").resolve("spec-0266-51630-0168.fits");
        if (Files.isRegularFile(spectrum)) {
            measure(script, runs, "info", spectrum.toAbsolutePath().toString());
        } else {
            System.out.println("BENCHMARK start-up  (info skipped: no " + spectrum + "; pass --shared DIR)");
        }
        System.out.println("BENCHMARK start-up  load average after: " + loadAverage());
    }

    private static void measure(Path script, int runs, String... args) throws Exception {
        Path timeTool = Path.of("/usr/bin/time");
        boolean cpu = Files.isExecutable(timeTool);
        runOnce(script, cpu ? timeTool : null, args); // warm the file cache
        double[] wall = new double[runs];
        double[] cpuSeconds = new double[runs];
        int status = 0;
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            double[] r = runOnce(script, cpu ? timeTool : null, args);
            wall[i] = (System.nanoTime() - t0) / 1e9;
            status = (int) r[0];
            cpuSeconds[i] = r[1];
        }
        Arrays.sort(wall);
        Arrays.sort(cpuSeconds);
        String shown = String.join(" ", args);
        if (shown.length() > 24) {
            shown = args[0] + " " + Path.of(args[args.length - 1]).getFileName();
        }
        System.out.printf(Locale.ROOT, "BENCHMARK start-up  redward %-34s median %.3f s wall (min %.3f, max %.3f)%s, exit %d, %d runs; goal <= %.1f s%n",
                shown, wall[runs / 2], wall[0], wall[runs - 1],
                cpu ? String.format(Locale.ROOT, ", median CPU %.2f s", cpuSeconds[runs / 2]) : "", status, runs, GOAL_SECONDS);
    }

    /** One run: {exit status, CPU seconds or NaN}. */
    private static double[] runOnce(Path script, Path timeTool, String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        Path cpuFile = null;
        if (timeTool != null) {
            cpuFile = Files.createTempFile("redward-cpu", ".txt");
            cmd.addAll(List.of(timeTool.toString(), "-f", "%U %S", "-o", cpuFile.toString()));
        }
        cmd.add(script.toString());
        cmd.addAll(Arrays.asList(args));
        Process p = new ProcessBuilder(cmd).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new IllegalStateException("redward " + String.join(" ", args) + " did not finish within 120 s");
        }
        double cpu = Double.NaN;
        if (cpuFile != null) {
            List<String> lines = Files.readAllLines(cpuFile, StandardCharsets.UTF_8);
            Files.deleteIfExists(cpuFile);
            if (!lines.isEmpty()) {
                String[] f = lines.get(lines.size() - 1).trim().split("\\s+");
                if (f.length == 2) {
                    cpu = Double.parseDouble(f[0]) + Double.parseDouble(f[1]);
                }
            }
        }
        return new double[] {p.exitValue(), cpu};
    }

    private static String loadAverage() {
        Path f = Path.of(File.separator + "proc", "loadavg");
        try {
            return Files.isRegularFile(f) ? Files.readString(f).trim() : "unknown";
        } catch (IOException e) {
            return "unknown";
        }
    }
}
