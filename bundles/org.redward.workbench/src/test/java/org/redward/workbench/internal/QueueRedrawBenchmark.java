package org.redward.workbench.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;

import org.eclipse.swt.widgets.Display;
import org.junit.jupiter.api.Test;
import org.redward.spectrum.Spectrum;
import org.redward.testkit.HeadlessDisplay;
import org.redward.testkit.SharedData;

/**
 * Moving to the next spectrum in a queue of 1,000 (goal: redrawn in under 100 ms): the queue
 * cycles through the SDSS spectra of ../shared/realdata, each read once and kept (as a warm
 * reader cache would), with two score curves of 1,500 trial redshifts each. The figures are the
 * wall times from the move to the spectrum painted and to both charts painted, at 1440x900, after
 * a pause of 150 ms on each spectrum (the reader reads and draws ahead meanwhile), and the same
 * for jumps past the read-ahead window. Prints figures; asserts nothing about time. Run with {@code mvn -B verify -Pbenchmarks}.
 */
class QueueRedrawBenchmark {

    /** The test backend with every spectrum and answer kept after the first read. */
    static final class WarmBackend extends TestBackend {
        private final Map<Path, Loaded> spectra = new ConcurrentHashMap<>();
        private final Map<String, MachineAnswer> answers = new ConcurrentHashMap<>();

        @Override
        public Loaded load(QueueItem item) throws IOException {
            Loaded l = spectra.get(item.source());
            if (l == null) {
                l = super.load(item);
                spectra.put(item.source(), l);
            }
            return l;
        }

        /** Milliseconds each estimate takes on top (a slow estimator). */
        volatile long extraMillis;

        @Override
        public MachineAnswer estimate(String id, Spectrum s) {
            if (extraMillis > 0) {
                try {
                    Thread.sleep(extraMillis);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
            return answers.computeIfAbsent(id + s.metadata().objectId().orElse(""), k -> super.estimate(id, s));
        }
    }

    @Test
    void nextSpectrumInAQueueOfAThousand() throws Exception {
        HeadlessDisplay.ensure();
        List<Path> sdss;
        try (Stream<Path> s = Files.list(SharedData.realData())) {
            sdss = s.filter(p -> p.getFileName().toString().startsWith("spec-") && !p.getFileName().toString().startsWith("spec-55862"))
                    .sorted().toList();
        }
        List<Path> queue = new ArrayList<>();
        for (int i = 0; i < 1000; i++) {
            queue.add(sdss.get(i % sdss.size()));
        }
        Display display = Display.getDefault();
        WarmBackend backend = new WarmBackend();
        // warm: read every file and run both estimators once
        for (Path p : sdss) {
            Spectrum s = backend.load(new QueueItem(p, 0, null)).spectrum();
            backend.estimators().forEach(id -> backend.estimate(id, s));
        }
        Path journal = Files.createTempFile("bench-journal", ".jsonl");
        try (Journal j = Journal.open(journal)) {
            WorkbenchWindow w = new WorkbenchWindow(display, backend, j, backend.estimators());
            w.open(1440, 900);
            w.add(queue);
            waitDrawn(display, w);
            int steps = 300;
            String loadBefore = Files.readString(Path.of("/proc/loadavg")).trim();
            Moves next = moves(display, w, steps, 1, true);
            report("next spectrum, move to spectrum painted", next.spectrumMs);
            report("next spectrum, move to both charts painted", next.bothMs);
            report("next spectrum, CPU time of the UI thread to spectrum", next.cpuMs);
            System.out.printf(Locale.ROOT, "BENCHMARK workbench %d of %d moves showed charts drawn ahead by the reader%n", next.reused, steps);
            // jumps past the read-ahead window: read (warm), drawn and estimated (cached) on demand
            Moves jumps = moves(display, w, 60, 7, true);
            report("jump of 7 (not read ahead), to spectrum painted", jumps.spectrumMs);
            report("jump of 7 (not read ahead), to both painted", jumps.bothMs);
            // a slow estimator (each answer 400 ms, two per spectrum) and a person faster than it:
            // the spectrum still shows at once, the scores fill in later
            backend.extraMillis = 400;
            Moves slow = moves(display, w, 40, 1, false);
            report("slow estimator (0.8 s/spectrum), to spectrum", slow.spectrumMs);
            backend.extraMillis = 0;
            System.out.printf(Locale.ROOT, "BENCHMARK workbench load average before: %s, after: %s (2 cores; wall times grow with load, CPU time much less)%n",
                    loadBefore, Files.readString(Path.of("/proc/loadavg")).trim());
            System.out.printf(Locale.ROOT, "BENCHMARK workbench queue of %d spectra, %d moves at 1440x900 (goal < 100 ms)%n",
                    w.queue().all().size(), steps);
            w.shell().dispose();
        } finally {
            Files.deleteIfExists(journal);
        }
    }

    /** Times of a series of moves: to the spectrum painted, to both charts, UI-thread CPU to the spectrum. */
    record Moves(double[] spectrumMs, double[] bothMs, double[] cpuMs, int reused) {
    }

    /**
     * Moves {@code n} times by {@code step}, pausing 150 ms on each spectrum first (a person looks
     * at it for a moment; the reader reads ahead meanwhile); waits for the scores too when asked.
     */
    private static Moves moves(Display display, WorkbenchWindow w, int n, int step, boolean waitForScores) {
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        double[] spectrum = new double[n];
        double[] both = new double[n];
        double[] cpu = new double[n];
        int reused = 0;
        for (int i = 0; i < n; i++) {
            pumpFor(display, 150);
            long c0 = threads.getCurrentThreadCpuTime();
            long t0 = System.nanoTime();
            w.move(step);
            waitFor(display, () -> w.spectrumShownAt() != 0);
            spectrum[i] = (w.spectrumShownAt() - t0) / 1e6;
            cpu[i] = (threads.getCurrentThreadCpuTime() - c0) / 1e6;
            reused += w.spectrumCanvas().reusedPixels() ? 1 : 0;
            if (waitForScores) {
                waitDrawn(display, w);
                both[i] = (Math.max(w.spectrumShownAt(), w.scoresShownAt()) - t0) / 1e6;
            }
        }
        return new Moves(spectrum, both, cpu, reused);
    }

    private static void pumpFor(Display display, long millis) {
        long limit = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < limit) {
            if (!display.readAndDispatch()) {
                display.timerExec(5, () -> { });
                display.sleep();
            }
        }
    }

    private static void waitFor(Display display, java.util.function.BooleanSupplier done) {
        long limit = System.currentTimeMillis() + 30_000;
        while (!done.getAsBoolean() && System.currentTimeMillis() < limit) {
            if (!display.readAndDispatch()) {
                display.timerExec(1, () -> { });
                display.sleep();
            }
        }
    }

    private static void waitDrawn(Display display, WorkbenchWindow w) {
        long limit = System.currentTimeMillis() + 30_000;
        while (System.currentTimeMillis() < limit) {
            while (display.readAndDispatch()) {
                // dispatch
            }
            QueueItem cur = w.queue().current();
            if (cur != null && w.shownItem() == cur && w.spectrumCanvas().chart() != null && !w.drawPending()) {
                return;
            }
            display.timerExec(1, () -> { });
            display.sleep();
        }
    }

    private static void report(String what, double[] ms) {
        double[] s = ms.clone();
        Arrays.sort(s);
        System.out.printf(Locale.ROOT, "BENCHMARK workbench %-46s median %.1f ms  p90 %.1f ms  max %.1f ms%n", what,
                s[s.length / 2], s[(int) (s.length * 0.9)], s[s.length - 1]);
    }
}
