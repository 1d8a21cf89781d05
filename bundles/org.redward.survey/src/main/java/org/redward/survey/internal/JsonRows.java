package org.redward.survey.internal;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.NoSuchElementException;

import org.json.JSONObject;
import org.redward.api.survey.MeasuredRow;

/** Streams rows back from a file of JSON lines written by {@link RowCodec}. */
final class JsonRows {

    private JsonRows() {
    }

    /**
     * The rows of the file; each iteration reads it again. Iterators throw
     * {@link UncheckedIOException} on a read error.
     *
     * @param skipFirst skip a header line (the journal's)
     */
    static Iterable<MeasuredRow> read(Path file, boolean skipFirst) {
        return () -> new Iterator<>() {
            private final BufferedReader in = open();
            private MeasuredRow next = advance();

            private BufferedReader open() {
                try {
                    BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8);
                    if (skipFirst) {
                        r.readLine();
                    }
                    return r;
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }

            private MeasuredRow advance() {
                try {
                    String line = in.readLine();
                    if (line == null) {
                        in.close();
                        return null;
                    }
                    return RowCodec.parse(new JSONObject(line));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }

            @Override
            public boolean hasNext() {
                return next != null;
            }

            @Override
            public MeasuredRow next() {
                if (next == null) {
                    throw new NoSuchElementException();
                }
                MeasuredRow r = next;
                next = advance();
                return r;
            }
        };
    }
}
