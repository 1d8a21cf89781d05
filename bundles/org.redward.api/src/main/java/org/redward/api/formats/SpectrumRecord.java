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
    private final String reader;
    private final String profile;
    private final String layout;

    private SpectrumRecord(Path file, int index, String location, Spectrum spectrum, String error,
            String reader, String profile, String layout) {
        this.file = Objects.requireNonNull(file);
        this.index = index;
        this.location = location == null ? "" : location;
        this.spectrum = spectrum;
        this.error = error;
        this.reader = reader == null ? "" : reader;
        this.profile = profile == null ? "" : profile;
        this.layout = layout == null ? "" : layout;
    }

    public static SpectrumRecord ok(Path file, int index, String location, Spectrum spectrum) {
        return new SpectrumRecord(file, index, location, Objects.requireNonNull(spectrum), null, null, null, null);
    }

    public static SpectrumRecord failed(Path file, int index, String location, String error) {
        return new SpectrumRecord(file, index, location, null, Objects.requireNonNull(error), null, null, null);
    }

    /**
     * A copy that says how it was read: the reader id, the instrument profile id (empty if none)
     * and the layout understood. The reading facade stamps every record it hands out.
     */
    public SpectrumRecord from(String readerId, String profileId, String layoutUnderstood) {
        return new SpectrumRecord(file, index, location, spectrum, error, readerId, profileId, layoutUnderstood);
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
    /** Id of the reader that read it; empty if no reader could be chosen. */
    public String reader() { return reader; }
    /** Id of the instrument profile applied; empty if none. */
    public String profile() { return profile; }
    /** The layout understood (e.g. {@code FITS binary table, log10 wavelength column}); empty if unknown. */
    public String layout() { return layout; }

    @Override
    public String toString() {
        return file + (index >= 0 ? "[" + index + "]" : "") + (ok() ? " ok" : " failed: " + error);
    }
}
