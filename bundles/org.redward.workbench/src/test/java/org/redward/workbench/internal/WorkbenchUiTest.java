package org.redward.workbench.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.LineMatch;
import org.redward.lines.internal.LineListFile;
import org.redward.lines.internal.MatchedFilterFinder;
import org.redward.lines.internal.PairVoteIdentifier;
import org.redward.spectrum.Spectrum;
import org.redward.testkit.HeadlessDisplay;
import org.redward.testkit.SharedData;

/**
 * The workbench under an X server with real events (keys posted through SWT, mouse clicks through
 * xdotool): open real spectra of ../shared/realdata (SDSS public data releases; published z in
 * truth.tsv, used here only as the reference value), move through the queue, pick a runner-up,
 * set z by naming a line at a clicked feature, close, reopen from the journal. Screenshots of
 * each step go to target/ui-shots/.
 */
class WorkbenchUiTest {

    static final Path SHOTS = Path.of("target", "ui-shots");
    static Display display;

    @BeforeAll
    static void up() throws Exception {
        HeadlessDisplay.ensure();
        display = Display.getDefault();
        Files.createDirectories(SHOTS);
    }

    @AfterAll
    static void down() {
        if (display != null && !display.isDisposed()) {
            display.dispose();
        }
    }

    static void pumpUntil(BooleanSupplier done, long millis) {
        long limit = System.currentTimeMillis() + millis;
        while (!done.getAsBoolean() && System.currentTimeMillis() < limit) {
            if (!display.readAndDispatch()) {
                display.timerExec(20, () -> { });
                display.sleep();
            }
        }
        while (display.readAndDispatch()) {
            // drain
        }
    }

    static void pump(long millis) {
        pumpUntil(() -> false, millis);
    }

    static void key(int keyCode, char character) {
        Event down = new Event();
        down.type = SWT.KeyDown;
        down.keyCode = keyCode;
        down.character = character;
        assertTrue(display.post(down), "key posted");
        Event up = new Event();
        up.type = SWT.KeyUp;
        up.keyCode = keyCode;
        up.character = character;
        display.post(up);
        pump(150);
    }

    static WorkbenchWindow open(TestBackend backend, Journal journal, List<Path> files) {
        WorkbenchWindow w = new WorkbenchWindow(display, backend, journal, backend.estimators());
        w.open(1440, 900);
        w.shell().setLocation(0, 0);
        w.add(files);
        pumpUntil(() -> !w.busy() && w.spectrumCanvas().chart() != null, 30_000);
        pump(200);
        return w;
    }

