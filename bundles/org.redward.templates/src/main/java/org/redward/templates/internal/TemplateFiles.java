package org.redward.templates.internal;

import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.lang.reflect.Array;
import java.nio.charset.StandardCharsets;
import java.util.Locale;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.FitsException;
import nom.tam.fits.Header;
import nom.tam.fits.ImageHDU;
import nom.tam.fits.TableHDU;

/**
 * Reads the two columns of a template file, wavelength and flux, as stored (no unit or medium
 * conversion here). Three layouts are understood:
 * <ul>
 * <li>FITS binary (or ASCII) table: the first table HDU holding a wavelength column (the named
 * one, else the first of {@code WAVELENGTH, WAVE, LAMBDA, LOGLAM}, case-insensitive) and a flux
 * column (the named one, else {@code FLUX}, else the column after the wavelength); one row per
 * pixel, or one row whose cells are arrays. The wavelength column's {@code TUNITn} is returned
 * as a unit hint.</li>
 * <li>FITS 1D image (primary or extension) with a linear WCS: {@code CRVAL1}, {@code CDELT1}
 * or {@code CD1_1}, {@code CRPIX1} (default 1); {@code DC-FLAG = 1} marks log10 sampling
 * (common practice of IRAF-reduced spectra).</li>
 * <li>Text: numbers separated by blanks or commas, one pixel per line; lines starting with
 * {@code #} or {@code !} and lines that do not begin with a number are skipped; the
 * wavelength and flux columns are given 1-based (default 1 and 2).</li>
 * </ul>
 * Stateless and thread-safe.
 */
final class TemplateFiles {

    private static final String[] WAVELENGTH_NAMES = {"WAVELENGTH", "WAVE", "LAMBDA", "LOGLAM"};

    /** What a file holds: pixels as stored, the unit hint found in the file (or empty), its layout. */
    record Columns(double[] wavelength, double[] flux, String unitHint, String layout) {
    }

    private TemplateFiles() {
    }

    static boolean looksLikeFits(byte[] data) {
        return data.length >= 2880 && new String(data, 0, 9, StandardCharsets.US_ASCII).equals("SIMPLE  =");
    }

    /**
     * @param name the file's name, for messages
     * @param wavelengthColumn FITS column name or 1-based text column; null for the default
     * @param fluxColumn likewise
     */
    static Columns read(String name, byte[] data, String wavelengthColumn, String fluxColumn) throws TemplateDataException {
        if (looksLikeFits(data)) {
            return readFits(name, data, wavelengthColumn, fluxColumn);
        }
        return readText(name, data, wavelengthColumn, fluxColumn);
    }

    private static Columns readFits(String name, byte[] data, String wCol, String fCol) throws TemplateDataException {
        ClassLoader previous = Thread.currentThread().getContextClassLoader();
        // nom-tam-fits finds its compression providers through the context class loader (see STACK.md)
        Thread.currentThread().setContextClassLoader(TemplateFiles.class.getClassLoader());
        try (Fits fits = new Fits(new ByteArrayInputStream(data))) {
            BasicHDU<?>[] hdus = fits.read();
            for (int h = 0; h < hdus.length; h++) {
                if (hdus[h] instanceof TableHDU<?> table) {
                    return readTable(name, h, table, wCol, fCol);
                }
            }
            for (int h = 0; h < hdus.length; h++) {
                if (hdus[h] instanceof ImageHDU image && image.getAxes() != null && image.getAxes().length >= 1
                        && image.getKernel() != null) {
                    return readImage(name, h, image);
                }
            }
            throw new TemplateDataException(name + ": no table HDU with wavelength and flux columns and no 1D image found");
        } catch (IOException | RuntimeException e) {
            throw new TemplateDataException(name + ": not a readable FITS file (" + e.getMessage() + ")", e);
        } finally {
            Thread.currentThread().setContextClassLoader(previous);
        }
    }

    private static Columns readTable(String name, int h, TableHDU<?> table, String wCol, String fCol)
            throws FitsException, TemplateDataException {
        int wi = -1;
        if (wCol != null) {
            wi = table.findColumn(wCol);
            if (wi < 0) {
                wi = findIgnoringCase(table, wCol);
            }
            if (wi < 0) {
                throw new TemplateDataException(name + ", HDU " + h + ": no column named " + wCol);
            }
        } else {
            for (String candidate : WAVELENGTH_NAMES) {
                wi = findIgnoringCase(table, candidate);
                if (wi >= 0) {
                    break;
                }
            }
            if (wi < 0) {
                throw new TemplateDataException(name + ", HDU " + h + ": no wavelength column (looked for "
                        + String.join(", ", WAVELENGTH_NAMES) + "; name it in the descriptor)");
            }
        }
        int fi;
        if (fCol != null) {
            fi = findIgnoringCase(table, fCol);
            if (fi < 0) {
                throw new TemplateDataException(name + ", HDU " + h + ": no column named " + fCol);
            }
        } else {
            fi = findIgnoringCase(table, "FLUX");
            if (fi < 0) {
                fi = wi + 1;
                if (fi >= table.getNCols()) {
                    throw new TemplateDataException(name + ", HDU " + h + ": no flux column (name it in the descriptor)");
                }
            }
        }
        double[] w = flatten(table.getColumn(wi));
        double[] f = flatten(table.getColumn(fi));
        String unit = table.getColumnMeta(wi, "TUNIT");
        String colName = table.getColumnName(wi);
        if ((unit == null || unit.isBlank()) && colName != null && colName.equalsIgnoreCase("LOGLAM")) {
            unit = "log10-angstrom";
        }
        return new Columns(w, f, unit == null ? "" : unit.trim(),
                "FITS table HDU " + h + " columns " + colName + ", " + table.getColumnName(fi));
    }

