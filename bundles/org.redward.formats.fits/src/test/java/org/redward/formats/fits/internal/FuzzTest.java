package org.redward.formats.fits.internal;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.zip.GZIPOutputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.formats.SpectrumWriter;
import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;

import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.ImageHDU;
import nom.tam.util.FitsOutputStream;

/**
 * 10,000 mutated FITS files (system property redward.fuzz.files for more) (bytes flipped, header values replaced by hostile ones, cut short,
 * blocks dropped or doubled, garbage appended, gzip damaged) made from six small valid files of
 * every layout the reader knows. Every file must end in a clear outcome: spectra, failed records
 * or a {@link SpectrumReadException}, all naming the file; nothing else may escape, and no file
 * may take more than 20 s (a hang; typical files take milliseconds). Seeded, so a failure can be replayed from the message.
 */
class FuzzTest {

    private static final int FILES = Integer.getInteger("redward.fuzz.files", 10_000);
    private static final String[] KEYS = {"NAXIS", "NAXIS1", "NAXIS2", "BITPIX", "TFIELDS", "TFORM1", "TFORM2", "TTYPE1",
        "TTYPE2", "PCOUNT", "GCOUNT", "CRVAL1", "CDELT1", "CD1_1", "CRPIX1", "CTYPE1", "CUNIT1", "TUNIT1", "EXTNAME",
        "XTENSION", "COEFF0", "COEFF1", "BZERO", "BSCALE", "TSCAL2", "TZERO2", "END", "SIMPLE", "DC-FLAG", "VACUUM"};
    private static final String[] VALUES = {"-1", "0", "1", "2147483647", "99999999999", "-2147483648", "'E'", "'1000000000D'",
        "'0D'", "'PD(10)'", "NaN", "'XYZ'", "'WAVE-TAB'", "'FREQ-LOG'", "1E300", "-0.0", "T", "F", "''", "'A'", "3.5",
        "'flux'", "'loglam'", "'IVAR'", "64", "-64", "7", "'furlong'"};

    @TempDir
    Path dir;

    static byte[] bytes(nom.tam.fits.BasicHDU<?>... hdus) throws Exception {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        try (Fits f = new Fits(); FitsOutputStream out = new FitsOutputStream(b)) {
            for (nom.tam.fits.BasicHDU<?> h : hdus) {
                f.addHDU(h);
            }
            f.write(out);
        }
        return b.toByteArray();
    }

    List<byte[]> seeds() throws Exception {
        List<byte[]> s = new ArrayList<>();
        float[] flux = new float[64];
        Arrays.fill(flux, 1f);
        ImageHDU one = (ImageHDU) Fits.makeHDU(flux);
        TestFiles.addCards(one.getHeader(), "CTYPE1", "WAVE-LOG", "CUNIT1", "Angstrom", "CRPIX1", 1.0, "CRVAL1", 4000.0,
                "CDELT1", 0.4);
        s.add(bytes(one));
        double[] w = new double[40];
        double[] f = new double[40];
        double[] iv = new double[40];
        for (int i = 0; i < 40; i++) {
            w[i] = 3.6 + 1e-4 * i;
            f[i] = i;
            iv[i] = 1;
        }
        BinaryTableHDU pix = BinaryTable.fromColumnMajor(new Object[] {f, w, iv}).toHDU();
        pix.setColumnName(0, "flux", null);
        pix.setColumnName(1, "loglam", null);
        pix.setColumnName(2, "ivar", null);
        s.add(bytes(new nom.tam.fits.NullDataHDU(), pix));
        double[][] rw = new double[5][30];
        float[][] rf = new float[5][30];
        for (double[] r : rw) {
            for (int i = 0; i < 30; i++) {
                r[i] = 5000 + 2 * i;
            }
        }
        BinaryTableHDU rows = BinaryTable.fromColumnMajor(new Object[] {rw, rf, new String[] {"a", "b", "c", "d", "e"}}).toHDU();
        rows.setColumnName(0, "wavelength", null);
        rows.setColumnName(1, "flux", null);
        rows.setColumnName(2, "objid", null);
        s.add(bytes(new nom.tam.fits.NullDataHDU(), rows));
        ImageHDU multi = (ImageHDU) Fits.makeHDU(new float[6][32]);
        TestFiles.addCards(multi.getHeader(), "CRPIX1", 1.0, "CRVAL1", 3.6, "CDELT1", 1e-4, "DC-FLAG", 1, "VACUUM", true);
        ImageHDU ivar = (ImageHDU) Fits.makeHDU(new float[6][32]);
        ivar.getHeader().addValue("EXTNAME", "IVAR", "");
        s.add(bytes(multi, ivar));
        Path own = dir.resolve("own.fits");
        try (SpectrumWriter.Sink sink = new FitsTableWriter().open(own)) {
            for (int k = 0; k < 2; k++) {
                sink.write(Spectrum.of(SpectralAxis.linear(4000, 1, 20, SpectralUnit.ANGSTROM, Medium.VACUUM), new double[20],
                        null, null, "x", null));
            }
        }
        s.add(Files.readAllBytes(own));
        ByteArrayOutputStream gz = new ByteArrayOutputStream();
        try (OutputStream z = new GZIPOutputStream(gz)) {
            z.write(s.get(1));
        }
        s.add(gz.toByteArray());
        return s;
    }

