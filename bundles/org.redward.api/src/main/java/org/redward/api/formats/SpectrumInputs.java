package org.redward.api.formats;

import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The one way every command and tool reads spectra: given paths (files, folders, list files)
 * and {@link ReadOptions}, it picks a reader per file by sniffing (highest score, or the forced
 * reader), an instrument profile (the forced one, or the best match), and streams
 * {@link SpectrumRecord} items, each stamped with the reader, profile and layout used.
 *
 * <p>Inputs: a regular file is read; a folder is walked (sorted, hidden files skipped, files
 * with no reader skipped silently); a file whose name ends in {@code .list} or {@code .lst}, or
 * a path given as {@code @FILE}, holds one path a line ({@code #} comments, relative paths
 * resolved against the list's folder).
 *
 * <p>Errors never stop a batch: a path that is missing, a file no reader accepts, a file that
 * cannot be opened or that stalls beyond {@link ReadOptions#stallLimit()} yields one failed
 * record (index -1) whose error names the file (and HDU and column where they apply), and the
 * stream goes on with the next file.
 *
 * <p>Thread-safe service; each stream it returns is for one consumer thread.
 */
@ProviderType
public interface SpectrumInputs {

    /**
     * A file found in a folder is read only when some reader's {@link SpectrumReader#sniff} score
     * reaches this (0 to 100); other files of the folder (notes, truth tables) are passed over
     * silently. A file named explicitly is always tried.
     */
    int FOLDER_MIN_SCORE = 30;

    /** Streams the spectra of all the inputs, in order. Never throws for bad input. */
    Stream open(List<Path> inputs, ReadOptions options);

    /**
     * The files the inputs stand for (folders walked, list files expanded), in order. Paths that
     * do not exist are kept, so that {@link #open} reports them.
     */
    List<Path> expand(List<Path> inputs);

    /**
     * How many spectra each file of the inputs holds, as its reader knows it without reading the
     * spectra (e.g. a FITS table's row count), in the order of {@link #expand}: 0 for a folder's
     * file that would be passed over, -1 where the count is unknown before reading (a reader that
     * cannot tell, a file that cannot be opened). Much cheaper than reading: for progress totals
     * and for splitting a survey into bounded tasks. Never throws for bad input.
     */
    default long[] counts(List<Path> inputs, ReadOptions options) {
        long[] unknown = new long[expand(inputs).size()];
        java.util.Arrays.fill(unknown, -1);
        return unknown;
    }

    /** A stream of records over many files. Close it to release files and reading threads. */
    interface Stream extends Iterator<SpectrumRecord>, AutoCloseable {
        /** Files completed so far (read through or failed). */
        int filesDone();

        /** Files in the batch. */
        int files();

        @Override
        void close();
    }
}
