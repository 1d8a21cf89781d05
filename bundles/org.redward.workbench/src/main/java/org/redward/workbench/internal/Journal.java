package org.redward.workbench.internal;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.json.JSONException;
import org.json.JSONObject;
import org.redward.api.commands.Json;

/**
 * The decisions journal: one JSON object a line, appended and forced to disk at each decision
 * so that a crash loses nothing. The last line for a key wins when the journal is read back.
 * A line that cannot be parsed (e.g. cut short by a crash mid-write) is skipped and counted.
 *
 * <p>Not thread-safe: used from the UI thread.
 */
final class Journal implements AutoCloseable {

    private final Path file;
    private final FileChannel channel;
    private final Map<String, Decision> latest = new LinkedHashMap<>();
    private int unreadable;

    private Journal(Path file) throws IOException {
        this.file = file;
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        if (Files.exists(file)) {
            List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
            for (String line : lines) {
                if (line.isBlank()) {
                    continue;
                }
                try {
                    Decision d = parse(new JSONObject(line));
                    latest.put(d.key(), d);
                } catch (JSONException | IllegalArgumentException e) {
                    unreadable++;
                }
            }
        }
        channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE, StandardOpenOption.APPEND);
    }

    /** Opens (creating if needed) the journal and reads back the decisions already in it. */
    static Journal open(Path file) throws IOException {
        return new Journal(file);
    }

    Path file() { return file; }

    /** The latest decision per key, in the order first decided. */
    Map<String, Decision> decisions() { return latest; }

    /** Lines that could not be read back. */
    int unreadableLines() { return unreadable; }

    /** Appends one decision and forces it to disk before returning. */
    void append(Decision d, QueueItem item) throws IOException {
        String line = toJson(d, item) + "\n";
        ByteBuffer buf = ByteBuffer.wrap(line.getBytes(StandardCharsets.UTF_8));
        while (buf.hasRemaining()) {
            channel.write(buf);
        }
        channel.force(false);
        latest.put(d.key(), d);
    }

    static Json toJson(Decision d, QueueItem item) {
        return Json.object().put("key", d.key())
                .put("source", item == null ? "" : item.source().toAbsolutePath().normalize().toString())
                .put("index", item == null ? -1 : item.index())
                .put("id", item == null ? "" : item.id())
                .put("verdict", d.verdict().key()).put("z", d.z()).put("estimator", d.estimator())
                .put("line", d.line()).put("person_grade", d.grade().key()).put("note", d.note())
                .put("decided_by", d.who()).put("decided_at", d.when().toString());
    }

    static Decision parse(JSONObject o) {
        double z = o.isNull("z") ? Double.NaN : o.getDouble("z");
        return new Decision(o.getString("key"), Verdict.parse(o.getString("verdict")), z, o.optString("estimator"),
                o.optString("line"), PersonGrade.parse(o.getString("person_grade")), o.optString("note"),
                o.optString("decided_by"), Instant.parse(o.getString("decided_at")));
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }
}
