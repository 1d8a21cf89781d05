package org.redward.formats.fits.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Header;

/**
 * Chooses how to read a FITS file: as the profile says ({@code layout} = image, image-planes or
 * table; {@code hdu} = EXTNAME or number), or by looking: the first HDU that holds spectra (an
 * image of one or two axes that is not an error, mask or wavelength companion; a binary table
 * with a flux column). A file written by Redward's own FITS writer (primary keyword
 * {@value #OWN_LAYOUT_KEY}) is read one spectrum per table HDU.
 */
final class Layouts {

    /** Primary-header keyword that marks files written by Redward's FITS writer. */
    static final String OWN_LAYOUT_KEY = "RWLAYOUT";
    /** Its value. */
    static final String OWN_LAYOUT = "SPECTRUM-PER-HDU";

    private Layouts() {
    }

    static Plan choose(FitsFileView view, Settings s) {
        Optional<String> layout = s.get("layout").map(x -> x.toLowerCase(Locale.ROOT));
        Optional<String> hduRef = s.get("hdu");
        int forcedHdu = -1;
        if (hduRef.isPresent()) {
            forcedHdu = view.find(hduRef.get());
            if (forcedHdu < 0) {
                throw new IllegalArgumentException("HDU '" + hduRef.get() + "' (profile setting hdu) is missing; the file has "
                        + describe(view));
            }
        }
        if (layout.isPresent()) {
            String l = layout.get();
            int hdu = forcedHdu >= 0 ? forcedHdu : firstOf(view, l.startsWith("table"));
            if (hdu < 0) {
                throw new IllegalArgumentException("no HDU fits the profile's layout '" + l + "'; the file has " + describe(view));
            }
            switch (l) {
                case "image", "image-rows", "image-1d": return requireImage(view, hdu, s, false);
                case "image-planes": return requireImage(view, hdu, s, true);
                case "table", "table-pixels", "table-rows":
                    if (!(view.hdus.get(hdu) instanceof BinaryTableHDU)) {
                        throw new IllegalArgumentException(view.name(hdu) + " is not a binary table (profile layout '" + l + "')");
                    }
                    return TableSpectra.of(view, List.of(hdu), s);
                default:
                    throw new IllegalArgumentException("profile setting layout = '" + l + "' (expected image, image-planes or table)");
            }
        }
        Header primary = view.primary();
        if (OWN_LAYOUT.equalsIgnoreCase(String.valueOf(primary.getStringValue(OWN_LAYOUT_KEY)).trim())) {
            List<Integer> tables = new ArrayList<>();
            for (int i = 1; i < view.hdus.size(); i++) {
                if (view.hdus.get(i) instanceof BinaryTableHDU) {
                    tables.add(i);
                }
            }
            if (tables.isEmpty()) {
                throw new IllegalArgumentException("written as one spectrum per HDU, but holds no binary table");
            }
            return TableSpectra.of(view, tables, s);
        }
        if (forcedHdu >= 0) {
            return view.hdus.get(forcedHdu) instanceof BinaryTableHDU ? TableSpectra.of(view, List.of(forcedHdu), s)
                    : requireImage(view, forcedHdu, s, false);
        }
        for (int i = 0; i < view.hdus.size(); i++) {
            if (ImageSpectra.looksLikeSpectra(view, i)) {
                return ImageSpectra.of(view, i, s, false);
            }
            if (view.hdus.get(i) instanceof BinaryTableHDU && (s.get("flux.column").isPresent()
                    || TableSpectra.looksLikeSpectra(view.hdus.get(i).getHeader(), s))) {
                return TableSpectra.of(view, List.of(i), s);
            }
        }
        throw new IllegalArgumentException("no HDU holds a spectrum (an image of 1 or 2 axes, or a binary table with a flux column); the file has "
                + describe(view));
    }

    private static Plan requireImage(FitsFileView view, int hdu, Settings s, boolean planes) {
        if (ImageSpectra.axes(view.hdus.get(hdu).getHeader()).length == 0 || view.hdus.get(hdu) instanceof BinaryTableHDU) {
            throw new IllegalArgumentException(view.name(hdu) + " is not an image of 1 or 2 axes");
        }
        return ImageSpectra.of(view, hdu, s, planes);
    }

    private static int firstOf(FitsFileView view, boolean table) {
        for (int i = 0; i < view.hdus.size(); i++) {
            boolean isTable = view.hdus.get(i) instanceof BinaryTableHDU;
            if (table ? isTable : !isTable && ImageSpectra.axes(view.hdus.get(i).getHeader()).length > 0) {
                return i;
            }
        }
        return -1;
    }

    /** A one-line list of the HDUs: {@code HDU 0 image 3904x5, HDU 1 (COADD) table 3808 rows}. */
    static String describe(FitsFileView view) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < view.hdus.size(); i++) {
            Header h = view.hdus.get(i).getHeader();
            if (sb.length() > 0) {
                sb.append(", ");
            }
            sb.append(view.name(i));
            if (view.hdus.get(i) instanceof BinaryTableHDU) {
                sb.append(" table of ").append(h.getLongValue("NAXIS2", 0)).append(" rows");
            } else {
                int naxis = Math.min(999, h.getIntValue("NAXIS", 0));
                if (naxis == 0) {
                    sb.append(" no data");
                } else {
                    sb.append(" image");
                    for (int a = 1; a <= naxis; a++) {
                        sb.append(a == 1 ? " " : "x").append(h.getIntValue("NAXIS" + a, 0));
                    }
                }
            }
        }
        if (!view.damage.isEmpty()) {
            sb.append("; ").append(view.damage);
        }
        return sb.toString();
    }
}
