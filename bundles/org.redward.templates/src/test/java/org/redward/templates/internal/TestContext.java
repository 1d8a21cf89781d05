package org.redward.templates.internal;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Progress;

/** A command context for tests: captures standard output and error. */
final class TestContext implements CommandContext {

    private final Path dir;
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private final PrintStream outStream = new PrintStream(out, true, StandardCharsets.UTF_8);
    private final PrintStream errStream = new PrintStream(err, true, StandardCharsets.UTF_8);

    TestContext(Path dir) {
        this.dir = dir;
    }

    String stdout() { return out.toString(StandardCharsets.UTF_8); }
    String stderr() { return err.toString(StandardCharsets.UTF_8); }

    @Override public PrintStream out() { return outStream; }
    @Override public PrintStream err() { return errStream; }
    @Override public Path workingDirectory() { return dir; }
    @Override public Path productHome() { return dir; }
    @Override public List<Path> dropInFolders() { return List.of(); }
    @Override public boolean debug() { return false; }
    @Override public boolean interactive() { return false; }

    @Override
    public Progress progress(String label, long total) {
        return new Progress() {
            @Override public void advance(long items) { }
            @Override public void total(long t) { }
            @Override public void close() { }
        };
    }
}