    @Test
    void walkDecideCloseReopen() throws Exception {
        Path real = SharedData.realData();
        // published z (truth.tsv, SDSS SPECOBJ Z): reference values only
        Path starforming = real.resolve("spec-0266-51630-0168.fits"); // z = 0.06740563
        Path starburst = real.resolve("spec-1068-52614-0006.fits"); // z = 0.02733033
        Path third = real.resolve("spec-0268-51633-0251.fits"); // z = 0.03175354
        Path broken = Files.writeString(Files.createTempFile("not-a-spectrum", ".fits"), "this is not FITS");
        Path journalFile = Path.of("target", "ui-journal-" + System.nanoTime() + ".jsonl");
        TestBackend backend = new TestBackend();

        double zPicked;
        double zLine;
        try (Journal journal = Journal.open(journalFile)) {
            WorkbenchWindow w = open(backend, journal, List.of(starforming, starburst, broken, third));
            w.snapshot(SHOTS.resolve("1-opened.png"));
            assertEquals(4, w.queue().all().size());
            assertEquals(0, w.queue().cursor());
            assertNotNull(w.spectrumCanvas().chart(), "first spectrum drawn");

            // real key events: Right moves on, the second spectrum is drawn
            w.shell().forceActive();
            pump(100);
            key(SWT.ARROW_RIGHT, '\0');
            pumpUntil(() -> !w.busy(), 20_000);
            assertEquals(1, w.queue().cursor(), "moved to the second spectrum");
            // pick the runner-up with key 2 and take it with Enter
            key(0, '2');
            QueueItem second = w.queue().current();
            double alt2 = second.answers().get("comb-em").alternatives().get(1);
            assertEquals(alt2, w.shownZ(), 1e-12, "picking an alternative moves the line markers to its z");
            w.snapshot(SHOTS.resolve("2-alternative-previewed.png"));
            key(SWT.CR, '\r');
            assertNotNull(second.decision(), "Enter decided");
            assertEquals(Verdict.ALTERNATIVE, second.decision().verdict());
            zPicked = second.decision().z();
            assertEquals(alt2, zPicked, 0);

            // the broken file: a message in the window, the rest keeps working
            key(SWT.ARROW_RIGHT, '\0');
            pumpUntil(() -> !w.busy(), 20_000);
            assertTrue(w.messages().stream().anyMatch(m -> m.contains("not-a-spectrum")), "problem reported: " + w.messages());
            w.snapshot(SHOTS.resolve("3-unreadable-file.png"));
            key(SWT.ARROW_RIGHT, '\0');
            pumpUntil(() -> !w.busy() && w.spectrumCanvas().chart() != null, 20_000);
            assertEquals(3, w.queue().cursor());

            // click the strongest emission feature (Hα at this z) and name it
            Backend.Loaded l = backend.load(w.queue().current());
            double[] wl = l.spectrum().axis().vacuumAngstrom();
            double[] f = l.spectrum().flux();
            int peak = 0;
            for (int i = 0; i < f.length; i++) {
                if (wl[i] > 6600 && wl[i] < 7000 && (f[i] > f[peak] || wl[peak] <= 6600)) {
                    peak = i;
                }
            }
            // zoom around the feature so that one screen pixel is a small fraction of an Angstrom
            w.spectrumCanvas().showX(wl[peak] - 40, wl[peak] + 40);
            w.spectrumCanvas().drawNow();
            pump(100);
            int px = w.spectrumCanvas().pixelOfX(wl[peak]);
            Point p = w.spectrumCanvas().toDisplay(px, w.spectrumCanvas().getSize().y / 2);
            HeadlessDisplay.xdotool("mousemove", Integer.toString(p.x), Integer.toString(p.y));
            HeadlessDisplay.xdotool("click", "1");
            pump(300);
            assertTrue(w.chooseLine("H-alpha"), "H-alpha offered for the clicked feature");
            w.snapshot(SHOTS.resolve("4-feature-named.png"));
            w.setZFromLine();
            QueueItem fourth = w.queue().current();
            assertEquals(Verdict.LINE, fourth.decision().verdict());
            zLine = fourth.decision().z();

            // the click snapped to the line the finder fitted; naming it H-alpha gives the z that the
            // line identification of the lines bundle gives for the same detected line (to 1e-5)
            Spectrum spec = l.spectrum();
            List<DetectedLine> detected = new MatchedFilterFinder().find(spec, FinderSettings.defaults()).lines();
            assertTrue(detected.stream().anyMatch(d -> d.centreAngstrom() == w.pickedAngstrom()), "click snapped to a fitted centre");
            Identification id = new PairVoteIdentifier().identify(detected, LineListFile.standard(), IdentifySettings.defaults(),
                    spec.axis().minVacuumAngstrom(), spec.axis().maxVacuumAngstrom());
            LineMatch ha = id.best().orElseThrow().matches().stream()
                    .filter(m -> m.line().name().equals("H-alpha")).findFirst().orElseThrow();
            assertEquals(w.pickedAngstrom(), detected.get(ha.detectedIndex()).centreAngstrom(), 0, "same detected line");
            assertEquals(ha.z(), zLine, 1e-5, "workbench z from a named line against the lines bundle's identification");
            // SDSS published z = 0.03175354 (truth.tsv); a click is good to a fraction of a pixel
            // (69 km/s per pixel, 1e-4 in log10 lambda), and Hα's emission centre may sit a few tens of km/s off
            assertEquals(0.03175354, zLine, 3e-4);
            // a grade with a real key
            key(0, 's');
            assertEquals(PersonGrade.SECURE, fourth.decision().grade());
            w.snapshot(SHOTS.resolve("5-decided.png"));

            // the physics panel shows velocities for the z shown, with its caution column
            assertTrue(w.physicsTable().getItemCount() >= 5);

            // a bundle jar that cannot be installed: a message, nothing else changes
            w.install(broken);
            assertTrue(w.messages().get(w.messages().size() - 1).contains("was not installed"));

            Path exported = Path.of("target", "ui-export.csv");
            w.export(exported);
            List<String> rows = Files.readAllLines(exported);
            assertEquals(5, rows.size());
            assertTrue(rows.get(0).startsWith("source,index,id,status,error,z,z_err,class,grade,estimator,alternatives,verdict"));
            w.shell().close();
            pump(200);
        }

        // reopen with the same journal: the decisions are there
        try (Journal journal = Journal.open(journalFile)) {
            assertEquals(2, journal.decisions().size());
            WorkbenchWindow w = open(new TestBackend(), journal, List.of(starforming, starburst, broken, third));
            QueueItem second = w.queue().all().get(1);
            QueueItem fourth = w.queue().all().get(3);
            assertNotNull(second.decision());
            assertEquals(zPicked, second.decision().z(), 0);
            assertEquals(zLine, fourth.decision().z(), 0);
            assertEquals(PersonGrade.SECURE, fourth.decision().grade());
            assertEquals("tester", fourth.decision().who());
            w.queue().moveTo(3);
            w.showCurrent();
            pumpUntil(() -> !w.busy(), 20_000);
            pump(200);
            w.snapshot(SHOTS.resolve("6-reopened.png"));
            assertFalse(w.shell().isDisposed());
            w.shell().close();
            pump(100);
        }
        Files.deleteIfExists(broken);
    }

