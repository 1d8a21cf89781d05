package org.redward.mock.internal;

import java.io.PrintStream;
import java.util.List;

import org.redward.api.commands.UsageException;

import picocli.CommandLine;

/** Option parsing shared by the demo and benchmark commands. */
final class Cli {

    private Cli() {
    }

    /**
     * Parses {@code arguments} into {@code options} (a picocli-annotated object).
     *
     * @return false if help was asked for and printed on {@code out} (the command should return 0)
     * @throws UsageException naming the command and the option at fault
     */
    static boolean parse(Object options, List<String> arguments, String command, PrintStream out) {
        CommandLine cl = new CommandLine(options);
        try {
            cl.parseArgs(arguments.toArray(new String[0]));
        } catch (CommandLine.ParameterException e) {
            throw new UsageException(e.getMessage());
        }
        if (cl.isUsageHelpRequested()) {
            cl.usage(out);
            return false;
        }
        if (cl.isVersionHelpRequested()) {
            out.println(command + ": survey generator version " + SurveyGenerator.VERSION);
            return false;
        }
        return true;
    }
}
