package org.redward.platform.tests;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.json.JSONObject;
import org.junit.jupiter.api.Test;
import org.redward.testkit.HeadlessDisplay;
import org.redward.testkit.SharedData;

/**
 * How long the workbench window takes to appear (goal: within 3 s of the command), measured from
 * the process launch by this benchmark's clock to the window's first paint under Xvfb, with the
 * steps between as the product reports them (wall-clock epoch milliseconds in its --json
 * timeline): the launcher script and JVM, the platform start (Felix, bundles, registries) up to
 * the command, then the workbench's own part (display, window, first paint). Median of 5 runs
 * after one to warm the file cache. Prints the figures; asserts nothing about time. Run with
 * {@code mvn -B verify -Pbenchmarks}.
 */
class WorkbenchWindowBenchmark {

    @Test
    void firstWindow() throws Exception {
        String display = HeadlessDisplay.ensure();
        Path work = Files.createDirectories(Path.of("target", "workbench-bench").toAbsolutePath());
        Path spectrum = SharedData.realData().resolve("spec-0266-51630-0168.fits");
        String[] steps = {"launch to JVM start", "JVM start to command", "command to main thread", "main thread to display ready", "command to window build start", "window build", "built to window opened",
            "opened to first paint", "command to first paint (workbench)", "launch to first paint (total)",
            "process CPU time at first paint (all threads)"};
        int runs = 5;
        Map<String, double[]> ms = new LinkedHashMap<>();
        for (String s : steps) {
            ms.put(s, new double[runs]);
        }
        String loadBefore = Files.readString(Path.of("/proc/loadavg")).trim();
        for (int i = -1; i < runs; i++) {
            long launched = System.currentTimeMillis();
            Product.Run r = Product.run(work, Map.of("DISPLAY", display, "GSETTINGS_BACKEND", "memory"), 240,
                    "workbench", "--json", "--snapshot", work.resolve("first.png").toString(), "--journal",
                    work.resolve("journal.jsonl").toString(), spectrum.toString());
            if (r.status() != 0) {
                throw new AssertionError(r.toString());
            }
            if (i < 0) {
                continue;
            }
            String line = r.out().lines().filter(l -> l.startsWith("{")).reduce((a, b) -> b).orElseThrow(() -> new AssertionError(r.toString()));
            JSONObject t = new JSONObject(line).getJSONObject("timeline_epoch_ms");
            long jvm = t.getLong("process_start");
            long command = t.getLong("command_start");
            long mainThread = t.getLong("main_thread_start");
            long displayReady = t.getLong("display_ready");
            long buildStart = t.getLong("window_build_start");
            long built = t.getLong("window_built");
            long opened = t.getLong("window_opened");
            long paint = t.getLong("first_paint");
            double[] v = {jvm - launched, command - jvm, mainThread - command, displayReady - mainThread, buildStart - command,
                built - buildStart, opened - built, paint - opened, paint - command, paint - launched,
                new JSONObject(line).getLong("process_cpu_ms_at_first_paint")};
            for (int k = 0; k < steps.length; k++) {
                ms.get(steps[k])[i] = v[k];
            }
        }
        for (Map.Entry<String, double[]> e : ms.entrySet()) {
            double[] s = e.getValue().clone();
            Arrays.sort(s);
            System.out.printf(Locale.ROOT, "BENCHMARK workbench window  %-38s median %6.0f ms  (min %.0f, max %.0f)%n", e.getKey(),
                    s[runs / 2], s[0], s[runs - 1]);
        }
        System.out.printf(Locale.ROOT, "BENCHMARK workbench window  goal: launch to first paint within 3,000 ms; load average before %s, after %s (2 cores)%n",
                loadBefore, Files.readString(Path.of("/proc/loadavg")).trim());
    }
}
