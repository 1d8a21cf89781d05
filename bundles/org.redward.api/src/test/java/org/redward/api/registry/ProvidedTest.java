package org.redward.api.registry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

/** The lazily obtained service of a listed provider (registries list without activating). */
class ProvidedTest {

    @Test
    void listingDoesNotObtainTheService() {
        AtomicInteger calls = new AtomicInteger();
        Provided<String> p = Provided.lazy("a", () -> "service-" + calls.incrementAndGet(), "bsn", "1.0.0", "desc", Map.of("k", 1));
        assertEquals("a", p.id());
        assertEquals("desc", p.description());
        assertEquals(1, p.properties().get("k"));
        assertEquals(0, calls.get());
        assertEquals("service-1", p.service());
        assertEquals("service-1", p.service());
        assertEquals(1, calls.get());
    }

    @Test
    void manyThreadsAtOnceObtainOneService() throws Exception {
        AtomicInteger calls = new AtomicInteger();
        Provided<Object> p = Provided.lazy("a", () -> {
            calls.incrementAndGet();
            return new Object();
        }, "bsn", "1.0.0", "", Map.of());
        CountDownLatch go = new CountDownLatch(1);
        List<Object> seen = java.util.Collections.synchronizedList(new ArrayList<>());
        List<Thread> threads = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            Thread t = new Thread(() -> {
                try {
                    go.await();
                    seen.add(p.service());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            });
            t.start();
            threads.add(t);
        }
        go.countDown();
        for (Thread t : threads) {
            t.join();
        }
        assertEquals(1, calls.get());
        assertEquals(8, seen.size());
        for (Object o : seen) {
            assertSame(seen.get(0), o);
        }
    }

    @Test
    void aProviderThatCannotProvideIsNamedInOneLine() {
        Provided<String> p = Provided.lazy("broken", () -> null, "org.example.broken", "2.1.0", "", Map.of());
        IllegalStateException e = assertThrows(IllegalStateException.class, p::service);
        assertTrue(e.getMessage().contains("'broken'") && e.getMessage().contains("org.example.broken 2.1.0"), e.getMessage());
        assertTrue(!e.getMessage().contains("\n"));
    }
}
