package org.redward.api.formats;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.osgi.annotation.versioning.ConsumerType;
import org.redward.spectrum.Spectrum;

/**
 * Writes spectra to a file of one format, streaming: spectra are written as they come, never
 * gathered first. Registered as a service with {@value org.redward.api.registry.Provided#ID},
 * {@value org.redward.api.registry.Provided#DESCRIPTION} and {@link #EXTENSIONS}.
 *
 * <p>Contract: what a writer writes, the reader of the same bundle reads back with the same
 * vacuum wavelengths, flux, inverse variance, mask, flux unit and metadata (exact to at least
 * float precision). Thread-safe; each {@link Sink} is for one thread.
 */
@ConsumerType
public interface SpectrumWriter {

    /** Service property: the file name endings this writer handles, e.g. {@code .fits,.fit}. */
    String EXTENSIONS = "redward.extensions";

    /** The file name endings handled (lower case, with the dot). */
    List<String> extensions();

    /** Creates (or replaces) the file and returns a sink for its spectra. */
    Sink open(Path file) throws IOException;

    /** An open output file. */
    interface Sink extends AutoCloseable {
        void write(Spectrum spectrum) throws IOException;

        /** Finishes the file (the file is complete only after close). */
        @Override
        void close() throws IOException;
    }
}
