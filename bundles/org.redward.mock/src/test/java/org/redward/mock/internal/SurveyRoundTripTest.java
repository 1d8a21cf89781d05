package org.redward.mock.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.spectrum.AirVacuum;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.Header;

/**
 * Generates a small survey, reads it back with nom-tam-fits (independently of the generator's
 * own classes) and finds the spectra's lines where the truth says.
 */
class SurveyRoundTripTest {

    static final long SEED = 20261201L;
    static final int SIZE = 120;

    @TempDir
    static Path dir;
    static List<TruthRow> truth;

    @BeforeAll
    static void generate() throws IOException {
        truth = new SurveyGenerator(SEED, SIZE).write(dir, n -> { });
    }

    @Test
    void filesHoldTheInstrumentLayout() throws Exception {
        assertEquals(SIZE, truth.size());
        assertEquals(SIZE, SurveyGenerator.readTruth(dir.resolve("truth.csv")).size());
        try (Fits f = new Fits(dir.resolve(SurveyGenerator.fileName(0)).toFile())) {
            BasicHDU<?>[] hdus = f.read();
            assertEquals(2, hdus.length);
            Header p = hdus[0].getHeader();
            assertEquals("Quill", p.getStringValue("INSTRUME"));
            assertEquals("TOPOCENT", p.getStringValue("SPECSYS"));
            assertEquals(Scenario.SITE_LATITUDE_DEG, p.getDoubleValue("OBSGEO-B"), 1e-9);
            assertEquals(truth.get(0).mjdMidUtc(), p.getDoubleValue("MJD-AVG"), 1e-6);
            BinaryTableHDU t = (BinaryTableHDU) hdus[1];
            assertEquals("FIBRES", t.getHeader().getStringValue("EXTNAME"));
            assertEquals(100, t.getNRows());
            assertEquals("AWAV", t.getHeader().getStringValue("1CTYP5"));
            assertEquals(Scenario.PIXELS, ((float[]) t.getElement(0, 4)).length);
        }
    }

    @Test
    void truthRedshiftsAreConsistent() {
        int withZ = 0;
        for (TruthRow t : truth) {
            if (!t.kind().hasRedshift()) {
                assertTrue(Double.isNaN(t.zTopo()));
                continue;
            }
            withZ++;
            // 1 + z_bary = (1 + z_topo)(1 + v/c), to the 8 decimals of the table
            assertEquals(1 + t.zBary(), (1 + t.zTopo()) * (1 + t.vBaryKmPerS() / Grid.C_KM_S), 2e-8, t.objectId());
            // the correction is the Earth's orbital speed projected: |v| < 30.3 km/s + 0.5 diurnal (common practice)
            assertTrue(Math.abs(t.vBaryKmPerS()) < 31, t.objectId());
            assertEquals(t.vBaryKmPerS(), ObserverMotion.projectedVelocityKmPerS(t.mjdMidUtc(), t.raDeg(), t.decDeg(),
                    Scenario.SITE_LONGITUDE_DEG, Scenario.SITE_LATITUDE_DEG, Scenario.SITE_HEIGHT_M), 1e-3);
        }
        assertTrue(withZ > 0.9 * SIZE);
        assertTrue(truth.stream().anyMatch(t -> t.kind() == Kind.EMPTY));
        assertTrue(truth.stream().anyMatch(t -> t.kind() == Kind.BROKEN));
    }

    /**
     * For every emission-line galaxy, each of Halpha, [O III] 5008 and [O II] 3729 that is
     * detected at S/N > 8 lies within its statistical error of (1 + z_topo) times its NIST vacuum rest
     * wavelength (values listed in the team's reference table), after converting the file's air
     * axis with Morton (2000).
     */
    @Test
    void emissionLinesAreWhereTheTruthSays() throws Exception {
        double[][] lines = {{6564.614, 0}, {5008.240, 0}, {3728.48, 0}};
        List<String> checked = new ArrayList<>();
        for (TruthRow t : truth) {
            if (t.kind() != Kind.GALAXY_EMISSION) {
                continue;
            }
            float[][] spec = read(dir.resolve(t.file()), t.row());
            for (double[] l : lines) {
                double expected = l[0] * (1 + t.zTopo());
                double[] m = measureEmission(spec, expected, 4);
                if (m == null || m[1] < 8) {
                    continue;
                }
                // statistical tolerance: a centroid's error is about sigma_line / (S/N) (common practice); allow 4 times
                // that plus 0.2 A for sky-subtraction residuals; [O II] is a doublet 2.8 A apart whose centroid sits at
                // the intensity-weighted mean (ratio random), so it gets 1.5 A (rest) more
                double sigmaLine = Math.hypot(Grid.quill().lsfSigma, expected * t.parameters().get("sigma_v_km_s") / Grid.C_KM_S);
                double tol = 0.2 + 4 * sigmaLine / m[1] + (l[0] < 4000 ? 1.5 * (1 + t.zTopo()) : 0);
                assertEquals(expected, m[0], tol, String.format(Locale.ROOT, "%s line %.1f at z=%.5f (S/N %.1f)",
                        t.objectId(), l[0], t.zTopo(), m[1]));
                checked.add(t.objectId() + ":" + l[0]);
            }
        }
        assertTrue(checked.size() >= 20, "only " + checked.size() + " strong lines checked: " + checked);
    }

