package org.redward.api.formats;

import java.io.IOException;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * The spectra of one open file, streamed one at a time: a file of 100,000 spectra is never held
 * whole in memory. Not thread-safe: one consumer at a time. Close it when done.
 */
@ConsumerType
public interface SpectrumSource extends AutoCloseable {

    /** A short description of the layout understood (e.g. {@code FITS binary table, log10 wavelength column}). */
    String layout();

    /** Number of spectra in the file, or -1 if unknown before reading. */
    long count();

    /** True if another record follows. */
    boolean hasNext() throws IOException;

    /** The next spectrum, or a record of why it could not be read. */
    SpectrumRecord next() throws IOException;

    @Override
    void close() throws IOException;
}
