package org.redward.formats.text.internal;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The rows of a text table, one at a time, with the comment lines ({@code #}) that precede each
 * row. Delimited text (comma, tab, semicolon) is parsed by Apache Commons CSV (quotes and
 * escapes as RFC 4180); whitespace-separated columns are split on runs of blanks. Not
 * thread-safe.
 */
abstract class Rows implements AutoCloseable {

    /** One row: its fields, the comments just before it, and its line number (1-based). */
    record Row(String[] fields, List<String> comments, long line) {
    }

    /** Next row, or null at the end. Comments after the last row are returned with a row of no fields. */
    abstract Row next() throws IOException;

    @Override
    public abstract void close() throws IOException;

    static Rows open(Reader reader, char delimiter) throws IOException {
        return delimiter == ' ' ? new Blank(reader) : new Delimited(reader, delimiter);
    }

    /** Whitespace-separated columns. */
    private static final class Blank extends Rows {
        private final BufferedReader in;
        private long line;

        Blank(Reader r) {
            in = r instanceof BufferedReader b ? b : new BufferedReader(r, 1 << 16);
        }

        @Override
        Row next() throws IOException {
            List<String> comments = new ArrayList<>();
            String l;
            while ((l = in.readLine()) != null) {
                line++;
                String t = l.strip();
                if (t.isEmpty()) {
                    continue;
                }
                if (t.startsWith("#")) {
                    comments.add(t.substring(1).strip());
                    continue;
                }
                return new Row(t.split("\\s+"), comments, line);
            }
            return comments.isEmpty() ? null : new Row(new String[0], comments, line);
        }

        @Override
        public void close() throws IOException {
            in.close();
        }
    }

    /** Delimited columns through Commons CSV. */
    private static final class Delimited extends Rows {
        private final CSVParser parser;
        private final Iterator<CSVRecord> it;

        Delimited(Reader r, char delimiter) throws IOException {
            CSVFormat f = CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setCommentMarker('#')
                    .setIgnoreEmptyLines(true).setIgnoreSurroundingSpaces(true).setTrim(true).get();
            parser = f.parse(r);
            it = parser.iterator();
        }

        @Override
        Row next() throws IOException {
            try {
                while (it.hasNext()) {
                    CSVRecord rec = it.next();
                    List<String> comments = new ArrayList<>();
                    if (rec.hasComment()) {
                        for (String c : rec.getComment().split("\n")) {
                            comments.add(c.strip());
                        }
                    }
                    String[] fields = rec.values();
                    if (fields.length == 1 && fields[0].isEmpty()) {
                        continue;
                    }
                    return new Row(fields, comments, rec.getParser().getCurrentLineNumber());
                }
                return null;
            } catch (java.io.UncheckedIOException e) {
                throw e.getCause();
            } catch (IllegalStateException e) {
                throw new IOException("line " + parser.getCurrentLineNumber() + ": " + e.getMessage(), e);
            }
        }

        @Override
        public void close() throws IOException {
            parser.close();
        }
    }
}
