package org.redward.formats.fits.internal;

import java.util.Map;

import org.redward.spectrum.SpectrumMetadata;

import nom.tam.fits.Header;
import nom.tam.fits.HeaderCardException;

/**
 * The keywords of Redward's own FITS spectrum files, shared by the writer and the reader: a
 * primary header with {@code RWLAYOUT = 'SPECTRUM-PER-HDU'}, then one binary table HDU per
 * spectrum (columns WAVELENGTH in vacuum Angstrom, FLUX, IVAR, MASK) whose header holds the
 * metadata: OBJECT, RA and DEC (ICRS degrees), RWMJDMID (mid-exposure MJD, UTC), EXPTIME,
 * OBSGEO-L/B/H (east-positive degrees, metres), INSTRUME, RWERRORS (T if the errors are real),
 * and each further metadata pair as RWXKnnnn / RWXVnnnn.
 */
final class OwnFormat {

    static final String MJD_MID = "RWMJDMID";
    static final String HAS_ERRORS = "RWERRORS";

    private OwnFormat() {
    }

    static void writeMetadata(Header h, SpectrumMetadata m, boolean hasErrors) throws HeaderCardException {
        if (m.objectId().isPresent()) {
            h.addValue("OBJECT", m.objectId().get(), "object id");
        }
        addNumber(h, "RA", m.raDeg(), "[deg] ICRS right ascension");
        addNumber(h, "DEC", m.decDeg(), "[deg] ICRS declination");
        addNumber(h, MJD_MID, m.midExposureMjdUtc(), "[d] mid-exposure MJD (UTC)");
        addNumber(h, "EXPTIME", m.exposureSeconds(), "[s] exposure");
        addNumber(h, "OBSGEO-L", m.siteLongitudeDeg(), "[deg] site longitude, east-positive");
        addNumber(h, "OBSGEO-B", m.siteLatitudeDeg(), "[deg] site geodetic latitude");
        addNumber(h, "OBSGEO-H", m.siteHeightMetres(), "[m] site height");
        if (m.instrument().isPresent()) {
            h.addValue("INSTRUME", m.instrument().get(), "instrument");
        }
        h.addValue(HAS_ERRORS, hasErrors, "T: IVAR holds real errors");
        int i = 1;
        for (Map.Entry<String, String> e : m.extra().entrySet()) {
            h.addValue(String.format(java.util.Locale.ROOT, "RWXK%04d", i), e.getKey(), "metadata key");
            h.addValue(String.format(java.util.Locale.ROOT, "RWXV%04d", i), e.getValue(), "metadata value");
            i++;
        }
    }

    private static void addNumber(Header h, String key, double v, String comment) throws HeaderCardException {
        if (Double.isFinite(v)) {
            h.addValue(key, v, comment);
        }
    }

    static SpectrumMetadata readMetadata(Header h) {
        SpectrumMetadata.Builder b = SpectrumMetadata.builder();
        String id = h.getStringValue("OBJECT");
        if (id != null) {
            b.objectId(id);
        }
        b.skyPosition(h.getDoubleValue("RA", Double.NaN), h.getDoubleValue("DEC", Double.NaN));
        b.midExposureMjdUtc(h.getDoubleValue(MJD_MID, Double.NaN));
        b.exposureSeconds(h.getDoubleValue("EXPTIME", Double.NaN));
        b.site(h.getDoubleValue("OBSGEO-L", Double.NaN), h.getDoubleValue("OBSGEO-B", Double.NaN),
                h.getDoubleValue("OBSGEO-H", Double.NaN));
        String inst = h.getStringValue("INSTRUME");
        if (inst != null) {
            b.instrument(inst);
        }
        for (int i = 1; ; i++) {
            String k = h.getStringValue(String.format(java.util.Locale.ROOT, "RWXK%04d", i));
            String v = h.getStringValue(String.format(java.util.Locale.ROOT, "RWXV%04d", i));
            if (k == null || v == null) {
                break;
            }
            b.extra(k, v);
        }
        return b.build();
    }

    static boolean hasErrors(Header h) {
        return h.getBooleanValue(HAS_ERRORS, true);
    }
}