    /**
     * Real pointer events through xdotool: the mouse wheel zooms the wavelength axis about the
     * pointer (one notch up = 0.8 of the range, the wavelength under the pointer stays put), a left
     * drag pans by the distance dragged, a double click restores the full view. The sky spectrum of
     * spec-0266-51630-0168.fits (SDSS public data release, HDU 1 COADD column {@code sky}) is drawn
     * on its own axis and the Y key hides and shows it again.
     */
    @Test
    void wheelZoomDragPanAndSky() throws Exception {
        Path file = SharedData.realData().resolve("spec-0266-51630-0168.fits");
        try (Journal journal = Journal.open(Path.of("target", "ui-journal-zoom-" + System.nanoTime() + ".jsonl"))) {
            WorkbenchWindow w = open(new TestBackend(), journal, List.of(file));
            w.shell().forceActive();
            pump(100);
            ChartCanvas c = w.spectrumCanvas();
            org.jfree.chart.plot.XYPlot plot = c.chart().getXYPlot();
            assertNotNull(plot.getRangeAxis(1), "sky drawn on its own axis");
            assertEquals("Sky", plot.getRangeAxis(1).getLabel());
            w.snapshot(SHOTS.resolve("8-sky-shown.png"));
            key(0, 'y');
            assertFalse(w.skyShown());
            assertEquals(null, w.spectrumCanvas().chart().getXYPlot().getRangeAxis(1), "sky hidden");
            w.snapshot(SHOTS.resolve("9-sky-hidden.png"));
            key(0, 'y');
            assertTrue(w.skyShown());
            assertNotNull(w.spectrumCanvas().chart().getXYPlot().getRangeAxis(1), "sky back");
            pump(200);

            plot = c.chart().getXYPlot();
            org.jfree.data.Range before = plot.getDomainAxis().getRange();
            int px = c.getSize().x * 2 / 3;
            int py = c.getSize().y / 2;
            double anchor = c.xValueAt(px);
            assertTrue(Double.isFinite(anchor), "pointer inside the plot");
            Point p = c.toDisplay(px, py);
            HeadlessDisplay.xdotool("mousemove", Integer.toString(p.x), Integer.toString(p.y));
            pump(100);
            HeadlessDisplay.xdotool("click", "4");
            pump(400);
            org.jfree.data.Range zoomed = plot.getDomainAxis().getRange();
            assertEquals(0.8 * before.getLength(), zoomed.getLength(), 1e-6 * before.getLength(), "one wheel notch: 0.8 of the range");
            assertEquals(anchor, c.xValueAt(px), 1e-6 * before.getLength() + 2 * zoomed.getLength() / c.getSize().x,
                    "the wavelength under the pointer stays under it");
            w.snapshot(SHOTS.resolve("10-wheel-zoomed.png"));

            // drag 200 pixels to the right: the view moves 200 pixels' worth of wavelength to the blue
            double perPixel = zoomed.getLength() / dataWidth(c);
            HeadlessDisplay.xdotool("mousedown", "1");
            for (int k = 1; k <= 10; k++) {
                HeadlessDisplay.xdotool("mousemove", Integer.toString(p.x + 20 * k), Integer.toString(p.y));
                pump(30);
            }
            HeadlessDisplay.xdotool("mouseup", "1");
            pump(400);
            org.jfree.data.Range panned = plot.getDomainAxis().getRange();
            assertEquals(zoomed.getLength(), panned.getLength(), 1e-6 * zoomed.getLength(), "a pan keeps the zoom");
            assertEquals(200 * perPixel, zoomed.getLowerBound() - panned.getLowerBound(), 3 * perPixel,
                    "the view moved by the 200 pixels dragged");
            assertTrue(Double.isNaN(w.pickedAngstrom()), "a drag is not a click: nothing picked");
            w.snapshot(SHOTS.resolve("11-dragged.png"));

            HeadlessDisplay.xdotool("click", "--repeat", "2", "--delay", "60", "1");
            pump(400);
            assertEquals(before, plot.getDomainAxis().getRange(), "double click: the full view again");
            w.shell().close();
            pump(100);
        }
    }

