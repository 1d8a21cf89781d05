package org.redward.formats.text.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Optional;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumAssembly;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/**
 * The spectra of a text table, streamed: one spectrum, or with a spectrum column, one spectrum
 * per run of rows with the same value there. A bad row fails its spectrum (the error names the
 * line and column) and reading goes on with the next. Not thread-safe.
 */
final class TextSource implements SpectrumSource {

    private final Path file;
    private final Rows rows;
    private final TextColumns cols;
    private final Optional<InstrumentProfile> profile;
    private final CommentMetadata comments;
    private final String layout;
    private Rows.Row pending;
    private int index;

    TextSource(Path file, Rows rows, TextColumns cols, Optional<InstrumentProfile> profile, CommentMetadata comments,
            Rows.Row first, String layout) {
        this.file = file;
        this.rows = rows;
        this.cols = cols;
        this.profile = profile;
        this.comments = comments;
        this.pending = first;
        this.layout = layout;
    }

    @Override
    public String layout() {
        return layout;
    }

    @Override
    public long count() {
        return cols.spectrum < 0 ? 1 : -1;
    }

    @Override
    public boolean hasNext() {
        return pending != null && pending.fields().length > 0;
    }

    /** Growable array of doubles. */
    private static final class Doubles {
        double[] a = new double[1024];
        int n;

        void add(double v) {
            if (n == a.length) {
                a = Arrays.copyOf(a, n * 2);
            }
            a[n++] = v;
        }

        double[] get() {
            return Arrays.copyOf(a, n);
        }
    }

    @Override
    public SpectrumRecord next() throws IOException {
        if (!hasNext()) {
            throw new NoSuchElementException();
        }
        String key = cols.spectrum >= 0 && cols.spectrum < pending.fields().length ? pending.fields()[cols.spectrum].trim() : null;
        String where = key == null ? "" : "spectrum " + key;
        long firstLine = pending.line();
        Doubles w = new Doubles();
        Doubles f = new Doubles();
        Doubles e = cols.error >= 0 ? new Doubles() : null;
        Doubles m = cols.mask >= 0 ? new Doubles() : null;
        String problem = null;
        int myIndex = index++;
        while (pending != null && pending.fields().length > 0) {
            String[] row = pending.fields();
            comments.add(pending.comments());
            if (key != null && !(cols.spectrum < row.length && row[cols.spectrum].trim().equals(key))) {
                break;
            }
            if (problem == null) {
                if (row.length != cols.width) {
                    problem = "line " + pending.line() + ": " + row.length + " fields, expected " + cols.width;
                } else {
                    try {
                        w.add(number(row, cols.wavelength));
                        f.add(number(row, cols.flux));
                        if (e != null) {
                            e.add(number(row, cols.error));
                        }
                        if (m != null) {
                            m.add(number(row, cols.mask));
                        }
                    } catch (NumberFormatException x) {
                        problem = "line " + pending.line() + ", " + x.getMessage();
                    }
                }
            }
            pending = rows.next();
        }
        if (pending != null) {
            comments.add(pending.comments());
        }
        String loc = where.isEmpty() ? "line " + firstLine : where + " (from line " + firstLine + ")";
        if (problem != null) {
            comments.done(key);
            return SpectrumRecord.failed(file, myIndex, loc, file + ": " + (where.isEmpty() ? "" : where + ": ") + problem);
        }
        try {
            Spectrum s = build(key, w.get(), f.get(), e == null ? null : e.get(), m == null ? null : m.get());
            return SpectrumRecord.ok(file, myIndex, loc, s);
        } catch (IllegalArgumentException x) {
            return SpectrumRecord.failed(file, myIndex, loc, file + ": " + (where.isEmpty() ? "" : where + ": ") + x.getMessage());
        } finally {
            comments.done(key);
        }
    }

    private double number(String[] row, int col) {
        String t = row[col].trim();
        try {
            return Double.parseDouble(t.replace('D', 'E').replace('d', 'e'));
        } catch (NumberFormatException x) {
            String l = t.toLowerCase(java.util.Locale.ROOT);
            if (l.equals("nan")) {
                return Double.NaN;
            }
            if (l.equals("inf") || l.equals("+inf") || l.equals("infinity")) {
                return Double.POSITIVE_INFINITY;
            }
            if (l.equals("-inf") || l.equals("-infinity")) {
                return Double.NEGATIVE_INFINITY;
            }
            throw new NumberFormatException("column '" + cols.names[col] + "': '" + t + "' is not a number");
        }
    }

    private Spectrum build(String key, double[] w, double[] f, double[] e, double[] m) {
        if (w.length == 0) {
            throw new IllegalArgumentException("no pixels");
        }
        Map<String, String> meta = comments.forSpectrum(key);
        Medium medium;
        String mediumSource;
        Optional<String> pm = profile.flatMap(p -> p.setting("medium"));
        if (pm.isPresent()) {
            medium = parseMedium(pm.get(), "profile setting medium");
            mediumSource = "profile";
        } else if (!cols.wavelengthMedium.isEmpty()) {
            medium = parseMedium(cols.wavelengthMedium, "column name");
            mediumSource = "column name";
        } else if (meta.containsKey("medium")) {
            medium = parseMedium(meta.get("medium"), "comment 'medium'");
            mediumSource = "comment";
        } else {
            medium = cols.unit.isFrequency() ? Medium.VACUUM : Medium.AIR;
            mediumSource = cols.unit.isFrequency() ? "frequency axis" : "assumed (nothing says; ground-based default)";
        }
        double[] coords = w;
        if (cols.log10) {
            coords = new double[w.length];
            for (int i = 0; i < w.length; i++) {
                coords[i] = Math.pow(10.0, w[i]);
            }
        }
        boolean hasErrors = e != null && !"false".equalsIgnoreCase(meta.getOrDefault("has_errors", "true"));
        String fluxUnit = meta.getOrDefault("flux_unit", cols.fluxUnit);
        SpectrumMetadata md = CommentMetadata.metadata(meta);
        if (!meta.containsKey("has_errors")) {
            md = md.toBuilder().extra("redward.medium_source", mediumSource).build();
        }
        if (key != null && md.objectId().isEmpty()) {
            md = md.toBuilder().objectId(key).build();
        }
        List<double[]> regions = profile.map(InstrumentProfile::maskedRegionsVacuumAngstrom).orElse(List.of());
        return SpectrumAssembly.build(coords, cols.unit, medium, cols.log10 ? Sampling.LOG_LINEAR : Sampling.TABULATED, f,
                hasErrors ? e : null, cols.errorKind, m, fluxUnit, md, regions,
                "column '" + cols.names[cols.flux] + "'", cols.error >= 0 ? "column '" + cols.names[cols.error] + "'" : "",
                cols.mask >= 0 ? "column '" + cols.names[cols.mask] + "'" : "");
    }

    private static Medium parseMedium(String v, String where) {
        String t = v.trim().toLowerCase(java.util.Locale.ROOT);
        if (t.startsWith("vac")) {
            return Medium.VACUUM;
        }
        if (t.startsWith("air")) {
            return Medium.AIR;
        }
        throw new IllegalArgumentException(where + " = '" + v + "' (expected air or vacuum)");
    }

    @Override
    public void close() throws IOException {
        rows.close();
    }
}
