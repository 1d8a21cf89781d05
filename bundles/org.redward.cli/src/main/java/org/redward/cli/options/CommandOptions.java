package org.redward.cli.options;

import java.io.PrintStream;
import java.util.List;

import org.redward.api.commands.UsageException;

import picocli.CommandLine;

/**
 * Parses a command's arguments into its picocli options object.
 *
 * <p>{@code --help} prints the command's usage; {@code --version} of a command is answered by the
 * dispatcher before the command runs. A bad option or parameter becomes a {@link UsageException},
 * which the dispatcher prints as one line naming the command. Stateless and thread-safe.
 */
public final class CommandOptions {

    private CommandOptions() {
    }

    /**
     * @param options the picocli-annotated options object to fill
     * @param arguments the command's arguments (after the command name)
     * @param out where the usage goes for {@code --help}
     * @return false when the usage was printed and the command has nothing more to do
     * @throws UsageException for an unknown option, a missing or malformed value
     */
    public static boolean parse(Object options, List<String> arguments, PrintStream out) {
        return parse(new CommandLine(options), arguments, out);
    }

    /**
     * As {@link #parse(Object, List, PrintStream)}, for a command line the caller has configured
     * (e.g. {@code setUnmatchedOptionsArePositionalParams} so that negative numbers are values).
     */
    public static boolean parse(CommandLine cl, List<String> arguments, PrintStream out) {
        try {
            cl.parseArgs(arguments.toArray(new String[0]));
        } catch (CommandLine.ParameterException e) {
            throw new UsageException(e.getMessage());
        }
        if (cl.isUsageHelpRequested() || cl.isVersionHelpRequested()) {
            cl.usage(out);
            return false;
        }
        return true;
    }
}
