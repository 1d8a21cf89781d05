package org.redward.formats.inputs.internal;

import java.nio.file.Path;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.registry.Provided;

/**
 * A stream of records over many files. Each file is read on a worker thread that hands records
 * over through a small queue (so reading overlaps with the consumer's work, and memory stays
 * bounded); the consumer waits at most the stall limit for each record. A file that stalls is
 * abandoned (its worker interrupted) and reported as one failed record. Not thread-safe: one
 * consumer.
 */
final class Batch implements SpectrumInputs.Stream {

    private static final int QUEUE = 16;
    private static final Object END = new Object();

    private final List<Expansion.Item> items;
    private final ReadOptions options;
    private final Supplier<List<Provided<SpectrumReader>>> readers;
    private final Supplier<List<Provided<InstrumentProfile>>> profiles;
    private final ExecutorService executor;

    private int nextItem;
    private int done;
    private BlockingQueue<Object> queue;
    private Future<?> worker;
    private volatile boolean closed;
    private SpectrumRecord pending;

    Batch(List<Expansion.Item> items, ReadOptions options, Supplier<List<Provided<SpectrumReader>>> readers,
            Supplier<List<Provided<InstrumentProfile>>> profiles, ExecutorService executor) {
        this.items = items;
        this.options = options;
        this.readers = readers;
        this.profiles = profiles;
        this.executor = executor;
    }

    @Override
    public int files() {
        return items.size();
    }

    @Override
    public int filesDone() {
        return done;
    }

    @Override
    public boolean hasNext() {
        if (pending == null) {
            pending = advance();
        }
        return pending != null;
    }

    @Override
    public SpectrumRecord next() {
        if (!hasNext()) {
            throw new NoSuchElementException();
        }
        SpectrumRecord r = pending;
        pending = null;
        return r;
    }

    private SpectrumRecord advance() {
        while (!closed) {
            if (queue == null) {
                if (nextItem >= items.size()) {
                    return null;
                }
                Expansion.Item item = items.get(nextItem++);
                if (item.problem() != null) {
                    done++;
                    return SpectrumRecord.failed(item.path(), -1, "", item.path() + ": " + item.problem());
                }
                BlockingQueue<Object> q = new ArrayBlockingQueue<>(QUEUE);
                queue = q;
                worker = executor.submit(() -> produce(item, q));
            }
            Object o;
            long limit = options.stallLimit().toMillis();
            try {
                o = queue.poll(limit, TimeUnit.MILLISECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                close();
                return null;
            }
            Expansion.Item item = items.get(nextItem - 1);
            if (o == null) {
                worker.cancel(true);
                queue = null;
                done++;
                return SpectrumRecord.failed(item.path(), -1, "", item.path() + ": abandoned: no spectrum came within "
                        + options.stallLimit().toSeconds() + " s (per-file time bound)");
            }
            if (o == END) {
                queue = null;
                done++;
                continue;
            }
            return (SpectrumRecord) o;
        }
        return null;
    }

    /** Worker: reads one file into the queue, then END. Skips silently a folder's file no reader knows. */
    private void produce(Expansion.Item item, BlockingQueue<Object> q) {
        Path file = item.path();
        try {
            byte[] head = Chooser.head(file);
            if (head.length == 0) {
                put(q, SpectrumRecord.failed(file, -1, "", file + ": the file is empty"));
                return;
            }
            Chooser.Choice c = Chooser.choose(file, head, options, readers.get(), profiles.get());
            if (!c.ok()) {
                if (!item.fromFolder()) {
                    put(q, SpectrumRecord.failed(file, -1, "", file + ": " + c.problem()));
                }
                return;
            }
            if (item.fromFolder() && c.score() < Chooser.FOLDER_MIN_SCORE && options.readerId().isEmpty()
                    && options.profileId().isEmpty()) {
                return;
            }
            String readerId = c.reader().id();
            String profileId = c.profile().map(InstrumentProfile::id).orElse("");
            try (SpectrumSource src = c.reader().service().open(file, c.profile())) {
                String layout = src.layout();
                while (!closed && src.hasNext()) {
                    put(q, src.next().from(readerId, profileId, layout));
                }
            } catch (SpectrumReadException e) {
                put(q, SpectrumRecord.failed(file, -1, "", e.getMessage()).from(readerId, profileId, ""));
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (Exception | Error e) {
            String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getClass().getSimpleName() + ": " + e.getMessage();
            try {
                put(q, SpectrumRecord.failed(file, -1, "", file + ": cannot be read (" + m + ")"));
            } catch (InterruptedException ie) {
                Thread.currentThread().interrupt();
            }
        } finally {
            try {
                q.offer(END, 1, TimeUnit.DAYS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    private void put(BlockingQueue<Object> q, SpectrumRecord r) throws InterruptedException {
        while (!closed && !q.offer(r, 100, TimeUnit.MILLISECONDS)) {
            // wait for the consumer
        }
    }

    @Override
    public void close() {
        closed = true;
        if (worker != null) {
            worker.cancel(true);
        }
        queue = null;
    }
}
