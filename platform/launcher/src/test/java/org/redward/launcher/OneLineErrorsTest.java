package org.redward.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

class OneLineErrorsTest {

    @Test
    void aComponentErrorWithTraceBecomesOneLineShownOnce() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream err = new PrintStream(new OneLineErrors(new PrintStream(bytes, true, StandardCharsets.UTF_8)), true, StandardCharsets.UTF_8);
        for (int i = 0; i < 2; i++) {
            err.println("ERROR : bundle x:1.0 (11)[bad.Bad(7)] : The activate method has thrown an exception");
            err.println("java.lang.IllegalStateException: boom");
            err.println("\tat bad.Bad.activate(Bad.java:4)");
            err.println("\tat java.base/jdk.internal.reflect.NativeMethodAccessorImpl.invoke0(Native Method)");
            err.println();
        }
        err.println("redward: something else");
        err.print("\rprogress 50%");
        err.flush();
        assertEquals("redward: bundle x:1.0 (11)[bad.Bad(7)] : The activate method has thrown an exception"
                + " (java.lang.IllegalStateException: boom) [--debug shows the details]\n"
                + "redward: something else\n\rprogress 50%", bytes.toString(StandardCharsets.UTF_8));
    }
}