    private static double dataWidth(ChartCanvas c) {
        double a = c.xValueAt(c.getSize().x / 2);
        double b = c.xValueAt(c.getSize().x / 2 + 100);
        org.jfree.data.Range r = c.chart().getXYPlot().getDomainAxis().getRange();
        return r.getLength() / ((b - a) / 100);
    }

    /** A catalogue whose spectra have moved: each row says so in the window, the rest loads. */
    @Test
    void catalogueWithMovedSpectra() throws Exception {
        Path real = SharedData.realData();
        Path cat = Path.of("target", "moved-catalogue.jsonl").toAbsolutePath();
        Files.writeString(cat, String.join("\n",
                "{\"source\":\"" + real.resolve("spec-0266-51630-0367.fits") + "\",\"index\":0,\"id\":\"a\",\"status\":\"ok\",\"z\":0.06,\"z_err\":0.0001,\"class\":\"galaxy\",\"grade\":\"B\",\"estimator\":\"comb-em\",\"alternatives\":[{\"z\":0.06},{\"z\":0.2}]}",
                "{\"source\":\"gone/elsewhere.fits\",\"index\":0,\"id\":\"b\",\"status\":\"ok\",\"z\":0.1,\"class\":\"galaxy\",\"grade\":\"C\",\"estimator\":\"comb-em\",\"alternatives\":[]}"));
        try (Journal journal = Journal.open(Path.of("target", "ui-journal-cat-" + System.nanoTime() + ".jsonl"))) {
            WorkbenchWindow w = open(new TestBackend(), journal, List.of(cat));
            assertEquals(2, w.queue().all().size());
            assertTrue(w.messages().stream().anyMatch(m -> m.contains("elsewhere.fits") && m.contains("moved")), w.messages().toString());
            w.snapshot(SHOTS.resolve("7-catalogue.png"));
            w.shell().close();
            pump(100);
        }
    }
}
