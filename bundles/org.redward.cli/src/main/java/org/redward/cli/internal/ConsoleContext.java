package org.redward.cli.internal;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Progress;

/** The command context of a console run. Immutable. */
final class ConsoleContext implements CommandContext {

    private final PrintStream out;
    private final PrintStream err;
    private final Path cwd;
    private final Path home;
    private final List<Path> dropIns;
    private final boolean debug;
    private final boolean interactive;

    ConsoleContext(PrintStream out, PrintStream err, Path cwd, Path home, List<Path> dropIns, boolean debug, boolean interactive) {
        this.out = out;
        this.err = err;
        this.cwd = cwd;
        this.home = home;
        this.dropIns = List.copyOf(dropIns);
        this.debug = debug;
        this.interactive = interactive;
    }

    @Override public PrintStream out() { return out; }
    @Override public PrintStream err() { return err; }
    @Override public Path workingDirectory() { return cwd; }
    @Override public Path productHome() { return home; }
    @Override public List<Path> dropInFolders() { return dropIns; }
    @Override public boolean debug() { return debug; }
    @Override public boolean interactive() { return interactive; }

    String productVersion() {
        String v = System.getProperty("redward.version");
        return v == null ? ProductFacts.versionOf(home) : v;
    }

    @Override
    public Progress progress(String label, long total) {
        return new ConsoleProgress(err, label, total, interactive);
    }
}
