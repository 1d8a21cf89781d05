package org.redward.launcher;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Wall-clock marks of the launcher's phases, printed to standard error at exit when the system
 * property {@code redward.trace.startup} is {@code true} (set it through
 * {@code REDWARD_JAVA_OPTS=-Dredward.trace.startup=true}). Costs one {@code nanoTime} per mark
 * otherwise. Each mark shows the milliseconds since the JVM started (as the JVM recorded it), the
 * wall time since the previous mark and the CPU time of the whole process (all threads: compiler
 * and collector included) since the previous mark; the CPU figure means more than the wall time
 * on a busy machine. Not thread-safe: the launcher's main thread only.
 */
final class StartupTrace {

    private final boolean on;
    private final long originNanos;
    private final long jvmToMainMillis;
    private final List<String> names = new ArrayList<>();
    private final List<Long> marks = new ArrayList<>();
    private final List<Long> cpuMarks = new ArrayList<>();
    private long originCpuNanos;

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
        if (on) {
            originCpuNanos = processCpuNanos();
        }
    }

    /** CPU time of the whole process (all threads, JIT and GC included), or -1 if unknown. */
    private static long processCpuNanos() {
        java.lang.management.OperatingSystemMXBean os = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        return os instanceof com.sun.management.OperatingSystemMXBean sun ? sun.getProcessCpuTime() : -1;
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
            cpuMarks.add(processCpuNanos());
        }
    }

    void print(PrintStream out) {
        if (!on) {
            return;
        }
        out.printf(Locale.ROOT, "startup: %6d ms  JVM start -> launcher main%n", jvmToMainMillis);
        long previous = originNanos;
        long previousCpu = originCpuNanos;
        for (int i = 0; i < names.size(); i++) {
            long t = marks.get(i);
            long c = cpuMarks.get(i);
            out.printf(Locale.ROOT, "startup: %6d ms  +%5d ms wall  +%5d ms cpu  %s%n", jvmToMainMillis + (t - originNanos) / 1_000_000,
                    (t - previous) / 1_000_000, (c - previousCpu) / 1_000_000, names.get(i));
            previous = t;
            previousCpu = c;
        }
        out.printf(Locale.ROOT, "startup: process CPU %d ms in all (JIT, GC and start-up of the JVM included)%n", cpuMarks.isEmpty() ? -1 : cpuMarks.get(cpuMarks.size() - 1) / 1_000_000);
    }
}
