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
 * The heap a run really needs: the peak, over the garbage collections during the run, of the heap
 * in use right after each collection (the sum of the heap pools' usage after the collection, as the
 * JVM reports it in its collection notifications). Unlike the pools' peak usage, this leaves out
 * garbage that was merely waiting to be collected, so it is the figure to compare with
 * {@code -Xmx} and to watch for growth with the number of spectra.
 *
 * <p>Uses only the platform management API ({@code java.lang.management}, {@code javax.management}
 * open types): the notification's {@code gcInfo.memoryUsageAfterGc} table. Thread-safe.
 */
final class HeapWatch implements AutoCloseable {

    private final Set<String> heapPools = new HashSet<>();
    private final List<NotificationEmitter> emitters = new ArrayList<>();
    private final AtomicLong peakAfterGc = new AtomicLong(-1);
    private final AtomicLong collections = new AtomicLong();
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
        } catch (RuntimeException e) {
            // another JVM's notification layout: no figure rather than a wrong one
        }
    }

    /** Collections seen so far. */
    long collections() {
        return collections.get();
    }

    /** Peak heap in use after a collection, in bytes; -1 if no collection happened. */
    long peakAfterCollectionBytes() {
        return peakAfterGc.get();
    }

    /** One line for the end of a run, e.g. {@code heap in use after collections: peak 212 MiB (41 collections; -Xmx 1024 MiB)}. */
    String describe() {
        long max = Runtime.getRuntime().maxMemory();
        String limit = max == Long.MAX_VALUE ? "no heap limit" : String.format(Locale.ROOT, "heap limit %.0f MiB", max / 1048576.0);
        long peak = peakAfterGc.get();
        if (peak < 0) {
            long now = Runtime.getRuntime().totalMemory() - Runtime.getRuntime().freeMemory();
            return String.format(Locale.ROOT, "heap: no collection during the run; %.0f MiB in use at the end, garbage included (%s)",
                    now / 1048576.0, limit);
        }
        return String.format(Locale.ROOT, "heap in use after collections: peak %.0f MiB (%d collections; %s)",
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
