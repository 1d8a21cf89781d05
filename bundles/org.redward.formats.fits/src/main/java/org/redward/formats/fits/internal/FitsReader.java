package org.redward.formats.fits.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.zip.GZIPInputStream;

import org.osgi.service.component.annotations.Component;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.registry.Provided;

/**
 * The FITS reader (id {@code fits}): 1D images with a spectral WCS or log-linear keywords,
 * binary tables of one or many spectra, 2D images whose rows are spectra; gzip-compressed files
 * too. An instrument profile for this reader may say how the file is laid out (see the profile
 * bundle's README) and is matched to files by its {@code match.KEYWORD = pattern} settings
 * against the primary header ({@code *} and {@code ?} wildcards, case-insensitive; all must
 * match).
 */
@Component(property = {Provided.ID + "=fits",
        Provided.DESCRIPTION + "=FITS spectra: 1D images with a spectral WCS, binary tables (one or many spectra), 2D images of many spectra"})
public final class FitsReader implements SpectrumReader {

    /** How much of a file's start is searched for primary-header keywords when matching profiles. */
    private static final int MATCH_BYTES = 2880 * 20;

    @Override
    public int sniff(Path file, byte[] head) {
        return FitsFileView.isFits(head) ? 60 : 0;
    }

    @Override
    public int matches(Path file, byte[] head, InstrumentProfile profile) {
        try {
            Map<String, String> match = new LinkedHashMap<>();
            for (Map.Entry<String, String> e : profile.settings().entrySet()) {
                if (e.getKey().startsWith("match.")) {
                    match.put(e.getKey().substring(6).toUpperCase(Locale.ROOT), e.getValue().trim());
                }
            }
            if (match.isEmpty() || !FitsFileView.isFits(head)) {
                return 0;
            }
            Map<String, String> cards = primaryCards(file);
            for (Map.Entry<String, String> m : match.entrySet()) {
                String v = cards.get(m.getKey());
                if (v == null || !glob(m.getValue()).matcher(v).matches()) {
                    return 0;
                }
            }
            return 90;
        } catch (Exception e) {
            return 0;
        }
    }

    static Pattern glob(String g) {
        StringBuilder sb = new StringBuilder();
        for (char c : g.toCharArray()) {
            sb.append(c == '*' ? ".*" : c == '?' ? "." : Pattern.quote(String.valueOf(c)));
        }
        return Pattern.compile(sb.toString(), Pattern.CASE_INSENSITIVE);
    }

    /** The primary header's keyword values (string quotes removed, trimmed), from the first blocks. */
    static Map<String, String> primaryCards(Path file) throws IOException {
        byte[] buf;
        try (InputStream raw = Files.newInputStream(file)) {
            InputStream in = raw;
            byte[] two = raw.readNBytes(2);
            in = new java.io.SequenceInputStream(new java.io.ByteArrayInputStream(two), raw);
            if (FitsFileView.isGzip(two)) {
                in = new GZIPInputStream(in);
            }
            buf = in.readNBytes(MATCH_BYTES);
        }
        Map<String, String> out = new LinkedHashMap<>();
        for (int p = 0; p + 80 <= buf.length; p += 80) {
            String card = new String(buf, p, 80, StandardCharsets.US_ASCII);
            String key = card.substring(0, 8).trim();
            if (key.equals("END")) {
                break;
            }
            if (card.startsWith("= ", 8)) {
                String v = card.substring(10).trim();
                if (v.startsWith("'")) {
                    int end = v.indexOf('\'', 1);
                    v = end > 0 ? v.substring(1, end) : v.substring(1);
                } else {
                    int slash = v.indexOf('/');
                    v = slash >= 0 ? v.substring(0, slash) : v;
                }
                out.putIfAbsent(key, v.trim());
            }
        }
        return out;
    }

    @Override
    public SpectrumSource open(Path file, Optional<InstrumentProfile> profile) throws SpectrumReadException {
        FitsFileView view = FitsFileView.open(file);
        try {
            Plan plan = Layouts.choose(view, new Settings(profile.orElse(null)));
            return new FitsSource(view, plan);
        } catch (IllegalArgumentException e) {
            view.close();
            throw new SpectrumReadException(file, e.getMessage(), e);
        } catch (Exception | OutOfMemoryError e) {
            view.close();
            throw new SpectrumReadException(file, "cannot be read (" + FitsFileView.message(e) + ")", e);
        }
    }
}
