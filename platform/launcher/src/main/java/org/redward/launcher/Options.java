package org.redward.launcher;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The global options the launcher handles itself, taken out of the command line before the rest
 * goes to the command: {@code --bundles DIR} (repeatable, anywhere) and {@code --debug}.
 */
final class Options {

    final List<Path> dropInFolders = new ArrayList<>();
    final List<String> commandLine = new ArrayList<>();
    boolean debug;

    static Options parse(String[] args, Path workingDirectory) {
        Options o = new Options();
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            if (a.equals("--debug")) {
                o.debug = true;
            } else if (a.equals("--bundles")) {
                if (i + 1 >= args.length) {
                    throw new IllegalArgumentException("--bundles needs a folder");
                }
                o.dropInFolders.add(workingDirectory.resolve(args[++i]).normalize());
            } else if (a.startsWith("--bundles=")) {
                o.dropInFolders.add(workingDirectory.resolve(a.substring("--bundles=".length())).normalize());
            } else if (a.equals("--")) {
                for (int j = i; j < args.length; j++) {
                    o.commandLine.add(args[j]);
                }
                break;
            } else {
                o.commandLine.add(a);
            }
        }
        return o;
    }

    /** The command word (first argument not starting with '-'), or empty. */
    String commandWord() {
        for (String a : commandLine) {
            if (!a.startsWith("-")) {
                return a;
            }
        }
        return "";
    }
}
