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
}