    static byte[] mutate(byte[] in, Random r) {
        byte[] b = in.clone();
        switch (r.nextInt(7)) {
            case 0: // flip bytes anywhere
                for (int k = 1 + r.nextInt(20); k > 0; k--) {
                    b[r.nextInt(b.length)] = (byte) r.nextInt(256);
                }
                return b;
            case 1: // a hostile value for a structural keyword
            case 2:
                return replaceValue(b, KEYS[r.nextInt(KEYS.length)], VALUES[r.nextInt(VALUES.length)]);
            case 3: // cut short
                return Arrays.copyOf(b, r.nextInt(b.length));
            case 4: { // drop or double a 2880-byte block
                if (b.length < 2 * 2880) {
                    return Arrays.copyOf(b, r.nextInt(b.length));
                }
                int blocks = b.length / 2880;
                int k = r.nextInt(Math.max(1, blocks));
                byte[] out = new byte[r.nextBoolean() ? b.length - 2880 : b.length + 2880];
                if (out.length < b.length) {
                    System.arraycopy(b, 0, out, 0, k * 2880);
                    System.arraycopy(b, Math.min(b.length, (k + 1) * 2880), out, k * 2880, Math.max(0, b.length - (k + 1) * 2880));
                } else {
                    System.arraycopy(b, 0, out, 0, Math.min(b.length, (k + 1) * 2880));
                    System.arraycopy(b, k * 2880, out, (k + 1) * 2880, Math.min(b.length - k * 2880, out.length - (k + 1) * 2880));
                }
                return out;
            }
            case 5: { // garbage appended
                byte[] out = Arrays.copyOf(b, b.length + 1 + r.nextInt(5000));
                for (int i = b.length; i < out.length; i++) {
                    out[i] = (byte) r.nextInt(256);
                }
                return out;
            }
            default: // flip bytes in the headers only (first 4 blocks)
                for (int k = 1 + r.nextInt(6); k > 0; k--) {
                    b[r.nextInt(Math.min(b.length, 4 * 2880))] = (byte) (32 + r.nextInt(95));
                }
                return b;
        }
    }

    static byte[] replaceValue(byte[] b, String key, String value) {
        String text = new String(b, StandardCharsets.ISO_8859_1);
        String k = String.format(Locale.ROOT, "%-8s", key);
        int at = -1;
        for (int p = 0; p + 80 <= Math.min(b.length, 20 * 2880); p += 80) {
            if (text.startsWith(k, p)) {
                at = p;
                break;
            }
        }
        if (at < 0) {
            return b;
        }
        String card = String.format(Locale.ROOT, "%-8s= %20s", key, value);
        card = String.format(Locale.ROOT, "%-80s", card).substring(0, 80);
        byte[] out = b.clone();
        System.arraycopy(card.getBytes(StandardCharsets.ISO_8859_1), 0, out, at, 80);
        return out;
    }

    @Test
    void mutatedFilesGiveClearOutcomesQuickly() throws Exception {
        List<byte[]> seeds = seeds();
        Random r = new Random(20261201L);
        ExecutorService ex = Executors.newSingleThreadExecutor(t -> {
            Thread th = new Thread(t, "fuzz");
            th.setDaemon(true);
            return th;
        });
        long slowest = 0;
        long[] nanosBySeed = new long[seeds.size()];
        int spectra = 0;
        int failedRecords = 0;
        int refused = 0;
        try {
            for (int n = 0; n < FILES; n++) {
                int seed = n % seeds.size();
                byte[] data = mutate(seeds.get(seed), r);
                Path p = dir.resolve("fuzz-" + (n % 4) + (seed == 5 ? ".fits.gz" : ".fits"));
                Files.write(p, data);
                long t0 = System.nanoTime();
                Future<int[]> job = ex.submit(() -> readAll(p));
                int[] outcome;
                try {
                    outcome = job.get(20, TimeUnit.SECONDS);
                } catch (TimeoutException e) {
                    job.cancel(true);
                    fail("file " + n + " (seed " + seed + ") took more than 20 s (a hang)");
                    return;
                } catch (java.util.concurrent.ExecutionException e) {
                    throw new AssertionError("file " + n + " (seed " + seed + "): " + e.getCause(), e.getCause());
                }
                slowest = Math.max(slowest, System.nanoTime() - t0);
                nanosBySeed[seed] += System.nanoTime() - t0;
                spectra += outcome[0];
                failedRecords += outcome[1];
                refused += outcome[2];
            }
        } finally {
            ex.shutdownNow();
        }
        System.out.printf(Locale.ROOT, "fuzz: %d files: %d spectra read, %d failed records, %d files refused; slowest %.1f ms%n",
                FILES, spectra, failedRecords, refused, slowest / 1e6);
        for (int k = 0; k < seeds.size(); k++) {
            System.out.printf(Locale.ROOT, "fuzz: seed %d: mean %.2f ms per file%n", k, nanosBySeed[k] / 1e6 / (FILES / seeds.size()));
        }
        assertTrue(refused > 0 && spectra > 0);
    }

    /** {spectra read, failed records, 1 if refused}; any escape other than SpectrumReadException propagates. */
    static int[] readAll(Path p) throws Exception {
        int ok = 0;
        int bad = 0;
        String name = p.getFileName().toString();
        try (SpectrumSource s = new FitsReader().open(p, Optional.empty())) {
            while (s.hasNext()) {
                SpectrumRecord rec = s.next();
                if (rec.ok()) {
                    ok++;
                } else {
                    bad++;
                    if (!rec.error().contains(name) || !rec.error().contains("HDU")) {
                        throw new AssertionError("unclear error: " + rec.error());
                    }
                }
            }
        } catch (SpectrumReadException e) {
            if (!e.getMessage().contains(name)) {
                throw new AssertionError("error without the file name: " + e.getMessage());
            }
            return new int[] {ok, bad, 1};
        }
        return new int[] {ok, bad, 0};
    }
}
