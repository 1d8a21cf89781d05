package org.redward.survey.internal;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

import org.json.JSONException;
import org.json.JSONObject;
import org.redward.api.survey.MeasuredRow;

/**
 * The append-only record of a run: a first line naming the run (a fingerprint of what it was
 * asked to do), then one JSON line per spectrum in input order. Rows reach the operating system
 * as they come (flushed after every row), so a process killed at any moment (kill -9) leaves a
 * journal whose complete lines are a prefix of the run; at most the last line is torn, and
 * {@link #recover} cuts it off. A power cut may lose the rows not yet on disk; they are redone.
 *
 * <p>Not thread-safe: the pipeline's collecting thread is its only writer.
 */
final class Journal implements AutoCloseable {

    static final String MAGIC = "redward-measure-journal";

    /** What an interrupted run left. */
    record State(long rows, String fingerprint) {
        /** Nothing done yet. */
        boolean empty() {
            return rows == 0;
        }
    }

    private final Path file;
    private final Writer out;

    private Journal(Path file, Writer out) {
        this.file = file;
        this.out = out;
    }

    /** The journal that belongs beside a catalogue file. */
    static Path beside(Path catalog) {
        return catalog.resolveSibling(catalog.getFileName() + ".journal");
    }

    /** Starts a new journal (replacing none: fails if one exists). */
    static Journal create(Path file, String fingerprint) throws IOException {
        Writer w = new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(file, StandardOpenOption.CREATE_NEW,
                StandardOpenOption.WRITE), StandardCharsets.UTF_8), 1 << 16);
        w.write(new JSONObject().put("journal", MAGIC).put("version", 1).put("fingerprint", fingerprint).toString());
        w.write('\n');
        w.flush();
        return new Journal(file, w);
    }

    /**
     * Reads what an interrupted run left, cutting off a torn last line so that appending goes on
     * from the last complete row.
     *
     * @throws IOException if the file is not a journal
     */
    static State recover(Path file) throws IOException {
        long goodEnd = 0;
        long rows = 0;
        String fingerprint = null;
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ, StandardOpenOption.WRITE)) {
            InputStream in = Channels.newInputStream(ch);
            LineCounter lines = new LineCounter(in);
            String line;
            while ((line = lines.next()) != null) {
                if (!lines.endedWithNewline()) {
                    break;
                }
                JSONObject o;
                try {
                    o = new JSONObject(line);
                } catch (JSONException e) {
                    break;
                }
                if (fingerprint == null) {
                    if (!MAGIC.equals(o.optString("journal"))) {
                        throw new IOException(file + ": not a measure journal");
                    }
                    fingerprint = o.optString("fingerprint");
                } else {
                    if (o.optLong("sequence", -1) != rows) {
                        break;
                    }
                    rows++;
                }
                goodEnd = lines.offset();
            }
            if (fingerprint == null) {
                throw new IOException(file + ": not a measure journal (no header line)");
            }
            if (ch.size() > goodEnd) {
                ch.truncate(goodEnd);
            }
        }
        return new State(rows, fingerprint);
    }

    /** Opens a recovered journal for appending. */
    static Journal append(Path file) throws IOException {
        Writer w = new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(file, StandardOpenOption.APPEND,
                StandardOpenOption.WRITE), StandardCharsets.UTF_8), 1 << 16);
        return new Journal(file, w);
    }

    /** Appends one row and hands it to the operating system. */
    void write(MeasuredRow row) throws IOException {
        out.write(RowCodec.toJson(row).toString());
        out.write('\n');
        out.flush();
    }

    Path file() {
        return file;
    }

    @Override
    public void close() throws IOException {
        out.close();
    }

    /** The rows of a (closed) journal, streamed: each iteration reads the file again. */
    static Iterable<MeasuredRow> rows(Path file) {
        return JsonRows.read(file, true);
    }

    /** Reads UTF-8 lines while tracking the byte offset after each complete line. */
    private static final class LineCounter {
        private final InputStream in;
        private final byte[] buf = new byte[1 << 16];
        private int pos;
        private int len;
        private long offset;
        private boolean newline;
        private final java.io.ByteArrayOutputStream line = new java.io.ByteArrayOutputStream();

        LineCounter(InputStream in) {
            this.in = in;
        }

        String next() throws IOException {
            line.reset();
            newline = false;
            while (true) {
                if (pos == len) {
                    len = in.read(buf);
                    pos = 0;
                    if (len <= 0) {
                        len = 0;
                        return line.size() == 0 ? null : line.toString(StandardCharsets.UTF_8);
                    }
                }
                byte b = buf[pos++];
                offset++;
                if (b == '\n') {
                    newline = true;
                    return line.toString(StandardCharsets.UTF_8);
                }
                line.write(b);
            }
        }

        boolean endedWithNewline() {
            return newline;
        }

        long offset() {
            return offset;
        }
    }
}
