package org.redward.workbench.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Display;

/**
 * One run of the workbench on the UI thread: opens the journal and the window, fills the queue,
 * runs the event loop until the window closes (or, for a snapshot, until the first spectrum is
 * drawn), then closes the journal. Call {@link #run} on the display's thread.
 */
final class Session {

    /** What the run did. */
    record Result(int status, int spectra, int decided, double firstWindowMs, long firstWindowNanos, List<String> messages,
            List<String[]> services, Timeline timeline) {
    }

    /**
     * When the window came up, as wall-clock times (epoch milliseconds, so that a benchmark that
     * launched the process can compare them with its own clock): the window built, opened (shown
     * on screen) and first painted.
     */
    record Timeline(long buildStartEpochMs, long builtEpochMs, long openedEpochMs, long firstPaintEpochMs, long cpuMsAtFirstPaint) {
    }

    /**
     * CPU time of the whole process so far (user + system, all threads), in ms, from
     * /proc/self/stat (Linux; clock ticks of 10 ms, the usual USER_HZ of 100); -1 elsewhere.
     */
    static long processCpuMs() {
        try {
            String stat = java.nio.file.Files.readString(Path.of("/proc/self/stat"));
            String[] f = stat.substring(stat.lastIndexOf(')') + 2).split(" ");
            // after the command name: state is field 3 of the line, utime 14 and stime 15
            return (Long.parseLong(f[11]) + Long.parseLong(f[12])) * 10;
        } catch (IOException | RuntimeException e) {
            return -1;
        }
    }

    private final Display display;
    private final Backend backend;
    private final Path journalFile;
    private final List<String> estimators;
    private final List<Path> files;
    private final int width;
    private final int height;
    private final long startedNanos;

    Session(Display display, Backend backend, Path journalFile, List<String> estimators, List<Path> files, int width, int height,
            long startedNanos) {
        this.display = display;
        this.backend = backend;
        this.journalFile = journalFile;
        this.estimators = estimators;
        this.files = files;
        this.width = width;
        this.height = height;
        this.startedNanos = startedNanos;
    }

    /**
     * Runs the window; {@code install} are bundle jars installed through the window (as its
     * install button does) once the queue is filled.
     */
    Result run(Path snapshot, Path export, List<Path> install) throws IOException {
        List<String> messages = new ArrayList<>();
        try (Journal journal = Journal.open(journalFile)) {
            if (journal.unreadableLines() > 0) {
                messages.add("journal " + journalFile + ": " + journal.unreadableLines() + " line(s) could not be read and were skipped");
            }
            long buildStart = System.currentTimeMillis();
            long[] firstPaint = {0, -1};
            org.eclipse.swt.widgets.Listener painted = e -> {
                if (firstPaint[0] == 0) {
                    firstPaint[0] = System.currentTimeMillis();
                    firstPaint[1] = processCpuMs();
                }
            };
            display.addFilter(org.eclipse.swt.SWT.Paint, painted);
            WorkbenchWindow w = new WorkbenchWindow(display, backend, journal, estimators);
            long built = System.currentTimeMillis();
            w.open(width, height);
            long opened = System.currentTimeMillis();
            long shownAt = System.nanoTime();
            // until the window has painted (at most 5 s: a display that never paints must not hang the command)
            long paintLimit = System.nanoTime() + 5_000_000_000L;
            while (firstPaint[0] == 0 && System.nanoTime() < paintLimit) {
                if (!display.readAndDispatch()) {
                    display.timerExec(5, () -> { });
                    display.sleep();
                }
            }
            while (display.readAndDispatch()) {
                // first paint
            }
            display.removeFilter(org.eclipse.swt.SWT.Paint, painted);
            Timeline timeline = new Timeline(buildStart, built, opened, firstPaint[0], firstPaint[1]);
            if (estimators.isEmpty()) {
                w.message("no redshift estimator is installed: spectra are shown without a machine redshift");
            }
            w.add(files);
            for (Path jar : install) {
                w.install(jar);
            }
            if (snapshot != null) {
                // wait (at most a minute) until the first spectrum is read, estimated and drawn;
                // a timer wakes the loop so that sleep() cannot wait for an event that never comes
                long limit = System.nanoTime() + 60_000_000_000L;
                while (System.nanoTime() < limit) {
                    while (display.readAndDispatch()) {
                        // dispatch
                    }
                    if (!w.drawPending()) {
                        break;
                    }
                    display.timerExec(25, () -> { });
                    display.sleep();
                }
                w.snapshot(snapshot);
            } else {
                while (!w.shell().isDisposed()) {
                    if (!display.readAndDispatch()) {
                        display.sleep();
                    }
                }
            }
            messages.addAll(w.messages());
            int spectra = w.queue().all().size();
            int decided = w.queue().decidedCount();
            if (export != null) {
                Catalogue.write(w.queue().all(), export);
            }
            if (!w.shell().isDisposed()) {
                w.shell().dispose();
            }
            List<String[]> services = backend.services();
            return new Result(0, spectra, decided, (shownAt - startedNanos) / 1e6, shownAt, messages, services, timeline);
        }
    }
}
