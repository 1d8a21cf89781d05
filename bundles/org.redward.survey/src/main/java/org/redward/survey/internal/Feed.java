package org.redward.survey.internal;

import java.io.IOException;

import org.redward.api.formats.SpectrumRecord;

/**
 * The spectra of a run in input order, each with the ordinal of its file in the expanded input
 * list (the journal uses it to resume). One consumer thread. Never throws for bad data: a file
 * that cannot be read yields a failed record.
 */
interface Feed extends AutoCloseable {

    /** One spectrum (or failed file) and the 0-based number of its file in the expanded inputs. */
    record Item(int fileNumber, SpectrumRecord record) {
    }

    /** The next item, or null at the end. */
    Item next() throws IOException;

    @Override
    void close();
}
