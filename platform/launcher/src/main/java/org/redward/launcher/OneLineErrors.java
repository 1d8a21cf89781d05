package org.redward.launcher;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Standard error as the user sees it without {@code --debug}: framework and Declarative Services
 * messages that arrive with a stack trace (e.g. "ERROR : bundle x (12)[c] : The activate method
 * has thrown an exception" followed by the exception and its frames) are reduced to one line
 * naming the bundle and the exception's message; repeats are shown once. Everything else passes
 * through unchanged, partial lines (progress bars) included, on every flush.
 */
final class OneLineErrors extends OutputStream {

    private static final Pattern FRAMEWORK_MESSAGE = Pattern.compile("^(ERROR|WARNING) ?: .*");
    private static final Pattern EXCEPTION_LINE = Pattern.compile("^([\\w$]+\\.)+[\\w$]*(Exception|Error|Throwable)(: .*)?$");
    private static final Pattern TRACE_LINE = Pattern.compile("^(\\s+at |\\s*\\.\\.\\. \\d+ more|Caused by: |\\s*Suppressed: ).*");

    private final PrintStream target;
    private final ByteArrayOutputStream line = new ByteArrayOutputStream();
    private final Set<String> shown = new HashSet<>();
    private String pending;
    private boolean inTrace;

    OneLineErrors(PrintStream target) {
        this.target = target;
    }

    @Override
    public synchronized void write(int b) {
        line.write(b);
        if (b == '\n') {
            process(line.toString(StandardCharsets.UTF_8).stripTrailing());
            line.reset();
        }
    }

    @Override
    public synchronized void write(byte[] b, int off, int len) {
        for (int i = off; i < off + len; i++) {
            write(b[i]);
        }
    }

    @Override
    public synchronized void flush() {
        if (line.size() > 0 && pending == null && !inTrace) {
            target.print(line.toString(StandardCharsets.UTF_8));
            line.reset();
        }
        target.flush();
    }

    @Override
    public synchronized void close() throws IOException {
        if (pending != null) {
            emit(pending);
            pending = null;
        }
        flush();
    }

    private void process(String text) {
        if (pending != null) {
            String message = pending;
            pending = null;
            if (EXCEPTION_LINE.matcher(text).matches()) {
                emit(message + " (" + text.trim() + ")");
                inTrace = true;
                return;
            }
            emit(message);
        }
        if (FRAMEWORK_MESSAGE.matcher(text).matches()) {
            pending = "redward: " + text.replaceFirst("^(ERROR|WARNING) ?: ", "").trim();
            inTrace = false;
            return;
        }
        if (inTrace && (TRACE_LINE.matcher(text).matches() || text.isBlank())) {
            return;
        }
        inTrace = false;
        target.println(text);
    }

    private void emit(String message) {
        if (shown.add(message)) {
            target.println(message + " [--debug shows the details]");
        }
    }
}