    @Test
    void brokenFibresCarryNoUsablePixelsAndEmptyOnesNoObject() throws Exception {
        for (TruthRow t : truth) {
            if (t.kind() == Kind.BROKEN) {
                float[][] s = read(dir.resolve(t.file()), t.row());
                int zero = 0;
                for (float v : s[1]) {
                    if (v == 0f) {
                        zero++;
                    }
                }
                assertTrue(zero >= Scenario.PIXELS / 3, t.objectId());
            }
        }
    }

    @Test
    void sameSeedSameBytesOtherSeedOtherData(@TempDir Path a, @TempDir Path b, @TempDir Path c) throws IOException {
        new SurveyGenerator(5, 12).write(a, n -> { });
        new SurveyGenerator(5, 12).write(b, n -> { });
        new SurveyGenerator(6, 12).write(c, n -> { });
        String name = SurveyGenerator.fileName(0);
        assertArrayEquals(Files.readAllBytes(a.resolve(name)), Files.readAllBytes(b.resolve(name)));
        assertArrayEquals(Files.readAllBytes(a.resolve("truth.csv")), Files.readAllBytes(b.resolve("truth.csv")));
        assertFalse(java.util.Arrays.equals(Files.readAllBytes(a.resolve(name)), Files.readAllBytes(c.resolve(name))));
    }

    /** {vacuum wavelength, flux, ivar} of one fibre, read with nom-tam-fits and the header WCS. */
    static float[][] read(Path file, int row) throws Exception {
        try (Fits f = new Fits(file.toFile())) {
            BinaryTableHDU t = (BinaryTableHDU) f.getHDU(1);
            Header h = t.getHeader();
            double crval = h.getDoubleValue("1CRVL5");
            double cdelt = h.getDoubleValue("1CDLT5");
            double crpix = h.getDoubleValue("1CRPX5");
            float[] flux = (float[]) t.getElement(row, 4);
            float[] ivar = (float[]) t.getElement(row, 5);
            float[] w = new float[flux.length];
            for (int i = 0; i < w.length; i++) {
                w[i] = (float) AirVacuum.airToVacuumAngstrom(crval + (i + 1 - crpix) * cdelt);
            }
            return new float[][] {w, flux, ivar};
        }
    }

    /**
     * Centroid and S/N of an emission line near {@code expected}: continuum = median of the
     * pixels 10-30 Angstrom either side; window +-halfWidth pixels around the highest pixel
     * within 3 Angstrom of the expected position. Null if out of range or masked.
     */
    static double[] measureEmission(float[][] s, double expected, int halfWidth) {
        float[] w = s[0];
        int n = w.length;
        if (expected < w[40] || expected > w[n - 41]) {
            return null;
        }
        int at = 0;
        while (w[at] < expected) {
            at++;
        }
        int best = -1;
        for (int i = at - 3; i <= at + 3; i++) {
            if (s[2][i] > 0 && (best < 0 || s[1][i] > s[1][best])) {
                best = i;
            }
        }
        if (best < 0) {
            return null;
        }
        List<Double> side = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double d = Math.abs(w[i] - expected);
            if (d > 10 && d < 30 && s[2][i] > 0) {
                side.add((double) s[1][i]);
            }
        }
        if (side.size() < 10) {
            return null;
        }
        side.sort(null);
        double cont = side.get(side.size() / 2);
        double sum = 0;
        double sumW = 0;
        double var = 0;
        for (int i = best - halfWidth; i <= best + halfWidth; i++) {
            if (s[2][i] <= 0) {
                return null;
            }
            double v = s[1][i] - cont;
            sum += v;
            sumW += v * w[i];
            var += 1.0 / s[2][i];
        }
        return new double[] {sumW / sum, sum / Math.sqrt(var)};
    }
}
