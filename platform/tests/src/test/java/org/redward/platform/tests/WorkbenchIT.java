package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.redward.testkit.HeadlessDisplay;
import org.redward.testkit.SharedData;

/**
 * {@code redward workbench --snapshot} in the assembled product under an X server: the window
 * opens inside Felix on the launcher's main thread, shows a real spectrum of ../shared/realdata
 * (SDSS public data release) read by the product's readers, reports an unreadable file in one
 * line, writes a PNG of itself and exits 0.
 */
class WorkbenchIT {

    @Test
    void snapshotOfARealSpectrum() throws Exception {
        String display = HeadlessDisplay.ensure();
        Path work = Files.createDirectories(Path.of("target", "workbench-it").toAbsolutePath());
        Path png = work.resolve("workbench.png");
        Files.deleteIfExists(png);
        Path bad = Files.writeString(work.resolve("not-a-spectrum.fits"), "plain text, not FITS");
        Path spectrum = SharedData.realData().resolve("spec-0266-51630-0168.fits");
        Product.Run r = Product.run(work, Map.of("DISPLAY", display, "GSETTINGS_BACKEND", "memory"), 240,
                "workbench", "--json", "--snapshot", png.toString(), "--journal", work.resolve("journal.jsonl").toString(),
                spectrum.toString(), bad.toString());
        assertEquals(0, r.status(), r.toString());
        assertTrue(Files.size(png) > 20_000, "a PNG of the window was written");
        assertTrue(r.out().contains("\"spectra\":2"), r.out());
        assertTrue(r.out().contains("first_window_ms_after_command"), r.out());
        assertTrue(r.err().contains("not-a-spectrum.fits"), "the unreadable file is reported: " + r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace: " + r.err());
    }

    /**
     * While the window is open (inside Felix, on the launcher's main thread), a bundle jar from
     * disk is installed through the window: the example estimator bundle (not part of the
     * product) starts and its estimator shows in the Bundles panel; a jar that is not a bundle
     * gives a message in the window and the rest keeps working. The queue holds a catalogue one of
     * whose spectra has moved and an unreadable file beside a real spectrum of ../shared/realdata
     * (SDSS public data release): each problem is one line, the good spectrum is shown.
     */
    @Test
    void installWhileRunningMovedCatalogueAndUnreadableFile() throws Exception {
        String display = HeadlessDisplay.ensure();
        Path work = Files.createDirectories(Path.of("target", "workbench-it-install").toAbsolutePath());
        Path png = work.resolve("workbench-install.png");
        Files.deleteIfExists(png);
        Path journal = work.resolve("journal-" + System.nanoTime() + ".jsonl");
        Path example = Path.of(System.getProperty("redward.example.jar"));
        Path notABundle = Files.writeString(work.resolve("not-a-bundle.jar"), "plain text, not a jar");
        Path unreadable = Files.writeString(work.resolve("unreadable.fits"), "SIMPLE  = nonsense");
        Path real = SharedData.realData().resolve("spec-0266-51630-0367.fits");
        Path catalogue = work.resolve("moved.jsonl");
        Files.writeString(catalogue, String.join("\n",
                "{\"source\":\"" + real + "\",\"index\":0,\"id\":\"kept\",\"status\":\"ok\",\"z\":0.1,\"class\":\"galaxy\",\"alternatives\":[]}",
                "{\"source\":\"" + work.resolve("gone/away.fits") + "\",\"index\":0,\"id\":\"gone\",\"status\":\"ok\",\"z\":0.2,\"class\":\"galaxy\",\"alternatives\":[]}") + "\n");
        Product.Run r = Product.run(work, Map.of("DISPLAY", display, "GSETTINGS_BACKEND", "memory"), 240,
                "workbench", "--json", "--snapshot", png.toString(), "--journal", journal.toString(),
                "--install", example.toString(), "--install", notABundle.toString(), catalogue.toString(), unreadable.toString());
        assertEquals(0, r.status(), r.toString());
        assertTrue(Files.size(png) > 20_000, "a PNG of the window was written");
        assertTrue(r.out().contains("\"spectra\":3"), r.out());
        assertTrue(r.out().contains("\"id\":\"example-brightest-line\""), "the installed estimator is listed: " + r.out());
        assertTrue(r.out().contains("installed and started org.redward.example.estimator"), r.out());
        assertTrue(r.out().contains("estimator 'example-brightest-line' is now installed"), r.out());
        assertTrue(r.err().contains("not-a-bundle.jar was not installed"), "the bad jar is one message: " + r.err());
        assertTrue(r.err().contains("away.fits") && r.err().contains("moved"), "the moved spectrum is reported: " + r.err());
        assertTrue(r.err().contains("unreadable.fits"), "the unreadable file is reported: " + r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace: " + r.err());
    }
}
