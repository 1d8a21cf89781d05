package org.redward.formats.inputs.internal;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;

import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.formats.ProfileRegistry;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumSource;

/** The reading facade: see {@link SpectrumInputs}. Thread-safe. */
@Component(service = SpectrumInputs.class)
public final class InputsService implements SpectrumInputs {

    @Reference
    private ReaderRegistry readers;

    @Reference
    private ProfileRegistry profiles;

    private ExecutorService executor;

    public InputsService() {
    }

    /** For tests and plain-Java use: the service over the given registries. */
    public InputsService(ReaderRegistry readers, ProfileRegistry profiles) {
        this.readers = readers;
        this.profiles = profiles;
        activate();
    }

    @Activate
    void activate() {
        AtomicInteger n = new AtomicInteger();
        executor = Executors.newCachedThreadPool(r -> {
            Thread t = new Thread(r, "redward-read-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
    }

    @Deactivate
    void deactivate() {
        executor.shutdownNow();
    }

    @Override
    public Stream open(List<Path> inputs, ReadOptions options) {
        return new Batch(Expansion.expand(inputs), options, readers::providers, profiles::providers, executor);
    }

    @Override
    public long[] counts(List<Path> inputs, ReadOptions options) {
        List<Expansion.Item> items = Expansion.expand(inputs);
        long[] out = new long[items.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = count(items.get(i), options);
        }
        return out;
    }

    /** The spectra of one file by its reader's count (the same choice of reader and profile as {@link Batch}). */
    private long count(Expansion.Item item, ReadOptions options) {
        if (item.problem() != null) {
            return -1;
        }
        Path file = item.path();
        try {
            byte[] head = Chooser.head(file);
            if (head.length == 0) {
                return -1;
            }
            Chooser.Choice c = Chooser.choose(file, head, options, readers.providers(), profiles.providers());
            if (!c.ok()) {
                return item.fromFolder() ? 0 : -1;
            }
            if (item.fromFolder() && c.score() < Chooser.FOLDER_MIN_SCORE && options.readerId().isEmpty()
                    && options.profileId().isEmpty()) {
                return 0;
            }
            try (SpectrumSource src = c.reader().service().open(file, c.profile())) {
                return src.count();
            }
        } catch (Exception | LinkageError e) {
            return -1;
        }
    }

    @Override
    public List<Path> expand(List<Path> inputs) {
        List<Path> out = new ArrayList<>();
        for (Expansion.Item i : Expansion.expand(inputs)) {
            out.add(i.path());
        }
        return out;
    }
}
