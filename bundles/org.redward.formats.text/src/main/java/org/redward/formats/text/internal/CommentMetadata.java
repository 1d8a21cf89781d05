package org.redward.formats.text.internal;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.redward.spectrum.SpectrumMetadata;

/**
 * Metadata in the comment lines of text spectra, shared by the reader and the CSV writer:
 * {@code # key: value} applies to every spectrum of the file, {@code # [n] key: value} to
 * spectrum n (the value of the spectrum column). Keys: object_id, ra_deg, dec_deg (ICRS),
 * mid_exposure_mjd_utc, exposure_s, site_longitude_deg (east-positive), site_latitude_deg,
 * site_height_m, instrument, flux_unit, medium (air or vacuum), has_errors (true or false), and
 * extra.NAME for any other pair. Values escape backslash and line breaks as {@code \\} and
 * {@code \n}.
 */
final class CommentMetadata {

    private static final Pattern LINE = Pattern.compile("^(?:\\[([^\\]]+)\\]\\s*)?([A-Za-z][A-Za-z0-9_.\\-]*)\\s*[:=]\\s?(.*)$");

    /** Pairs for all spectra, and per spectrum key. */
    final Map<String, String> global = new LinkedHashMap<>();
    final Map<String, Map<String, String>> perSpectrum = new LinkedHashMap<>();

    void add(List<String> comments) {
        for (String c : comments) {
            Matcher m = LINE.matcher(c.strip());
            if (!m.matches()) {
                continue;
            }
            Map<String, String> target = m.group(1) == null ? global
                    : perSpectrum.computeIfAbsent(m.group(1).trim(), k -> new LinkedHashMap<>());
            target.put(m.group(2).toLowerCase(Locale.ROOT), unescape(m.group(3).strip()));
        }
    }

    /** The pairs that apply to spectrum {@code key} (null: the only spectrum), global ones first. */
    Map<String, String> forSpectrum(String key) {
        Map<String, String> out = new LinkedHashMap<>(global);
        if (key != null && perSpectrum.containsKey(key)) {
            out.putAll(perSpectrum.get(key));
        }
        return out;
    }

    /** Forgets a spectrum's pairs once read (files of many spectra stream). */
    void done(String key) {
        if (key != null) {
            perSpectrum.remove(key);
        }
    }

    static SpectrumMetadata metadata(Map<String, String> p) {
        SpectrumMetadata.Builder b = SpectrumMetadata.builder();
        if (p.containsKey("object_id")) {
            b.objectId(p.get("object_id"));
        }
        b.skyPosition(num(p, "ra_deg"), num(p, "dec_deg"));
        b.midExposureMjdUtc(num(p, "mid_exposure_mjd_utc"));
        b.exposureSeconds(num(p, "exposure_s"));
        b.site(num(p, "site_longitude_deg"), num(p, "site_latitude_deg"), num(p, "site_height_m"));
        if (p.containsKey("instrument")) {
            b.instrument(p.get("instrument"));
        }
        for (Map.Entry<String, String> e : p.entrySet()) {
            if (e.getKey().startsWith("extra.")) {
                b.extra(e.getKey().substring(6), e.getValue());
            }
        }
        return b.build();
    }

    /** The comment lines (without {@code #}) that write this metadata for spectrum {@code key}. */
    static List<String> lines(String key, SpectrumMetadata m, String fluxUnit, boolean hasErrors) {
        Map<String, String> p = new LinkedHashMap<>();
        m.objectId().ifPresent(v -> p.put("object_id", v));
        put(p, "ra_deg", m.raDeg());
        put(p, "dec_deg", m.decDeg());
        put(p, "mid_exposure_mjd_utc", m.midExposureMjdUtc());
        put(p, "exposure_s", m.exposureSeconds());
        put(p, "site_longitude_deg", m.siteLongitudeDeg());
        put(p, "site_latitude_deg", m.siteLatitudeDeg());
        put(p, "site_height_m", m.siteHeightMetres());
        m.instrument().ifPresent(v -> p.put("instrument", v));
        p.put("flux_unit", fluxUnit);
        p.put("has_errors", Boolean.toString(hasErrors));
        for (Map.Entry<String, String> e : m.extra().entrySet()) {
            p.put("extra." + e.getKey(), e.getValue());
        }
        List<String> out = new java.util.ArrayList<>();
        for (Map.Entry<String, String> e : p.entrySet()) {
            out.add("[" + key + "] " + e.getKey() + ": " + escape(e.getValue()));
        }
        return out;
    }

    private static void put(Map<String, String> p, String k, double v) {
        if (Double.isFinite(v)) {
            p.put(k, Double.toString(v));
        }
    }

    private static double num(Map<String, String> p, String k) {
        String v = p.get(k);
        if (v == null) {
            return Double.NaN;
        }
        try {
            return Double.parseDouble(v.trim());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    static String escape(String s) {
        return s.replace("\\", "\\\\").replace("\r", "\\r").replace("\n", "\\n");
    }

    static String unescape(String s) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\\' && i + 1 < s.length()) {
                char d = s.charAt(++i);
                sb.append(d == 'n' ? '\n' : d == 'r' ? '\r' : d);
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }
}
