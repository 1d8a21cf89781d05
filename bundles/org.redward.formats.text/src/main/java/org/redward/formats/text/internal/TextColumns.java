package org.redward.formats.text.internal;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.redward.api.formats.ColumnNames;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumAssembly.ErrorKind;
import org.redward.spectrum.SpectralUnit;

/**
 * Which column of a text table holds what, from its header line or, without one, by position
 * (wavelength, flux, then sigma: common practice for plain spectra in text).
 *
 * <p>Header cells are {@code name}, {@code name [unit]}, {@code name (unit)} or
 * {@code name_unit} with a spectral unit suffix ({@code wavelength_nm}); a name holding
 * {@code air} or {@code vac} says the medium.
 */
final class TextColumns {

    private static final Pattern CELL = Pattern.compile("^\\s*([^\\[(]*?)\\s*(?:[\\[(]\\s*([^\\])]*)\\s*[\\])])?\\s*$");

    final int wavelength;
    final SpectralUnit unit;
    final boolean log10;
    final String wavelengthMedium;
    final int flux;
    final String fluxUnit;
    final int error;
    final ErrorKind errorKind;
    final int mask;
    final int spectrum;
    final int width;
    final String[] names;

    private TextColumns(int wavelength, SpectralUnit unit, boolean log10, String medium, int flux, String fluxUnit,
            int error, ErrorKind kind, int mask, int spectrum, String[] names) {
        this.wavelength = wavelength;
        this.unit = unit;
        this.log10 = log10;
        this.wavelengthMedium = medium;
        this.flux = flux;
        this.fluxUnit = fluxUnit;
        this.error = error;
        this.errorKind = kind;
        this.mask = mask;
        this.spectrum = spectrum;
        this.width = names.length;
        this.names = names;
    }

    /** True if the cells are not all numbers: a header. */
    static boolean isHeader(String[] cells) {
        for (String c : cells) {
            if (!isNumber(c)) {
                return true;
            }
        }
        return false;
    }

