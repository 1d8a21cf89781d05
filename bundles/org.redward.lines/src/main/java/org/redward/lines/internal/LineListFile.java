package org.redward.lines.internal;

import java.io.ByteArrayInputStream;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.redward.api.lines.LineKind;
import org.redward.api.lines.LineList;
import org.redward.api.lines.SpectralLine;
import org.redward.spectrum.SpectralUnit;

/**
 * Reads a line-list file (the format of {@code linelists/standard.tsv} in this bundle):
 * tab-separated, {@code #} starts a comment, {@code @key<TAB>value} lines give {@code id},
 * {@code version} and {@code description}, every other line is one line: name, rest (vacuum
 * Angstrom, or a frequency followed by {@code Hz}, {@code MHz} or {@code GHz}, converted with
 * lambda = c / nu), kind, group ({@code -} for none), ratio ({@code -} for free), weight, broad
 * ({@code yes}/{@code no}), source. Stateless; thread-safe.
 */
public final class LineListFile {

    private LineListFile() {
    }

    /**
     * Parses a list.
     *
     * @param where the file's name, for messages
     * @throws IOException on a read error, or naming the file, line number and column at fault
     */
    public static LineList read(InputStream in, String where) throws IOException {
        byte[] bytes = in.readAllBytes();
        Map<String, String> meta = new LinkedHashMap<>();
        List<SpectralLine> lines = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(new ByteArrayInputStream(bytes), StandardCharsets.UTF_8))) {
            String text;
            int no = 0;
            while ((text = r.readLine()) != null) {
                no++;
                String t = text.strip();
                if (t.isEmpty() || t.startsWith("#")) {
                    continue;
                }
                String[] f = text.split("\t", -1);
                if (t.startsWith("@")) {
                    if (f.length < 2) {
                        throw new IOException(where + " line " + no + ": metadata '" + t + "' has no tab-separated value");
                    }
                    meta.put(f[0].strip().substring(1).toLowerCase(Locale.ROOT), f[1].strip());
                    continue;
                }
                if (f.length < 8) {
                    throw new IOException(where + " line " + no + ": " + f.length + " tab-separated columns, 8 expected "
                            + "(name, rest, kind, group, ratio, weight, broad, source)");
                }
                lines.add(parseLine(f, where, no));
            }
        }
        String id = meta.get("id");
        if (id == null || id.isEmpty()) {
            throw new IOException(where + ": no '@id' line");
        }
        if (lines.isEmpty()) {
            throw new IOException(where + ": no lines");
        }
        lines.sort(Comparator.comparingDouble(SpectralLine::vacuumAngstrom));
        return new Parsed(id, meta.getOrDefault("version", "0"), meta.getOrDefault("description", ""), sha256(bytes), lines);
    }

    private static SpectralLine parseLine(String[] f, String where, int no) throws IOException {
        String name = f[0].strip();
        String at = where + " line " + no + " (" + name + ")";
        try {
            double rest = parseRest(f[1].strip());
            LineKind kind = LineKind.parse(f[2]);
            String group = dash(f[3]) ? "" : f[3].strip();
            double ratio = dash(f[4]) ? Double.NaN : Double.parseDouble(f[4].strip());
            double weight = Double.parseDouble(f[5].strip());
            String broad = f[6].strip().toLowerCase(Locale.ROOT);
            if (!broad.equals("yes") && !broad.equals("no")) {
                throw new IllegalArgumentException("column broad is '" + f[6] + "', not yes or no");
            }
            return new SpectralLine(name, rest, kind, group, ratio, weight, broad.equals("yes"), f[7].strip());
        } catch (IllegalArgumentException e) {
            throw new IOException(at + ": " + e.getMessage(), e);
        }
    }

    private static boolean dash(String s) {
        String t = s.strip();
        return t.isEmpty() || t.equals("-");
    }

    /** A vacuum wavelength in Angstrom, or a frequency with its unit (lambda = c / nu). */
    static double parseRest(String text) {
        String[] parts = text.split("\\s+");
        double v = Double.parseDouble(parts[0]);
        if (parts.length == 1) {
            return v;
        }
        Optional<SpectralUnit> unit = SpectralUnit.parse(parts[1]);
        if (unit.isEmpty()) {
            throw new IllegalArgumentException("unit '" + parts[1] + "' of the rest column is not Angstrom, nm, um, Hz, MHz or GHz");
        }
        return unit.get().toAngstrom(v);
    }

    private static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }

    /** An immutable list read from a file. */
    record Parsed(String id, String version, String description, String checksum, List<SpectralLine> lines) implements LineList {
        Parsed {
            lines = List.copyOf(lines);
        }

        @Override
        public String toString() {
            return "LineList[" + id + " " + version + ", " + lines.size() + " lines]";
        }
    }

    /** The list that ships inside this bundle, read from the class path (for plain tests and fallbacks). */
    public static LineList standard() {
        try (InputStream in = LineListFile.class.getResourceAsStream("/linelists/standard.tsv")) {
            if (in == null) {
                throw new IllegalStateException("linelists/standard.tsv is missing from the lines bundle");
            }
            return read(in, "linelists/standard.tsv");
        } catch (IOException e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }
}
