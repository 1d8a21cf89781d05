package org.redward.formats.fits.internal;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;

import org.redward.spectrum.SpectrumMetadata;

/**
 * Metadata from FITS header keywords. A profile may name the keywords ({@code id.keyword},
 * {@code ra.keyword}, {@code dec.keyword}, {@code ra.unit} = deg|hours) and give a fixed site
 * ({@code site.longitude}, {@code site.latitude}, {@code site.height}, east-positive degrees and
 * metres); otherwise common keywords are tried in order. Numbers in RA keywords are degrees
 * (FITS convention) unless the card's comment or the profile says hours; sexagesimal text RA is
 * hours. The mid-exposure time is MJD-OBS plus half of EXPTIME, or DATE-OBS (with a time of
 * day) plus half of EXPTIME, unless the DATE-OBS comment says it is already the median.
 */
final class MetadataKeywords {

    private static final List<String> ID_KEYS = List.of("OBJNAME", "OBJECT", "OBJID", "TARGET", "TARGNAME", "DESIG", "NAME");
    private static final List<String> RA_KEYS = List.of("RA", "OBJRA", "RA_OBJ", "PLUG_RA", "RADEG", "RA-DEG");
    private static final List<String> DEC_KEYS = List.of("DEC", "OBJDEC", "DEC_OBJ", "PLUG_DEC", "DECDEG", "DEC-DEG");
    private static final double MJD_UNIX_EPOCH = 40587.0;

    private MetadataKeywords() {
    }

    static SpectrumMetadata read(Keys k, Settings s) {
        SpectrumMetadata.Builder b = SpectrumMetadata.builder();
        Optional<String> format = s.get("id.format");
        if (format.isPresent()) {
            b.objectId(format(k, format.get()));
        } else {
            first(k, s.get("id.keyword").map(List::of).orElse(ID_KEYS)).ifPresent(key -> b.objectId(k.text(key).get()));
        }
        Optional<String> raKey = first(k, s.get("ra.keyword").map(List::of).orElse(RA_KEYS));
        Optional<String> decKey = first(k, s.get("dec.keyword").map(List::of).orElse(DEC_KEYS));
        if (raKey.isPresent() && decKey.isPresent()) {
            double ra = angle(k, raKey.get(), true, s.get("ra.unit").orElse(""));
            double dec = angle(k, decKey.get(), false, "deg");
            if (Double.isFinite(ra) && Double.isFinite(dec) && Math.abs(dec) <= 90) {
                b.skyPosition(((ra % 360) + 360) % 360, dec);
            }
        }
        double exp = k.number("EXPTIME", k.number("EXPOSURE", Double.NaN));
        if (Double.isFinite(exp)) {
            b.exposureSeconds(exp);
        }
        double half = Double.isFinite(exp) ? exp / 2.0 / 86400.0 : 0.0;
        Optional<Double> mjdObs = k.number("MJD-OBS");
        if (mjdObs.isPresent() && mjdObs.get() > 0) {
            b.midExposureMjdUtc(mjdObs.get() + half);
        } else {
            k.text("DATE-OBS").ifPresent(d -> {
                double mjd = isoToMjd(d);
                if (Double.isFinite(mjd)) {
                    String c = k.comment("DATE-OBS");
                    b.midExposureMjdUtc(c.contains("median") || c.contains("mid") ? mjd : mjd + half);
                }
            });
        }
        double lon = s.get("site.longitude").map(Double::parseDouble)
                .orElse(k.number("OBSGEO-L", k.number("LONGITUD", k.number("SITELONG", k.number("LONG-OBS", Double.NaN)))));
        double lat = s.get("site.latitude").map(Double::parseDouble)
                .orElse(k.number("OBSGEO-B", k.number("LATITUDE", k.number("SITELAT", k.number("LAT-OBS", Double.NaN)))));
        double h = s.get("site.height").map(Double::parseDouble)
                .orElse(k.number("OBSGEO-H", k.number("ALT-OBS", k.number("SITEELEV", Double.NaN))));
        if (Double.isFinite(lon) && Double.isFinite(lat)) {
            b.site(lon, lat, h);
        }
        Optional<String> inst = k.text("INSTRUME");
        Optional<String> tel = k.text("TELESCOP");
        if (inst.isPresent() || tel.isPresent()) {
            b.instrument(String.join(" / ", tel.orElse(""), inst.orElse("")).replaceAll("^ / | / $", ""));
        }
        for (String key : List.of("DATE-OBS", "MJD", "EXPTIME", "RA", "DEC")) {
            k.text(key).ifPresent(v -> b.extra("fits." + key, v));
        }
        return b.build();
    }

    /**
     * Fills {@code {KEYWORD}} and {@code {KEYWORD:%05d}} fields of a template from header
     * keywords (numbers formatted with the given Java format); a missing keyword gives {@code ?}.
     */
    static String format(Keys k, String template) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\{([A-Za-z0-9_-]+)(?::([^}]+))?}").matcher(template);
        StringBuilder sb = new StringBuilder();
        while (m.find()) {
            String key = m.group(1).toUpperCase(java.util.Locale.ROOT);
            String v = k.text(key).orElse("?");
            if (m.group(2) != null && k.number(key).isPresent()) {
                try {
                    double d = k.number(key).get();
                    v = m.group(2).endsWith("d") ? String.format(java.util.Locale.ROOT, m.group(2), (long) d)
                            : String.format(java.util.Locale.ROOT, m.group(2), d);
                } catch (java.util.IllegalFormatException e) {
                    v = k.text(key).orElse("?");
                }
            }
            m.appendReplacement(sb, java.util.regex.Matcher.quoteReplacement(v));
        }
        m.appendTail(sb);
        return sb.toString();
    }

    private static Optional<String> first(Keys k, List<String> keys) {
        for (String key : keys) {
            if (k.text(key).filter(v -> !v.isBlank()).isPresent()) {
                return Optional.of(key);
            }
        }
        return Optional.empty();
    }

    private static double angle(Keys k, String key, boolean ra, String unit) {
        String text = k.text(key).orElse("");
        if (text.contains(":") || text.trim().contains(" ")) {
            String[] p = text.trim().split("[:\\s]+");
            try {
                double sign = p[0].startsWith("-") ? -1 : 1;
                double v = Math.abs(Double.parseDouble(p[0]));
                if (p.length > 1) {
                    v += Double.parseDouble(p[1]) / 60.0;
                }
                if (p.length > 2) {
                    v += Double.parseDouble(p[2]) / 3600.0;
                }
                return sign * v * (ra ? 15.0 : 1.0);
            } catch (NumberFormatException e) {
                return Double.NaN;
            }
        }
        double v = k.number(key).orElse(Double.NaN);
        boolean hours = ra && (unit.equalsIgnoreCase("hours") || unit.equalsIgnoreCase("h")
                || (unit.isEmpty() && k.comment(key).contains("hour")));
        return hours ? v * 15.0 : v;
    }

    /** ISO date or date-time (UTC) to MJD; NaN for a date without a time of day or bad text. */
    static double isoToMjd(String text) {
        String t = text.trim();
        try {
            if (t.length() <= 10) {
                return Double.NaN;
            }
            LocalDateTime dt = LocalDateTime.parse(t.endsWith("Z") ? t.substring(0, t.length() - 1) : t);
            long days = ChronoUnit.DAYS.between(LocalDate.of(1970, 1, 1), dt.toLocalDate());
            double frac = dt.toLocalTime().toNanoOfDay() / 86_400e9;
            return MJD_UNIX_EPOCH + days + frac;
        } catch (DateTimeParseException e) {
            return Double.NaN;
        }
    }
}