    static boolean isNumber(String s) {
        String t = s.trim();
        if (t.isEmpty()) {
            return false;
        }
        if (t.equalsIgnoreCase("nan") || t.equalsIgnoreCase("inf") || t.equalsIgnoreCase("-inf") || t.equalsIgnoreCase("+inf")
                || t.equalsIgnoreCase("infinity") || t.equalsIgnoreCase("-infinity")) {
            return true;
        }
        try {
            Double.parseDouble(t.replace('D', 'E').replace('d', 'e'));
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }

    /** Name and unit of a header cell, lower-case name. */
    static String[] nameAndUnit(String cell) {
        Matcher m = CELL.matcher(cell);
        String name = cell.trim();
        String unit = "";
        if (m.matches()) {
            name = m.group(1).trim();
            unit = m.group(2) == null ? "" : m.group(2).trim();
        }
        return new String[] {name.toLowerCase(Locale.ROOT), unit};
    }

    /**
     * Columns from a header.
     *
     * @throws IllegalArgumentException naming the column at fault
     */
    static TextColumns fromHeader(String[] header, Optional<InstrumentProfile> profile) {
        String[] names = new String[header.length];
        String[] units = new String[header.length];
        for (int i = 0; i < header.length; i++) {
            String[] nu = nameAndUnit(header[i]);
            names[i] = nu[0];
            units[i] = nu[1];
        }
        int w = find(names, profile, "wavelength.column", ColumnNames.WAVELENGTH, true);
        if (w < 0) {
            // a name with a unit suffix, e.g. wave_nm or lambda_angstrom
            for (int i = 0; i < names.length && w < 0; i++) {
                for (String base : List.of("wavelength", "wave", "lambda", "freq", "frequency")) {
                    if (names[i].startsWith(base + "_")) {
                        w = i;
                    }
                }
            }
        }
        if (w < 0) {
            throw new IllegalArgumentException("no wavelength column in the header (columns are " + List.of(header) + ")");
        }
        int f = find(names, profile, "flux.column", ColumnNames.FLUX, true);
        if (f < 0) {
            throw new IllegalArgumentException("no flux column in the header (columns are " + List.of(header) + ")");
        }
        int e = find(names, profile, "ivar.column", ColumnNames.IVAR, profile.flatMap(p -> p.setting("error.column")).isEmpty()
                && profile.flatMap(p -> p.setting("variance.column")).isEmpty());
        ErrorKind kind = ErrorKind.INVERSE_VARIANCE;
        if (e < 0) {
            e = find(names, profile, "error.column", ColumnNames.SIGMA, profile.flatMap(p -> p.setting("variance.column")).isEmpty());
            kind = ErrorKind.SIGMA;
        }
        if (e < 0) {
            e = find(names, profile, "variance.column", ColumnNames.VARIANCE, true);
            kind = ErrorKind.VARIANCE;
        }
        int m = find(names, profile, "mask.column", ColumnNames.MASK, true);
        int s = find(names, null, null, ColumnNames.SPECTRUM_INDEX, true);
        String wname = names[w];
        String scale = profile.flatMap(p -> p.setting("wavelength.scale")).orElse(
                ColumnNames.isLogWavelength(wname) ? "log10" : "linear").toLowerCase(Locale.ROOT);
        if (!scale.equals("linear") && !scale.equals("log10")) {
            throw new IllegalArgumentException("profile setting wavelength.scale = '" + scale + "' (expected linear or log10)");
        }
        String unitText = profile.flatMap(p -> p.setting("wavelength.unit")).orElse(units[w]);
        if (unitText.isEmpty()) {
            int us = wname.lastIndexOf('_');
            if (us > 0 && SpectralUnit.parse(wname.substring(us + 1)).isPresent()) {
                unitText = wname.substring(us + 1);
            }
        }
        if (scale.equals("log10")) {
            unitText = unitText.replaceAll("(?i)^(log10|log)?\\s*\\(?\\s*|\\s*\\)?\\s*$", "");
        }
        SpectralUnit unit;
        if (unitText.isEmpty()) {
            unit = ColumnNames.isFrequency(wname) ? SpectralUnit.HERTZ : SpectralUnit.ANGSTROM;
        } else {
            String u = unitText;
            String cell = header[w].trim();
            unit = SpectralUnit.parse(u).orElseThrow(() -> new IllegalArgumentException(
                    "column '" + cell + "': unknown wavelength unit '" + u + "'"));
        }
        String medium = wname.contains("vac") ? "vacuum" : wname.contains("air") ? "air" : "";
        String fluxUnit = profile.flatMap(p -> p.setting("flux.unit")).orElse(units[f]);
        return new TextColumns(w, unit, scale.equals("log10"), medium, f, fluxUnit, e, kind, m, s, names);
    }

    /** Columns by position: wavelength (Angstrom), flux, and sigma if there is a third column. */
    static TextColumns positional(int width) {
        String[] names = new String[width];
        for (int i = 0; i < width; i++) {
            names[i] = "column " + (i + 1);
        }
        return new TextColumns(0, SpectralUnit.ANGSTROM, false, "", 1, "", width >= 3 ? 2 : -1, ErrorKind.SIGMA, -1, -1, names);
    }

    private static int find(String[] names, Optional<InstrumentProfile> profile, String setting, List<String> usual, boolean useUsual) {
        Optional<String> forced = profile == null || setting == null ? Optional.empty() : profile.flatMap(p -> p.setting(setting));
        if (forced.isPresent()) {
            String want = forced.get().toLowerCase(Locale.ROOT);
            for (int i = 0; i < names.length; i++) {
                if (names[i].equals(want)) {
                    return i;
                }
            }
            throw new IllegalArgumentException("column '" + forced.get() + "' (profile setting " + setting + ") is missing; columns are "
                    + List.of(names));
        }
        if (!useUsual) {
            return -1;
        }
        for (String u : usual) {
            for (int i = 0; i < names.length; i++) {
                if (names[i].equals(u)) {
                    return i;
                }
            }
        }
        return -1;
    }
}
