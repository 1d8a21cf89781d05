package org.redward.launcher;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Wall-clock marks of the launcher's phases, printed to standard error at exit when the system
 * property {@code redward.trace.startup} is {@code true} (set it through
 * {@code REDWARD_JAVA_OPTS=-Dredward.trace.startup=true}). Costs one {@code nanoTime} per mark
 * otherwise. Times are milliseconds since the JVM started (as the JVM recorded it) and since the
 * previous mark. Not thread-safe: the launcher's main thread only.
 */
final class StartupTrace {

    private final boolean on;
    private final long originNanos;
    private final long jvmToMainMillis;
    private final List<String> names = new ArrayList<>();
    private final List<Long> marks = new ArrayList<>();

    StartupTrace(boolean on) {
        this.on = on;
        this.originNanos = System.nanoTime();
        long toMain = -1;
        if (on) {
            // the JVM's own record of its start (the operating system's process start time is
            // only known to the second here); loading the management classes costs a little,
            // paid only when tracing
            toMain = System.currentTimeMillis() - java.lang.management.ManagementFactory.getRuntimeMXBean().getStartTime();
        }
        this.jvmToMainMillis = toMain;
    }

    static StartupTrace fromSystemProperty() {
        return new StartupTrace(Boolean.getBoolean("redward.trace.startup"));
    }

    boolean on() {
        return on;
    }

    void mark(String name) {
        if (on) {
            names.add(name);
            marks.add(System.nanoTime());
        }
    }

    void print(PrintStream out) {
        if (!on) {
            return;
        }
        out.printf(Locale.ROOT, "startup: %6d ms  JVM start -> launcher main%n", jvmToMainMillis);
        long previous = originNanos;
        for (int i = 0; i < names.size(); i++) {
            long t = marks.get(i);
            out.printf(Locale.ROOT, "startup: %6d ms  +%5d ms  %s%n", jvmToMainMillis + (t - originNanos) / 1_000_000,
                    (t - previous) / 1_000_000, names.get(i));
            previous = t;
        }
    }
}
