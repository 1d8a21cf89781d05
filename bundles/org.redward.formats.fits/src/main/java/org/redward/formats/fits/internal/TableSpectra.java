package org.redward.formats.fits.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.redward.api.formats.ColumnNames;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumAssembly;
import org.redward.api.formats.SpectrumAssembly.ErrorKind;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Header;

/**
 * Spectra in FITS binary tables, two ways: one spectrum per table (a row per pixel, scalar
 * columns), over one or several HDUs; or many spectra per table (a row per object, array
 * columns), read row by row from disk so that the table is never loaded whole.
 *
 * <p>Profile settings used: {@code hdu}, {@code wavelength.column}, {@code wavelength.scale}
 * (linear, log10, ln), {@code wavelength.unit}, {@code medium}, {@code flux.column},
 * {@code flux.unit}, {@code ivar.column} / {@code error.column} / {@code variance.column},
 * {@code mask.column}, {@code sky.column}, {@code id.column}; without them common column names are tried
 * ({@link ColumnNames}).
 */
final class TableSpectra implements Plan {

    /** One chosen column. */
    record Column(int index, String name) {
    }

    private final FitsFileView view;
    private final List<Integer> hdus;
    private final boolean rowPerSpectrum;
    private final Settings settings;
    private final String layout;
    private final boolean own;
    /** For one spectrum per row with the axis in keywords: the axis made once (or why it cannot be made). */
    private org.redward.spectrum.SpectralAxis keywordAxis;
    private String keywordAxisError;
    private String keywordMediumSource;
    private SpectrumMetadata rowBaseMetadata;
    /** Column choices of the last HDU read (one spectrum per row: the same for every row). */
    private int chosenFor = -1;
    private List<String> names;
    private Column flux;
    private Optional<Column> err;
    private ErrorKind kind;
    private Optional<Column> maskCol;
    private Optional<Column> skyCol;
    private Optional<Column> wave;
    private Optional<Column> idCol;
    private Optional<Column> raCol;
    private Optional<Column> decCol;

    private TableSpectra(FitsFileView view, List<Integer> hdus, boolean rowPerSpectrum, Settings settings, String layout) {
        this.view = view;
        this.hdus = hdus;
        this.rowPerSpectrum = rowPerSpectrum;
        this.settings = settings;
        this.layout = layout;
        this.own = Layouts.OWN_LAYOUT.equalsIgnoreCase(String.valueOf(view.primary().getStringValue(Layouts.OWN_LAYOUT_KEY)).trim());
    }

