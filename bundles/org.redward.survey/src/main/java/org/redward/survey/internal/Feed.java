package org.redward.survey.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.redward.api.formats.SpectrumRecord;

/**
 * The spectra of a run in input order. One consumer thread. Never throws for bad data: a file
 * that cannot be read yields a failed record. Reading is deterministic: the same inputs give the
 * same records in the same order, which is what lets a resumed run skip what was done.
 */
interface Feed extends AutoCloseable {

    /** The next record, or null at the end. */
    SpectrumRecord next() throws IOException;

    @Override
    void close();

    /** Where a run's spectra come from. */
    interface Source {
        /** The files the inputs stand for, in order (for checksums and the run's fingerprint). */
        List<Path> expand(List<Path> inputs);

        /** Opens the inputs for streaming. */
        Feed open(List<Path> inputs);
    }
}
