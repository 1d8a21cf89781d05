package org.redward.api.commands;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;

import org.osgi.annotation.versioning.ProviderType;

/** What a running command may use of its surroundings. Provided by the platform; thread-safe. */
@ProviderType
public interface CommandContext {

    /** Standard output (results; JSON lines under --json). */
    PrintStream out();

    /** Standard error (messages, warnings, progress). */
    PrintStream err();

    /** The user's working directory: resolve relative paths against it. */
    Path workingDirectory();

    /** The product's installation folder (holds bin/, bundles/, conf/). */
    Path productHome();

    /** The drop-in folders given with {@code --bundles}. */
    List<Path> dropInFolders();

    /** True when {@code --debug} was given: show stack traces. */
    boolean debug();

    /** True when standard error is an interactive terminal (show progress bars). */
    boolean interactive();

    /**
     * A progress display for long work: a bar with rate and time left on a terminal, otherwise
     * occasional lines; nothing under {@code quiet}.
     *
     * @param total the number of work items, or -1 if unknown
     */
    Progress progress(String label, long total);
}
