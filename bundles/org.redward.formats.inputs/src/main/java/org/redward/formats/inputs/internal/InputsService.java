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
    public List<Path> expand(List<Path> inputs) {
        List<Path> out = new ArrayList<>();
        for (Expansion.Item i : Expansion.expand(inputs)) {
            out.add(i.path());
        }
        return out;
    }
}