    /** Column names (TTYPEn) of a table HDU, in order. */
    static List<String> columnNames(Header h) {
        int n = Math.min(999, h.getIntValue("TFIELDS", 0));
        List<String> out = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            String t = h.getStringValue("TTYPE" + i);
            out.add(t == null ? "" : t.trim());
        }
        return out;
    }

    /** The column named by the setting, or the first of the usual names; the setting's column must exist. */
    static Optional<Column> pick(List<String> names, Settings s, String setting, List<String> usual, String where) {
        Optional<String> forced = s.get(setting);
        if (forced.isPresent()) {
            for (int i = 0; i < names.size(); i++) {
                if (names.get(i).equalsIgnoreCase(forced.get())) {
                    return Optional.of(new Column(i, names.get(i)));
                }
            }
            throw new IllegalArgumentException(where + ": column '" + forced.get() + "' (profile setting " + setting
                    + ") is missing; columns are " + names);
        }
        for (String u : usual) {
            for (int i = 0; i < names.size(); i++) {
                if (names.get(i).toLowerCase(Locale.ROOT).equals(u)) {
                    return Optional.of(new Column(i, names.get(i)));
                }
            }
        }
        return Optional.empty();
    }

    /** True if the table looks like spectra: it has a flux column. */
    static boolean looksLikeSpectra(Header h, Settings s) {
        try {
            return pick(columnNames(h), s, "flux.column", ColumnNames.FLUX, "").isPresent();
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    /** Repeat count of column {@code col} (0-based) from its TFORM. */
    static long repeat(Header h, int col) {
        String tform = h.getStringValue("TFORM" + (col + 1));
        if (tform == null) {
            return -1;
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("^\\s*(\\d*)([A-Za-z])").matcher(tform);
        if (!m.find()) {
            return -1;
        }
        if ("PQpq".indexOf(m.group(2).charAt(0)) >= 0) {
            return -2;
        }
        return m.group(1).isEmpty() ? 1 : Long.parseLong(m.group(1));
    }

    /** A plan for the table HDU {@code hdu} (or, for one spectrum per table, several HDUs). */
    static TableSpectra of(FitsFileView view, List<Integer> hdus, Settings s) {
        int first = hdus.get(0);
        Header h = view.hdus.get(first).getHeader();
        List<String> names = columnNames(h);
        String where = view.name(first);
        Column flux = pick(names, s, "flux.column", ColumnNames.FLUX, where).orElseThrow(() -> new IllegalArgumentException(
                where + ": no flux column (columns are " + names + ")"));
        long rep = repeat(h, flux.index());
        if (rep == -2) {
            throw new IllegalArgumentException(where + ": column '" + flux.name() + "' has variable-length arrays, which are not supported");
        }
        boolean rows = rep > 1;
        if (rep > FitsFileView.MAX_PIXELS) {
            throw new IllegalArgumentException(where + ": column '" + flux.name() + "' holds " + rep + " values per row, more than "
                    + FitsFileView.MAX_PIXELS);
        }
        String layout = rows ? "FITS binary table, one spectrum per row (array columns)"
                : hdus.size() > 1 ? "FITS binary tables, one spectrum per HDU (a row per pixel)"
                : "FITS binary table, one spectrum (a row per pixel)";
        return new TableSpectra(view, List.copyOf(hdus), rows, s, layout);
    }

    @Override
    public String layout() {
        return layout;
    }

    @Override
    public int count() {
        if (!rowPerSpectrum) {
            return hdus.size();
        }
        return view.hdus.get(hdus.get(0)).getHeader().getIntValue("NAXIS2", 0);
    }

    @Override
    public SpectrumRecord read(int index) {
        int hdu = rowPerSpectrum ? hdus.get(0) : hdus.get(index);
        int row = rowPerSpectrum ? index : -1;
        String where = view.name(hdu) + (row >= 0 ? " row " + row : "");
        try {
            return SpectrumRecord.ok(view.file, index, where, readSpectrum(hdu, row, where));
        } catch (IllegalArgumentException e) {
            return SpectrumRecord.failed(view.file, index, where, view.file + ": " + prefixed(where, e.getMessage()));
        } catch (Exception | OutOfMemoryError e) {
            return SpectrumRecord.failed(view.file, index, where, view.file + ": " + where + ": cannot be read ("
                    + FitsFileView.message(e) + ")");
        }
    }

    private static String prefixed(String where, String message) {
        return message.startsWith(where) ? message : where + ": " + message;
    }

    private Spectrum readSpectrum(int hdu, int row, String where) throws Exception {
        BinaryTableHDU th = (BinaryTableHDU) view.hdus.get(hdu);
        Header h = th.getHeader();
        BinaryTable t = th.getData();
        Keys keys = view.keys(hdu);
        if (chosenFor != hdu) {
            choose(h, where);
            chosenFor = hdu;
        }
        if (row < 0 && h.getIntValue("NAXIS2", 0) == 0) {
            throw new IllegalArgumentException("no pixels (the table has no rows)");
        }
        double[] f = column(t, h, flux, row);
        int n = f.length;
        double[] e = err.isPresent() && (!own || OwnFormat.hasErrors(h)) ? column(t, h, err.get(), row) : null;
        double[] m = maskCol.isPresent() ? column(t, h, maskCol.get(), row) : null;
        double[] sky = skyCol.isPresent() ? column(t, h, skyCol.get(), row) : null;
        if (sky != null && sky.length != n) {
            throw new IllegalArgumentException("column '" + skyCol.get().name() + "' has " + sky.length + " values but column '"
                    + flux.name() + "' has " + n);
        }
        double[] coords;
        SpectralUnit unit;
        Sampling sampling;
        Medium medium;
        String mediumSource;
        if (wave.isPresent()) {
            double[] raw = column(t, h, wave.get(), row);
            if (raw.length != n) {
                throw new IllegalArgumentException("column '" + wave.get().name() + "' has " + raw.length
                        + " values but column '" + flux.name() + "' has " + n);
            }
            String tunit = h.getStringValue("TUNIT" + (wave.get().index() + 1));
            String scale = settings.get("wavelength.scale").orElse(
                    ColumnNames.isLogWavelength(wave.get().name()) || (tunit != null && tunit.toLowerCase(Locale.ROOT).startsWith("log"))
                            ? "log10" : "linear").toLowerCase(Locale.ROOT);
            coords = new double[n];
            for (int i = 0; i < n; i++) {
                coords[i] = switch (scale) {
                    case "log10" -> Math.pow(10.0, raw[i]);
                    case "ln" -> Math.exp(raw[i]);
                    case "linear" -> raw[i];
                    default -> throw new IllegalArgumentException("profile setting wavelength.scale = '" + scale
                            + "' (expected linear, log10 or ln)");
                };
            }
            unit = wavelengthUnit(wave.get(), tunit, scale, where);
            sampling = scale.equals("linear") ? Sampling.TABULATED : Sampling.LOG_LINEAR;
            Medium[] md = new Medium[1];
            String lower = wave.get().name().toLowerCase(Locale.ROOT);
            if (settings.get("medium").isEmpty() && lower.contains("vac")) {
                md[0] = Medium.VACUUM;
                mediumSource = "column name";
            } else if (settings.get("medium").isEmpty() && lower.contains("air")) {
                md[0] = Medium.AIR;
                mediumSource = "column name";
            } else {
                mediumSource = SpectralSolution.medium(keys, settings, unit.isFrequency() ? "FREQ" : "", md);
            }
            medium = md[0];
        } else if (!rowPerSpectrum) {
            // one spectrum per HDU: each HDU has its own header
            SpectralSolution sol = SpectralSolution.fromKeywords(keys, 1, n, settings);
            coords = sol.coordinates;
            unit = sol.unit;
            sampling = sol.sampling;
            medium = sol.medium;
            mediumSource = sol.mediumSource;
        } else {
            if (keywordAxis == null && keywordAxisError == null) {
                try {
                    SpectralSolution sol = SpectralSolution.fromKeywords(keys, 1, n, settings);
                    keywordAxis = SpectrumAssembly.axis(sol.coordinates, sol.unit, sol.medium, sol.sampling);
                    keywordMediumSource = sol.mediumSource;
                } catch (IllegalArgumentException x) {
                    keywordAxisError = x.getMessage();
                }
            }
            if (keywordAxisError != null) {
                throw new IllegalArgumentException(keywordAxisError);
            }
            coords = null;
            unit = keywordAxis.unitAsRead();
            sampling = keywordAxis.samplingAsRead();
            medium = keywordAxis.mediumAsRead();
            mediumSource = keywordMediumSource;
        }
        org.redward.spectrum.SpectralAxis axis = coords == null ? keywordAxis : SpectrumAssembly.axis(coords, unit, medium, sampling);
        return finish(axis, h, t, keys, f, e, m, row, mediumSource).withSky(sky);
    }

    /** Chooses the columns of a table HDU (profile settings first, then the usual names). */
    private void choose(Header h, String where) {
        names = columnNames(h);
        List<String> n = names;
        flux = pick(names, settings, "flux.column", ColumnNames.FLUX, where)
                .orElseThrow(() -> new IllegalArgumentException("no flux column (columns are " + n + ")"));
        kind = ErrorKind.INVERSE_VARIANCE;
        err = pick(names, settings, "ivar.column", settings.get("error.column").isPresent()
                || settings.get("variance.column").isPresent() ? List.of() : ColumnNames.IVAR, where);
        if (err.isEmpty()) {
            err = pick(names, settings, "error.column", settings.get("variance.column").isPresent() ? List.of() : ColumnNames.SIGMA, where);
            kind = ErrorKind.SIGMA;
        }
        if (err.isEmpty()) {
            err = pick(names, settings, "variance.column", ColumnNames.VARIANCE, where);
            kind = ErrorKind.VARIANCE;
        }
        maskCol = pick(names, settings, "mask.column", ColumnNames.MASK, where);
        skyCol = pick(names, settings, "sky.column", ColumnNames.SKY, where);
        wave = pick(names, settings, "wavelength.column", ColumnNames.WAVELENGTH, where);
        idCol = rowPerSpectrum ? pick(names, settings, "id.column", ColumnNames.ID, where) : Optional.empty();
        // one object per row: its own sky position (ICRS degrees) beats the header's pointing
        raCol = rowPerSpectrum ? pick(names, settings, "ra.column", List.of("ra", "ra_obj", "plug_ra", "target_ra"), where)
                : Optional.empty();
        decCol = rowPerSpectrum ? pick(names, settings, "dec.column", List.of("dec", "dec_obj", "plug_dec", "target_dec"), where)
                : Optional.empty();
    }

    private Spectrum finish(org.redward.spectrum.SpectralAxis axis, Header h, BinaryTable t, Keys keys, double[] f, double[] e,
            double[] m, int row, String mediumSource) throws Exception {
        String fluxUnit = settings.get("flux.unit").orElseGet(() -> {
            String tu = h.getStringValue("TUNIT" + (flux.index() + 1));
            return tu != null && !tu.isBlank() ? tu.trim() : keys.text("BUNIT").orElse("");
        });
        SpectrumMetadata md;
        if (own) {
            md = OwnFormat.readMetadata(h);
        } else if (rowPerSpectrum) {
            if (rowBaseMetadata == null) {
                rowBaseMetadata = MetadataKeywords.read(keys, settings);
            }
            md = rowBaseMetadata;
        } else {
            md = MetadataKeywords.read(keys, settings);
        }
        SpectrumMetadata.Builder b = own ? md.toBuilder() : md.toBuilder().extra("redward.medium_source", mediumSource);
        if (row >= 0 && !own) {
            if (raCol.isPresent() && decCol.isPresent()) {
                double ra = column(t, h, raCol.get(), row)[0];
                double dec = column(t, h, decCol.get(), row)[0];
                if (Double.isFinite(ra) && Double.isFinite(dec) && Math.abs(dec) <= 90) {
                    b.skyPosition(((ra % 360) + 360) % 360, dec);
                }
            }
            if (idCol.isPresent()) {
                Object v = t.getElement(row, idCol.get().index());
                String s = text(v);
                if (!s.isBlank()) {
                    b.objectId(s);
                }
            } else if (md.objectId().isEmpty() || count() > 1) {
                b.objectId(md.objectId().map(x -> x + "#").orElse("row ") + row);
            }
        }
        return SpectrumAssembly.build(axis, f, e, kind, m, fluxUnit, b.build(),
                settings.profile().map(p -> p.maskedRegionsVacuumAngstrom()).orElse(List.of()),
                "column '" + flux.name() + "'", err.map(c -> "column '" + c.name() + "'").orElse(""),
                maskCol.map(c -> "column '" + c.name() + "'").orElse(""));
    }

    private SpectralUnit wavelengthUnit(Column wave, String tunit, String scale, String where) {
        Optional<String> forced = settings.get("wavelength.unit");
        String u = forced.orElse(tunit == null ? "" : tunit.trim());
        if (!scale.equals("linear")) {
            // log columns: the unit is that of the wavelength inside the log, e.g. log(Angstrom)
            u = u.replaceAll("(?i)^(log10|log|ln)?\\s*\\(?\\s*|\\s*\\)?\\s*$", "");
        }
        if (u.isEmpty()) {
            return ColumnNames.isFrequency(wave.name()) ? SpectralUnit.HERTZ : SpectralUnit.ANGSTROM;
        }
        String unitText = u;
        return SpectralUnit.parse(unitText).orElseThrow(() -> new IllegalArgumentException(
                "column '" + wave.name() + "': unknown wavelength unit '" + unitText + "'"
                        + (forced.isPresent() ? " (profile setting wavelength.unit)" : " (TUNIT" + (wave.index() + 1) + ")")));
    }

    private static String text(Object v) {
        if (v instanceof String[] s && s.length > 0) {
            return s[0].trim();
        }
        if (v instanceof String s) {
            return s.trim();
        }
        if (v != null && v.getClass().isArray() && java.lang.reflect.Array.getLength(v) > 0) {
            Object x = java.lang.reflect.Array.get(v, 0);
            return String.valueOf(x);
        }
        return v == null ? "" : String.valueOf(v);
    }

    /** The values of a column: the whole column (row &lt; 0) or one row's array. */
    private static double[] column(BinaryTable t, Header h, Column c, int row) throws Exception {
        int col = c.index();
        double scale = h.getDoubleValue("TSCAL" + (col + 1), 1.0);
        double zero = h.getDoubleValue("TZERO" + (col + 1), 0.0);
        Long blank = h.containsKey("TNULL" + (col + 1)) ? h.getLongValue("TNULL" + (col + 1)) : null;
        Object raw = row < 0 ? t.getFlattenedColumn(col) : t.getElement(row, col);
        try {
            return Values.toDoubles(raw, scale, zero, blank);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("column '" + c.name() + "' " + e.getMessage());
        }
    }
}