    private static int findIgnoringCase(TableHDU<?> table, String n) {
        for (int i = 0; i < table.getNCols(); i++) {
            String c = table.getColumnName(i);
            if (c != null && c.trim().equalsIgnoreCase(n)) {
                return i;
            }
        }
        return -1;
    }

    private static Columns readImage(String name, int h, ImageHDU image) throws TemplateDataException {
        double[] f = flatten(image.getKernel());
        Header hd = image.getHeader();
        double crval = hd.getDoubleValue("CRVAL1", Double.NaN);
        double step = hd.getDoubleValue("CD1_1", hd.getDoubleValue("CDELT1", Double.NaN));
        double crpix = hd.getDoubleValue("CRPIX1", 1.0);
        if (!Double.isFinite(crval) || !Double.isFinite(step) || step == 0) {
            throw new TemplateDataException(name + ", HDU " + h + ": 1D image without a linear wavelength WCS (CRVAL1 and CDELT1 or CD1_1)");
        }
        boolean log = hd.getDoubleValue("DC-FLAG", 0) == 1;
        double[] w = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            w[i] = crval + (i + 1 - crpix) * step;
        }
        String unit = log ? "log10-angstrom" : hd.getStringValue("CUNIT1", "");
        return new Columns(w, f, unit == null ? "" : unit.trim(), "FITS 1D image HDU " + h + (log ? " (log10 WCS)" : " (linear WCS)"));
    }

    /** Flattens a numeric column or image (1D array, or array of arrays) to doubles. */
    static double[] flatten(Object o) throws TemplateDataException {
        if (o == null || !o.getClass().isArray()) {
            throw new TemplateDataException("not a numeric array: " + o);
        }
        int n = Array.getLength(o);
        if (n > 0 && Array.get(o, 0) != null && Array.get(o, 0).getClass().isArray()) {
            double[][] parts = new double[n][];
            int total = 0;
            for (int i = 0; i < n; i++) {
                parts[i] = flatten(Array.get(o, i));
                total += parts[i].length;
            }
            double[] out = new double[total];
            int k = 0;
            for (double[] p : parts) {
                System.arraycopy(p, 0, out, k, p.length);
                k += p.length;
            }
            return out;
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            Object v = Array.get(o, i);
            if (!(v instanceof Number num)) {
                throw new TemplateDataException("not a numeric column (" + o.getClass().getComponentType() + ")");
            }
            out[i] = num.doubleValue();
        }
        return out;
    }

    private static Columns readText(String name, byte[] data, String wCol, String fCol) throws TemplateDataException {
        int wi = parseColumn(name, wCol, 1);
        int fi = parseColumn(name, fCol, 2);
        double[] w = new double[1024];
        double[] f = new double[1024];
        int n = 0;
        int lineNo = 0;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(new ByteArrayInputStream(data), StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                lineNo++;
                String t = line.trim();
                if (t.isEmpty() || t.startsWith("#") || t.startsWith("!")) {
                    continue;
                }
                String[] parts = t.split("[\\s,;]+");
                if (!startsNumeric(parts[0])) {
                    continue;
                }
                if (parts.length < Math.max(wi, fi)) {
                    throw new TemplateDataException(name + ", line " + lineNo + ": " + parts.length
                            + " columns, need at least " + Math.max(wi, fi));
                }
                if (n == w.length) {
                    w = java.util.Arrays.copyOf(w, 2 * n);
                    f = java.util.Arrays.copyOf(f, 2 * n);
                }
                try {
                    w[n] = Double.parseDouble(parts[wi - 1]);
                    f[n] = parseFlux(parts[fi - 1]);
                } catch (NumberFormatException e) {
                    throw new TemplateDataException(name + ", line " + lineNo + ": not a number in column "
                            + (e.getMessage() != null && e.getMessage().contains(parts[wi - 1]) ? wi : fi) + ": " + t);
                }
                n++;
            }
        } catch (IOException e) {
            throw new TemplateDataException(name + ": cannot read text (" + e.getMessage() + ")", e);
        }
        if (n == 0) {
            throw new TemplateDataException(name + ": neither FITS nor a text table with numeric columns");
        }
        return new Columns(java.util.Arrays.copyOf(w, n), java.util.Arrays.copyOf(f, n), "",
                "text columns " + wi + " (wavelength) and " + fi + " (flux)");
    }

    private static double parseFlux(String s) {
        String t = s.toLowerCase(Locale.ROOT);
        if (t.equals("nan") || t.equals("inf") || t.equals("-inf")) {
            return Double.NaN;
        }
        return Double.parseDouble(s);
    }

    private static boolean startsNumeric(String s) {
        if (s.isEmpty()) {
            return false;
        }
        char c = s.charAt(0);
        return Character.isDigit(c) || ((c == '-' || c == '+' || c == '.') && s.length() > 1);
    }

    private static int parseColumn(String name, String spec, int dflt) throws TemplateDataException {
        if (spec == null) {
            return dflt;
        }
        try {
            int c = Integer.parseInt(spec.trim());
            if (c < 1) {
                throw new NumberFormatException();
            }
            return c;
        } catch (NumberFormatException e) {
            throw new TemplateDataException(name + ": text column '" + spec + "' must be a 1-based column number");
        }
    }
}
