package org.redward.api.formats;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;

import org.redward.spectrum.Spectrum;

/**
 * One spectrum read from a file, or the reason it could not be read. A bad spectrum inside a
 * file of many does not stop the others: the source yields a record with an error and goes on.
 */
public final class SpectrumRecord {

    private final Path file;
    private final int index;
    private final String location;
    private final Spectrum spectrum;
    private final String error;

    private SpectrumRecord(Path file, int index, String location, Spectrum spectrum, String error) {
        this.file = Objects.requireNonNull(file);
        this.index = index;
        this.location = location == null ? "" : location;
        this.spectrum = spectrum;
        this.error = error;
    }

    public static SpectrumRecord ok(Path file, int index, String location, Spectrum spectrum) {
        return new SpectrumRecord(file, index, location, Objects.requireNonNull(spectrum), null);
    }

    public static SpectrumRecord failed(Path file, int index, String location, String error) {
        return new SpectrumRecord(file, index, location, null, Objects.requireNonNull(error));
    }

    public Path file() { return file; }
    /** 0-based index of the spectrum within its file. */
    public int index() { return index; }
    /** Where in the file (e.g. {@code HDU 1 row 17}). */
    public String location() { return location; }
    public Optional<Spectrum> spectrum() { return Optional.ofNullable(spectrum); }
    public boolean ok() { return spectrum != null; }
    /** The reason it could not be read, naming file, HDU and column; empty when OK. */
    public String error() { return error == null ? "" : error; }
}
