package org.redward.launcher;

import java.util.concurrent.BlockingQueue;
import java.util.concurrent.Executor;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;

/**
 * Runs tasks on the launcher's main thread (the first thread of the process), which a UI
 * toolkit may need. Registered as an {@link Executor} service with {@code redward.thread=main}.
 * The main thread drains the queue until the command has finished.
 */
final class MainThreadExecutor implements Executor {

    private final BlockingQueue<Runnable> queue = new LinkedBlockingQueue<>();

    @Override
    public void execute(Runnable task) {
        queue.add(task);
    }

    /** Called on the main thread: runs queued tasks until {@code done} says stop. */
    void runUntil(BooleanSupplier done) throws InterruptedException {
        while (!done.getAsBoolean()) {
            Runnable r = queue.poll(20, TimeUnit.MILLISECONDS);
            if (r != null) {
                try {
                    r.run();
                } catch (RuntimeException | Error e) {
                    System.err.println("redward: a task on the main thread failed: " + e);
                }
            }
        }
    }
}
