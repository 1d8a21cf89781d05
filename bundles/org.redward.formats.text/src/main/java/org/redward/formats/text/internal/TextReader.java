package org.redward.formats.text.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.zip.GZIPInputStream;

import org.osgi.service.component.annotations.Component;
import org.redward.api.formats.ColumnNames;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.registry.Provided;

/**
 * The text reader (id {@code text}): CSV, tab-, semicolon- or whitespace-separated columns,
 * UTF-8, optionally gzip-compressed. A first row that is not all numbers is the header (see
 * {@link TextColumns} for names and units); without one the columns are wavelength (Angstrom),
 * flux and, if present, sigma. {@code #} lines are comments and may carry metadata
 * ({@link CommentMetadata}). A column named {@code spectrum} splits the file into several
 * spectra, streamed one at a time.
 */
@Component(property = {Provided.ID + "=text",
        Provided.DESCRIPTION + "=text columns: CSV, tab- or whitespace-separated, header with units, one or many spectra"})
public final class TextReader implements SpectrumReader {

    @Override
    public int sniff(Path file, byte[] head) {
        if (head.length == 0 || (head.length >= 6 && new String(head, 0, 6, StandardCharsets.US_ASCII).equals("SIMPLE"))) {
            return 0;
        }
        int bad = 0;
        for (byte b : head) {
            if (b == 0) {
                return 0;
            }
            if ((b & 0xff) < 0x09 || ((b & 0xff) > 0x0d && (b & 0xff) < 0x20)) {
                bad++;
            }
        }
        if (bad > head.length / 100) {
            return 0;
        }
        String text = new String(head, StandardCharsets.UTF_8);
        List<String> lines = dataLines(text, 6);
        if (lines.isEmpty()) {
            return 1;
        }
        char d = delimiter(lines.get(0));
        String[] first = split(lines.get(0), d);
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        int ext = name.endsWith(".csv") || name.endsWith(".txt") || name.endsWith(".dat") || name.endsWith(".tsv")
                || name.endsWith(".ascii") || name.endsWith(".csv.gz") || name.endsWith(".txt.gz") ? 5 : 0;
        if (TextColumns.isHeader(first)) {
            try {
                TextColumns.fromHeader(first, Optional.empty());
                return 70 + ext;
            } catch (IllegalArgumentException e) {
                boolean hasWave = false;
                for (String c : first) {
                    if (ColumnNames.WAVELENGTH.contains(TextColumns.nameAndUnit(c)[0])) {
                        hasWave = true;
                    }
                }
                return hasWave ? 40 : 5;
            }
        }
        if (first.length >= 2 && lines.size() >= 2 && split(lines.get(1), d).length == first.length) {
            return 35 + ext;
        }
        return 5;
    }

    private static List<String> dataLines(String text, int max) {
        List<String> out = new ArrayList<>();
        for (String l : text.split("\r?\n", -1)) {
            String t = l.strip();
            if (!t.isEmpty() && !t.startsWith("#")) {
                out.add(t);
                if (out.size() >= max) {
                    break;
                }
            }
        }
        return out;
    }

    static char delimiter(String line) {
        if (line.indexOf(',') >= 0) {
            return ',';
        }
        if (line.indexOf('\t') >= 0) {
            return '\t';
        }
        if (line.indexOf(';') >= 0) {
            return ';';
        }
        return ' ';
    }

    private static String[] split(String line, char d) {
        return d == ' ' ? line.strip().split("\\s+") : line.split(java.util.regex.Pattern.quote(String.valueOf(d)), -1);
    }

    private static Reader reader(Path file) throws IOException {
        InputStream raw = Files.newInputStream(file);
        try {
            byte[] two = raw.readNBytes(2);
            InputStream in = new java.io.SequenceInputStream(new java.io.ByteArrayInputStream(two), raw);
            if (two.length == 2 && (two[0] & 0xff) == 0x1f && (two[1] & 0xff) == 0x8b) {
                in = new GZIPInputStream(in, 1 << 16);
            }
            return new InputStreamReader(in, StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT));
        } catch (IOException e) {
            raw.close();
            throw e;
        }
    }

    @Override
    public SpectrumSource open(Path file, Optional<InstrumentProfile> profile) throws SpectrumReadException {
        Rows rows = null;
        try {
            Reader probe = reader(file);
            char[] buf = new char[8192];
            int n = 0;
            try (probe) {
                for (int r; n < buf.length && (r = probe.read(buf, n, buf.length - n)) > 0; ) {
                    n += r;
                }
            }
            List<String> lines = dataLines(n <= 0 ? "" : new String(buf, 0, n), 1);
            if (lines.isEmpty()) {
                throw new SpectrumReadException(file, "no data rows (the text is empty or all comments)");
            }
            String forced = profile.flatMap(p -> p.setting("text.delimiter")).orElse("").toLowerCase(Locale.ROOT);
            char d = forced.isEmpty() ? delimiter(lines.get(0)) : forced.equals("tab") ? '\t'
                    : forced.equals("whitespace") ? ' ' : forced.charAt(0);
            rows = Rows.open(reader(file), d);
            CommentMetadata comments = new CommentMetadata();
            Rows.Row first = rows.next();
            if (first == null || first.fields().length == 0) {
                throw new SpectrumReadException(file, "no data rows (the text is empty or all comments)");
            }
            comments.add(first.comments());
            TextColumns cols;
            String what = d == ',' ? "CSV" : d == '\t' ? "tab-separated" : d == ';' ? "semicolon-separated" : "whitespace-separated";
            if (TextColumns.isHeader(first.fields())) {
                try {
                    cols = TextColumns.fromHeader(first.fields(), profile);
                } catch (IllegalArgumentException e) {
                    throw new SpectrumReadException(file, "line " + first.line() + " (header): " + e.getMessage());
                }
                first = rows.next();
                if (first == null || first.fields().length == 0) {
                    throw new SpectrumReadException(file, "a header but no data rows");
                }
            } else {
                if (first.fields().length < 2) {
                    throw new SpectrumReadException(file, "line " + first.line() + ": one column only; need at least wavelength and flux");
                }
                cols = TextColumns.positional(first.fields().length);
            }
            String layout = what + " text" + (cols.names[0].startsWith("column ") ? " without header (wavelength, flux"
                    + (cols.error >= 0 ? ", sigma)" : ")") : ", header: " + String.join(", ", cols.names))
                    + (cols.spectrum >= 0 ? "; one spectrum per value of column '" + cols.names[cols.spectrum] + "'" : "");
            return new TextSource(file, rows, cols, profile, comments, first, layout);
        } catch (SpectrumReadException e) {
            closeQuietly(rows);
            throw e;
        } catch (java.nio.charset.CharacterCodingException e) {
            closeQuietly(rows);
            throw new SpectrumReadException(file, "not UTF-8 text", e);
        } catch (IOException | RuntimeException e) {
            closeQuietly(rows);
            throw new SpectrumReadException(file, "cannot be read as text (" + (e.getMessage() == null ? e.getClass().getSimpleName()
                    : e.getMessage()) + ")", e);
        }
    }

    private static void closeQuietly(Rows r) {
        if (r != null) {
            try {
                r.close();
            } catch (IOException ignored) {
                // already failing
            }
        }
    }
}
