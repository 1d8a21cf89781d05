package org.redward.survey.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;

import org.redward.api.formats.SpectrumRecord;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/**
 * The engine of a run, free of OSGi: one reader thread streams spectra from a {@link Feed},
 * worker threads measure them through an {@link Estimation}, and the calling thread collects the
 * rows in input order and hands them to a sink (the journal). Memory is bounded by the window of
 * spectra in flight (sixteen per worker and sixteen more, so that one slow spectrum does not leave
 * the other workers idle), not by the number of spectra.
 *
 * <p>Isolation: an estimation that throws gives a failed row (fault {@code threw}); one that
 * returns a non-finite z or error or a z outside the searched range gives a failed row (fault
 * {@code nonsense}); one that runs beyond the time limit is abandoned (its thread interrupted and
 * replaced) and gives a failed row (fault {@code timed_out}). After {@link #MAX_HUNG} abandoned
 * threads are still alive the estimator is disabled for the rest of the run (its spectra fail at
 * once, saying so), so that a plug-in that hangs on everything cannot exhaust the machine.
 *
 * <p>Lines (optional): with a {@link LineStep}, every row the estimator gave ok goes on to the
 * line step on the same worker, inside the same time bound. A line step that throws or overruns
 * the time limit leaves the row ok without lines and with a warning naming the reason (after
 * {@link #MAX_HUNG} overruns the step is skipped for the rest of the run, saying so); its bundle
 * is listed among the misbehaving. Without a line step nothing of this runs.
 *
 * <p>One run per instance; not reusable.
 */
final class Pipeline {

    /** Abandoned (hung) worker threads still alive beyond which the estimator is disabled. */
    static final int MAX_HUNG = 8;

    private final int threads;
    private final Duration timeLimit;
    private final Estimation estimation;
    private final double zMin;
    private final double zMax;
    private final LineStep lineStep;

    private final BlockingQueue<Task> work = new LinkedBlockingQueue<>();
    private final AtomicInteger hungAlive = new AtomicInteger();
    private final AtomicInteger workerCount = new AtomicInteger();
    private volatile String disabledReason;
    private volatile String linesDisabledReason;
    private final AtomicInteger linesHung = new AtomicInteger();
    private final Map<String, int[]> faults = new TreeMap<>();
    private final Map<String, String> faultExamples = new TreeMap<>();

    Pipeline(int threads, Duration timeLimit, Estimation estimation, double zMin, double zMax) {
        this(threads, timeLimit, estimation, zMin, zMax, null);
    }

    /** @param lineStep the line step run after every ok estimate, or null for none (no per-spectrum cost) */
    Pipeline(int threads, Duration timeLimit, Estimation estimation, double zMin, double zMax, LineStep lineStep) {
        this.lineStep = lineStep;
        this.threads = Math.max(1, threads);
        this.timeLimit = timeLimit;
        this.estimation = estimation;
        this.zMin = zMin;
        this.zMax = zMax;
    }

    /** One spectrum in flight. */
    private static final class Task {
        final long sequence;
        final SpectrumRecord record;
        final CompletableFuture<MeasuredRow> result = new CompletableFuture<>();
        final AtomicReference<Thread> thread = new AtomicReference<>();
        volatile long startNanos;
        /** The estimator's ok row while the line step runs (given without lines if that step overruns). */
        volatile MeasuredRow beforeLines;

        Task(long sequence, SpectrumRecord record) {
            this.sequence = sequence;
            this.record = record;
        }
    }

    private static final Task END = new Task(-1, null);
    private static final Task STOP = new Task(-2, null);

    /**
     * Runs the feed to its end.
     *
     * @param skip spectra at the start of the feed that an interrupted run already did: read and
     *     passed over (not measured); the first measured spectrum gets this sequence number
     * @param sink receives every row in input order, on the calling thread
     * @return the number of rows collected
     */
    long run(Feed feed, long skip, Consumer<MeasuredRow> sink) throws IOException, InterruptedException {
        int window = 16 * threads + 16;
        BlockingQueue<Task> ordered = new ArrayBlockingQueue<>(window);
        AtomicReference<Throwable> readFailure = new AtomicReference<>();
        Thread reader = new Thread(() -> readLoop(feed, skip, ordered, readFailure), "redward-measure-reader");
        reader.setDaemon(true);
        for (int i = 0; i < threads; i++) {
            startWorker();
        }
        reader.start();
        long collected = 0;
        try {
            while (true) {
                Task t = ordered.take();
                if (t == END) {
                    break;
                }
                MeasuredRow row = await(t);
                sink.accept(row);
                collected++;
            }
        } finally {
            reader.interrupt();
            for (int i = 0; i < workerCount.get() + 1; i++) {
                work.offer(STOP);
            }
        }
        Throwable f = readFailure.get();
        if (f instanceof IOException io) {
            throw io;
        } else if (f != null) {
            throw new IOException("reading the inputs failed: " + f, f);
        }
        return collected;
    }

