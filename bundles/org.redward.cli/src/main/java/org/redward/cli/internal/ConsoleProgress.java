package org.redward.cli.internal;

import java.io.PrintStream;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;

import org.redward.api.commands.Progress;

/**
 * Progress on standard error: on a terminal a bar redrawn in place with count, rate and time
 * left (at most 5 times a second); otherwise one line every 10 seconds and a final line.
 */
final class ConsoleProgress implements Progress {

    private static final int WIDTH = 28;

    private final PrintStream err;
    private final String label;
    private final boolean terminal;
    private final AtomicLong done = new AtomicLong();
    private final long startNanos = System.nanoTime();
    private volatile long total;
    private volatile long lastDrawNanos;
    private volatile boolean closed;

    ConsoleProgress(PrintStream err, String label, long total, boolean terminal) {
        this.err = err;
        this.label = label;
        this.total = total;
        this.terminal = terminal;
        this.lastDrawNanos = startNanos;
    }

    @Override
    public void advance(long items) {
        done.addAndGet(items);
        long now = System.nanoTime();
        long interval = terminal ? 200_000_000L : 10_000_000_000L;
        if (now - lastDrawNanos >= interval) {
            synchronized (this) {
                if (now - lastDrawNanos >= interval && !closed) {
                    lastDrawNanos = now;
                    draw(false);
                }
            }
        }
    }

    @Override
    public void total(long t) {
        total = t;
    }

    @Override
    public synchronized void close() {
        if (!closed) {
            closed = true;
            draw(true);
        }
    }

    private void draw(boolean last) {
        long n = done.get();
        double seconds = Math.max(1e-9, (System.nanoTime() - startNanos) / 1e9);
        double rate = n / seconds;
        String line;
        if (total > 0) {
            double f = Math.min(1.0, (double) n / total);
            int full = (int) Math.round(f * WIDTH);
            String bar = "#".repeat(full) + "-".repeat(WIDTH - full);
            String eta = rate > 0 && n < total ? formatSeconds((total - n) / rate) + " left" : formatSeconds(seconds) + " taken";
            line = String.format(Locale.ROOT, "%s [%s] %d/%d  %.1f/s  %s", label, bar, n, total, rate, eta);
        } else {
            line = String.format(Locale.ROOT, "%s %d  %.1f/s  %s", label, n, rate, formatSeconds(seconds));
        }
        if (terminal) {
            err.print("\r" + line + "\u001b[K" + (last ? "\n" : ""));
        } else {
            err.println(line);
        }
        err.flush();
    }

    static String formatSeconds(double s) {
        if (s < 60) {
            return String.format(Locale.ROOT, "%.1f s", s);
        }
        long t = Math.round(s);
        return t < 3600 ? String.format(Locale.ROOT, "%d min %02d s", t / 60, t % 60)
                : String.format(Locale.ROOT, "%d h %02d min", t / 3600, (t % 3600) / 60);
    }
}
