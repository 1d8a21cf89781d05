package org.redward.testkit;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Assumptions;

/**
 * Makes sure an X server answers on the display named by {@code DISPLAY} (the workbench build
 * sets {@code :97} for its tests): starts {@code Xvfb} there when nothing is listening, so that
 * {@code mvn verify} runs the UI tests without a wrapper (apt packages: xvfb, libgtk-3-0,
 * fonts-dejavu-core, xdotool). Without Xvfb installed the tests are
 * skipped, except in CI where they fail.
 */
public final class HeadlessDisplay {

    private static Process xvfb;

    private HeadlessDisplay() {
    }

    /**
     * The X display to use: {@code DISPLAY} when set, else {@code :97}; an X server is started
     * there when none listens.
     */
    public static synchronized String ensure() throws IOException, InterruptedException {
        String display = System.getenv("DISPLAY");
        if (display == null || display.isBlank()) {
            display = ":97";
        }
        String number = display.substring(display.indexOf(':') + 1).split("\\.")[0];
        Path socket = Path.of("/tmp/.X11-unix/X" + number);
        if (Files.exists(socket)) {
            return display;
        }
        if (xvfb == null) {
            try {
                xvfb = new ProcessBuilder("Xvfb", ":" + number, "-screen", "0", "1600x1000x24", "-nolisten", "tcp")
                        .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            } catch (IOException e) {
                unavailable("Xvfb is not installed (apt-get install xvfb): " + e.getMessage());
                return display;
            }
            Runtime.getRuntime().addShutdownHook(new Thread(() -> xvfb.destroy()));
        }
        for (int i = 0; i < 100 && !Files.exists(socket); i++) {
            Thread.sleep(50);
        }
        if (!Files.exists(socket)) {
            unavailable("Xvfb did not come up on " + display);
        }
        return display;
    }

    private static void unavailable(String why) {
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            throw new AssertionError("UI tests need an X server: " + why);
        }
        Assumptions.abort(why);
    }

    /** Runs xdotool with these arguments (real X events through the XTEST extension). */
    public static void xdotool(String... args) throws IOException, InterruptedException {
        String[] cmd = new String[args.length + 1];
        cmd[0] = "xdotool";
        System.arraycopy(args, 0, cmd, 1, args.length);
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes());
        if (p.waitFor() != 0) {
            throw new IOException("xdotool " + String.join(" ", args) + " failed: " + out);
        }
    }
}
