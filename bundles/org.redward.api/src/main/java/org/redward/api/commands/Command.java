package org.redward.api.commands;

import java.util.List;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * A command of the {@code redward} command line, contributed by any bundle as a service with the
 * properties {@value #NAME} (the word the user types) and {@value #SUMMARY} (one line for the
 * command list).
 *
 * <p>The platform parses the global options ({@code --bundles DIR}, {@code --debug}) before the
 * command runs; everything after the command word is passed in {@code arguments}. Each command
 * parses its own options and must answer {@code --help}.
 *
 * <p>Threading: {@link #run} is called on a worker thread, never the main (UI) thread; a command
 * that needs the main thread uses the {@link java.util.concurrent.Executor} service registered
 * with {@code redward.thread=main}.
 */
@ConsumerType
public interface Command {

    /** Service property: the command word, e.g. {@code measure}. */
    String NAME = "redward.command.name";
    /** Service property: one-line summary shown by {@code redward --help}. */
    String SUMMARY = "redward.command.summary";

    /**
     * Runs the command.
     *
     * @return the process exit status: 0 success, 1 the work failed (partly), 2 bad usage
     * @throws UsageException for bad options (reported in one line, exit status 2)
     * @throws Exception anything else: reported in one line (with the stack trace under --debug), exit status 1
     */
    int run(CommandContext context, List<String> arguments) throws Exception;
}