    /** Bundles at fault: bundle to "N threw, M timed out, K nonsense; e.g. reason". */
    Map<String, String> misbehaving() {
        synchronized (faults) {
            Map<String, String> out = new TreeMap<>();
            for (Map.Entry<String, int[]> e : faults.entrySet()) {
                int[] c = e.getValue();
                out.put(e.getKey(), String.format(Locale.ROOT, "%d threw, %d timed out, %d nonsense, %d unreadable; e.g. %s",
                        c[0], c[1], c[2], c[3], faultExamples.get(e.getKey())));
            }
            return out;
        }
    }

    private void readLoop(Feed feed, long skip, BlockingQueue<Task> ordered, AtomicReference<Throwable> failure) {
        long seq = 0;
        try {
            while (true) {
                SpectrumRecord item;
                try {
                    item = feed.next();
                } catch (IOException | RuntimeException e) {
                    failure.set(e);
                    break;
                }
                if (item == null) {
                    break;
                }
                if (seq < skip) {
                    seq++;
                    continue;
                }
                Task t = new Task(seq++, item);
                ordered.put(t);
                if (item.ok()) {
                    work.put(t);
                } else {
                    t.result.complete(unreadable(t));
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return;
        } finally {
            try {
                ordered.put(END);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    private void startWorker() {
        workerCount.incrementAndGet();
        Thread w = new Thread(this::workLoop, "redward-measure-worker");
        w.setDaemon(true);
        w.start();
    }

    private void workLoop() {
        try {
            while (true) {
                Task t = work.take();
                if (t == STOP) {
                    return;
                }
                if (!t.thread.compareAndSet(null, Thread.currentThread())) {
                    continue;
                }
                t.startNanos = System.nanoTime();
                MeasuredRow row = measure(t);
                boolean mine = t.result.complete(row);
                if (!mine) {
                    // the collector gave up on this task and started a replacement worker: leave
                    hungAlive.decrementAndGet();
                    Thread.interrupted();
                    return;
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } finally {
            workerCount.decrementAndGet();
        }
    }

    private MeasuredRow await(Task t) throws InterruptedException {
        long limitNanos = timeLimit.toNanos();
        while (true) {
            long started = t.startNanos;
            long waitNanos = started == 0 ? TimeUnit.MILLISECONDS.toNanos(100) : started + limitNanos - System.nanoTime();
            // a task done in time but collected late (behind a slow one) is not timed out: counts only when this completes it
            if (started != 0 && waitNanos <= 0 && !t.result.isDone()) {
                if (t.beforeLines != null) {
                    linesTimedOut(t);
                } else {
                    estimatorTimedOut(t);
                }
            }
            try {
                return t.result.get(Math.max(1, waitNanos), TimeUnit.NANOSECONDS);
            } catch (TimeoutException e) {
                // loop: check the time limit again
            } catch (ExecutionException e) {
                return fault(base(t), MeasuredRow.FAULT_THREW, "internal error: " + e.getCause()).build();
            }
        }
    }

    /** Gives up the task's worker thread (interrupted, left to end on its own) and starts another. */
    private void abandon(Task t) {
        hungAlive.incrementAndGet();
        Thread th = t.thread.get();
        if (th != null) {
            th.interrupt();
        }
        startWorker();
    }

    /**
     * The estimator ran beyond the time limit: the task fails (fault timed_out) and its thread is
     * abandoned; after {@link #MAX_HUNG} such threads the estimator is disabled for the rest of the run.
     */
    private void estimatorTimedOut(Task t) {
        String reason = String.format(Locale.ROOT, "estimator gave no answer within the time limit of %s s (bundle %s); abandoned",
                seconds(timeLimit), estimation.bundle());
        if (!t.result.complete(base(t).failed(reason).fault(MeasuredRow.FAULT_TIMED_OUT, estimation.bundle()).build())) {
            return;
        }
        count(estimation.bundle(), MeasuredRow.FAULT_TIMED_OUT, reason);
        abandon(t);
        if (hungAlive.get() >= MAX_HUNG && disabledReason == null) {
            disabledReason = "estimator disabled for the rest of the run after " + MAX_HUNG
                    + " spectra exceeded the time limit (bundle " + estimation.bundle() + ")";
        }
    }

    /**
     * The line step ran beyond the time limit: the task gets the estimator's row, kept ok, with a
     * warning naming the line finder's bundle, and its thread is abandoned.
     */
    private void linesTimedOut(Task t) {
        String reason = String.format(Locale.ROOT, "lines not measured: the line step ran beyond the time limit of %s s (bundle %s); abandoned",
                seconds(timeLimit), lineStep.bundle());
        if (!t.result.complete(t.beforeLines.toBuilder().warning(reason).build())) {
            return;
        }
        count(lineStep.bundle(), MeasuredRow.FAULT_TIMED_OUT, reason);
        abandon(t);
        if (linesHung.incrementAndGet() >= MAX_HUNG && linesDisabledReason == null) {
            linesDisabledReason = "lines not measured: the line step was disabled for the rest of the run after " + MAX_HUNG
                    + " spectra exceeded the time limit (bundle " + lineStep.bundle() + ")";
        }
    }

    /**
     * The line step on an ok row: the row with its lines, or, if the step throws, the row still ok
     * with a warning naming the reason (the line finder's bundle is counted as misbehaving).
     */
    private MeasuredRow withLines(Task t, Spectrum s, MeasuredRow r) {
        String disabled = linesDisabledReason;
        if (disabled != null) {
            return r.toBuilder().warning(disabled).build();
        }
        t.beforeLines = r;
        try {
            return lineStep.measure(t.record, s, r);
        } catch (Throwable e) {
            if (e instanceof InterruptedException) {
                Thread.currentThread().interrupt();
            }
            String reason = "lines not measured: the line step threw " + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage()) + " (bundle " + lineStep.bundle() + ")";
            count(lineStep.bundle(), MeasuredRow.FAULT_THREW, reason);
            return r.toBuilder().warning(reason).build();
        }
    }

    private MeasuredRow measure(Task t) {
        MeasuredRow.Builder row = base(t);
        String disabled = disabledReason;
        if (disabled != null) {
            return row.failed(disabled).build();
        }
        Spectrum s = t.record.spectrum().orElseThrow();
        long t0 = System.nanoTime();
        try {
            estimation.measure(s, row);
        } catch (Nonsense e) {
            return fault(base(t), MeasuredRow.FAULT_NONSENSE, "estimator returned nonsense: " + e.getMessage()
                    + " (bundle " + estimation.bundle() + ")").seconds(seconds(t0)).build();
        } catch (Throwable e) {
            if (e instanceof InterruptedException) {
                Thread.currentThread().interrupt();
            }
            if (e instanceof VirtualMachineError && !(e instanceof StackOverflowError)) {
                if (e instanceof OutOfMemoryError) {
                    return fault(base(t), MeasuredRow.FAULT_THREW, "estimator ran out of memory (bundle " + estimation.bundle() + ")").build();
                }
            }
            String msg = e.getMessage() == null ? "" : ": " + e.getMessage();
            return fault(base(t), MeasuredRow.FAULT_THREW, "estimator threw " + e.getClass().getSimpleName() + msg
                    + " (bundle " + estimation.bundle() + ")").seconds(seconds(t0)).build();
        }
        row.seconds(seconds(t0));
        MeasuredRow r;
        try {
            r = row.build();
        } catch (IllegalStateException e) {
            return fault(base(t), MeasuredRow.FAULT_NONSENSE, "estimator returned an OK solution without a finite z (bundle "
                    + estimation.bundle() + ")").build();
        }
        if (r.ok()) {
            String bad = nonsense(r);
            if (bad != null) {
                return fault(base(t), MeasuredRow.FAULT_NONSENSE, "estimator returned nonsense: " + bad + " (bundle "
                        + estimation.bundle() + ")").estimator(r.estimator()).build();
            }
            if (lineStep != null) {
                r = withLines(t, s, r);
            }
        }
        return r;
    }

    private String nonsense(MeasuredRow r) {
        double tol = 1e-6;
        if (r.z() < zMin - tol || r.z() > zMax + tol) {
            return String.format(Locale.ROOT, "z = %.6g outside the searched range [%g, %g]", r.z(), zMin, zMax);
        }
        double e = r.zErr();
        if (Double.isInfinite(e) || e < 0) {
            return "z error = " + e;
        }
        return null;
    }

    private MeasuredRow.Builder base(Task t) {
        SpectrumRecord rec = t.record;
        MeasuredRow.Builder b = MeasuredRow.builder().sequence(t.sequence)
                .source(rec.file().toString(), rec.index(), rec.location()).estimator(estimation.id());
        SpectrumMetadata m = rec.spectrum().map(Spectrum::metadata).orElse(SpectrumMetadata.EMPTY);
        b.id(m.objectId().orElseGet(() -> defaultId(rec.file(), rec.index())));
        b.sky(m.raDeg(), m.decDeg());
        return b;
    }

    static String defaultId(Path file, int index) {
        Path name = file.getFileName();
        return (name == null ? file.toString() : name.toString()) + (index >= 0 ? "#" + index : "");
    }

    private MeasuredRow unreadable(Task t) {
        return base(t).failed(t.record.error()).build();
    }

    private MeasuredRow.Builder fault(MeasuredRow.Builder row, String what, String reason) {
        String bundle = estimation.bundle();
        count(bundle, what, reason);
        return row.failed(reason).fault(what, bundle);
    }

    /** Counts a misbehaviour of a bundle (for {@link #misbehaving()}). */
    private void count(String bundle, String what, String reason) {
        synchronized (faults) {
            int[] c = faults.computeIfAbsent(bundle, k -> new int[4]);
            switch (what) {
                case MeasuredRow.FAULT_THREW -> c[0]++;
                case MeasuredRow.FAULT_TIMED_OUT -> c[1]++;
                case MeasuredRow.FAULT_NONSENSE -> c[2]++;
                default -> c[3]++;
            }
            faultExamples.putIfAbsent(bundle, reason);
        }
    }

    private static double seconds(long t0) {
        return (System.nanoTime() - t0) * 1e-9;
    }

    private static String seconds(Duration d) {
        return String.format(Locale.ROOT, "%.3g", d.toNanos() * 1e-9);
    }
}
