package org.redward.survey.internal;

import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.MemoryUsage;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.atomic.AtomicLong;

import javax.management.ListenerNotFoundException;
import javax.management.Notification;
import javax.management.NotificationEmitter;
import javax.management.NotificationListener;
import javax.management.openmbean.CompositeData;
import javax.management.openmbean.TabularData;

/**
 * The heap a run really needs: the peak, over the full (major) collections during the run, of the
 * heap in use right after each (the sum of the heap pools' usage after the collection, as the JVM
 * reports it in its collection notifications): the live heap. Also the peak after any collection,
 * which is an upper bound only: after a minor collection the old generation still holds the
 * garbage promoted into it, so that figure grows through a long run without a full collection even
 * when the live heap is flat. Unlike the pools' peak usage, neither counts garbage that was merely
 * waiting in the young generation.
 *
 * <p>Uses only the platform management API ({@code java.lang.management}, {@code javax.management}
 * open types): the notification's {@code gcInfo.memoryUsageAfterGc} table. Thread-safe.
 */
final class HeapWatch implements AutoCloseable {

    private final Set<String> heapPools = new HashSet<>();
    private final List<NotificationEmitter> emitters = new ArrayList<>();
    private final AtomicLong peakAfterGc = new AtomicLong(-1);
    private final AtomicLong peakAfterMajor = new AtomicLong(-1);
    private final AtomicLong collections = new AtomicLong();
    private final AtomicLong majors = new AtomicLong();
    private final NotificationListener listener = this::onNotification;

    HeapWatch() {
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                heapPools.add(p.getName());
            }
        }
        for (GarbageCollectorMXBean gc : ManagementFactory.getGarbageCollectorMXBeans()) {
            if (gc instanceof NotificationEmitter e) {
                e.addNotificationListener(listener, null, null);
                emitters.add(e);
            }
        }
    }

    private void onNotification(Notification n, Object handback) {
        if (!"com.sun.management.gc.notification".equals(n.getType()) || !(n.getUserData() instanceof CompositeData info)) {
            return;
        }
        try {
            CompositeData gcInfo = (CompositeData) info.get("gcInfo");
            TabularData after = (TabularData) gcInfo.get("memoryUsageAfterGc");
            long used = 0;
            for (Object row : after.values()) {
                CompositeData entry = (CompositeData) row;
                if (heapPools.contains((String) entry.get("key"))) {
                    used += MemoryUsage.from((CompositeData) entry.get("value")).getUsed();
                }
            }
            collections.incrementAndGet();
            peakAfterGc.accumulateAndGet(used, Math::max);
            if (String.valueOf(info.get("gcAction")).contains("major")) {
                majors.incrementAndGet();
                peakAfterMajor.accumulateAndGet(used, Math::max);
            }
        } catch (RuntimeException e) {
            // another JVM's notification layout: no figure rather than a wrong one
        }
    }

    /** Collections seen so far. */
    long collections() {
        return collections.get();
    }

    /** Peak heap in use after any collection, in bytes (an upper bound of the live heap); -1 if no collection happened. */
    long peakAfterCollectionBytes() {
        return peakAfterGc.get();
    }

    /** Peak heap in use after a full collection (the live heap), in bytes; -1 if no full collection happened. */
    long peakLiveBytes() {
        return peakAfterMajor.get();
    }

    /**
     * One line for the end of a run, e.g. {@code live heap (after full collections): peak 25 MiB
     * over 33 full collections; heap limit 94 MiB}.
     */
    String describe() {
        long max = Runtime.getRuntime().maxMemory();
        String limit = max == Long.MAX_VALUE ? "no heap limit" : String.format(Locale.ROOT, "heap limit %.0f MiB", max / 1048576.0);
        long peak = peakAfterGc.get();
        if (peak < 0) {
            long now = Runtime.getRuntime().totalMemory() - Runtime.getRuntime().freeMemory();
            return String.format(Locale.ROOT, "heap: no collection during the run; %.0f MiB in use at the end, garbage included (%s)",
                    now / 1048576.0, limit);
        }
        long live = peakAfterMajor.get();
        if (live >= 0) {
            return String.format(Locale.ROOT, "live heap (after full collections): peak %.0f MiB over %d full collections"
                    + " (%d collections in all; %s)", live / 1048576.0, majors.get(), collections.get(), limit);
        }
        return String.format(Locale.ROOT, "heap: no full collection during the run; in use after minor collections at most %.0f MiB"
                + " (old-generation garbage included, so the live heap was at most that; %d collections; %s)",
                peak / 1048576.0, collections.get(), limit);
    }

    @Override
    public void close() {
        for (NotificationEmitter e : emitters) {
            try {
                e.removeNotificationListener(listener);
            } catch (ListenerNotFoundException ex) {
                // already gone
            }
        }
    }
}
