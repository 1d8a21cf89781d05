package org.redward.formats.fits.internal;

import java.io.BufferedOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;

import nom.tam.fits.Header;
import nom.tam.util.FitsOutputStream;

/**
 * Streaming read of multi-object FITS files: a 2D image of N rows (one spectrum each, float)
 * with an inverse-variance HDU of the same shape, and a binary table of N rows with array
 * columns. Prints MB/s of the reader against a plain sequential read of the same file in the
 * same run (goal: at least 0.3 of it) and the peak heap while reading, for 1,000 and 10,000
 * spectra (goal: flat in the number of spectra). Asserts nothing. Run with
 * {@code mvn -B verify -Pbenchmarks} (system properties redward.bench.spectra, redward.bench.pixels).
 */
class MultiObjectReadBenchmark {

    private static final int PIXELS = Integer.getInteger("redward.bench.pixels", 3000);
    private static final int SPECTRA = Integer.getInteger("redward.bench.spectra", 10_000);
    private static final int ROUNDS = Integer.getInteger("redward.bench.rounds", 4);

    @Test
    void multiObjectFiles() throws Exception {
        Path dir = Files.createTempDirectory("redward-bench");
        try {
            for (int n : new int[] {SPECTRA / 10, SPECTRA}) {
                Path image = dir.resolve("rows-" + n + ".fits");
                writeImageRows(image, n, PIXELS);
                measure("2D image + IVAR HDU", image, n);
                Files.delete(image);
                Path table = dir.resolve("table-" + n + ".fits");
                writeTableRows(table, n, PIXELS);
                measure("table, array columns", table, n);
                Files.delete(table);
            }
        } finally {
            try (var s = Files.list(dir)) {
                s.forEach(p -> p.toFile().delete());
            }
            Files.deleteIfExists(dir);
        }
    }

    private static void measure(String what, Path file, int n) throws Exception {
        double mb = Files.size(file) / 1e6;
        plainRead(file); // warm the page cache
        double plain = Double.MAX_VALUE;
        double reader = Double.MAX_VALUE;
        long peak = 0;
        long peakLive = 0;
        // best of ROUNDS: the first rounds run before the JIT has compiled the reading loops
        for (int round = 0; round < ROUNDS; round++) {
            long t0 = System.nanoTime();
            plainRead(file);
            plain = Math.min(plain, (System.nanoTime() - t0) / 1e9);
            System.gc();
            MemoryMXBean mem = ManagementFactory.getMemoryMXBean();
            long base = mem.getHeapMemoryUsage().getUsed();
            AtomicLong max = new AtomicLong(base);
            AtomicLong maxLive = new AtomicLong(0);
            java.util.List<java.lang.management.MemoryPoolMXBean> pools = ManagementFactory.getMemoryPoolMXBeans().stream()
                    .filter(p -> p.getType() == java.lang.management.MemoryType.HEAP && p.getCollectionUsage() != null).toList();
            long liveBase = live(pools);
            Thread sampler = new Thread(() -> {
                while (!Thread.currentThread().isInterrupted()) {
                    max.accumulateAndGet(mem.getHeapMemoryUsage().getUsed(), Math::max);
                    maxLive.accumulateAndGet(live(pools) - liveBase, Math::max);
                    try {
                        Thread.sleep(2);
                    } catch (InterruptedException e) {
                        return;
                    }
                }
            });
            sampler.setDaemon(true);
            sampler.start();
            t0 = System.nanoTime();
            int ok = 0;
            double sum = 0;
            try (SpectrumSource s = new FitsReader().open(file, Optional.empty())) {
                while (s.hasNext()) {
                    SpectrumRecord r = s.next();
                    if (r.ok()) {
                        ok++;
                        sum += r.spectrum().get().flux(PIXELS / 2);
                    }
                }
            }
            reader = Math.min(reader, (System.nanoTime() - t0) / 1e9);
            sampler.interrupt();
            sampler.join();
            peak = Math.max(peak, max.get() - base);
            peakLive = Math.max(peakLive, maxLive.get());
            if (ok != n || Double.isNaN(sum)) {
                throw new AssertionError(what + ": read " + ok + " of " + n);
            }
        }
        System.out.printf(Locale.ROOT, "BENCHMARK formats  %-22s %6d spectra x %d px, %7.1f MB: reader %7.1f MB/s, plain read %7.1f MB/s,"
                + " ratio %.2f (goal >= 0.3); peak heap above baseline %.1f MB (garbage included), live after GC %.1f MB%n",
                what, n, PIXELS, mb, mb / reader, mb / plain, plain / reader, peak / 1e6, peakLive / 1e6);
    }

    /** Heap in use right after the latest collection of each pool: the live data. */
    private static long live(java.util.List<java.lang.management.MemoryPoolMXBean> pools) {
        long sum = 0;
        for (java.lang.management.MemoryPoolMXBean p : pools) {
            sum += p.getCollectionUsage().getUsed();
        }
        return sum;
    }

    private static long plainRead(Path file) throws IOException {
        long sum = 0;
        ByteBuffer buf = ByteBuffer.allocateDirect(1 << 20);
        try (FileChannel ch = FileChannel.open(file)) {
            while (ch.read(buf) > 0) {
                buf.flip();
                while (buf.remaining() >= 8) {
                    sum += buf.getLong();
                }
                buf.clear();
            }
        }
        return sum;
    }

    /** Writes the header with nom-tam-fits and streams the data rows (a file larger than the heap may be made). */
    private static void writeImageRows(Path file, int n, int pixels) throws Exception {
        Random r = new Random(1);
        try (FitsOutputStream out = new FitsOutputStream(new BufferedOutputStream(Files.newOutputStream(file), 1 << 20))) {
            Header h = new Header();
            h.addValue("SIMPLE", true, "");
            h.addValue("BITPIX", -32, "");
            h.addValue("NAXIS", 2, "");
            h.addValue("NAXIS1", pixels, "");
            h.addValue("NAXIS2", n, "");
            h.addValue("EXTEND", true, "");
            TestFiles.addCards(h, "CTYPE1", "WAVE-LOG", "CUNIT1", "Angstrom", "CRPIX1", 1.0, "CRVAL1", 3600.0, "CDELT1", 0.36);
            h.write(out);
            rows(out, n, pixels, r, 1f);
            Header iv = new Header();
            iv.addValue("XTENSION", "IMAGE", "");
            iv.addValue("BITPIX", -32, "");
            iv.addValue("NAXIS", 2, "");
            iv.addValue("NAXIS1", pixels, "");
            iv.addValue("NAXIS2", n, "");
            iv.addValue("PCOUNT", 0, "");
            iv.addValue("GCOUNT", 1, "");
            iv.addValue("EXTNAME", "IVAR", "");
            iv.write(out);
            rows(out, n, pixels, r, 0f);
        }
    }

    private static void writeTableRows(Path file, int n, int pixels) throws Exception {
        Random r = new Random(2);
        try (FitsOutputStream out = new FitsOutputStream(new BufferedOutputStream(Files.newOutputStream(file), 1 << 20))) {
            Header h = new Header();
            h.addValue("SIMPLE", true, "");
            h.addValue("BITPIX", 8, "");
            h.addValue("NAXIS", 0, "");
            h.addValue("EXTEND", true, "");
            h.write(out);
            Header t = new Header();
            t.addValue("XTENSION", "BINTABLE", "");
            t.addValue("BITPIX", 8, "");
            t.addValue("NAXIS", 2, "");
            t.addValue("NAXIS1", 8L * pixels, "");
            t.addValue("NAXIS2", n, "");
            t.addValue("PCOUNT", 0, "");
            t.addValue("GCOUNT", 1, "");
            t.addValue("TFIELDS", 2, "");
            t.addValue("TTYPE1", "FLUX", "");
            t.addValue("TFORM1", pixels + "E", "");
            t.addValue("TTYPE2", "IVAR", "");
            t.addValue("TFORM2", pixels + "E", "");
            TestFiles.addCards(t, "COEFF0", 3.55, "COEFF1", 1e-4, "VACUUM", true);
            t.write(out);
            DataOutputStream d = new DataOutputStream(out);
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < pixels; k++) {
                    d.writeFloat(1f + (float) r.nextGaussian() * 0.1f);
                }
                for (int k = 0; k < pixels; k++) {
                    d.writeFloat(100f);
                }
            }
            d.flush();
            pad(out, 8L * pixels * n);
        }
    }

    private static void rows(FitsOutputStream out, int n, int pixels, Random r, float base) throws IOException {
        DataOutputStream d = new DataOutputStream(out);
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < pixels; k++) {
                d.writeFloat(base == 0f ? 100f : 1f + (float) r.nextGaussian() * 0.1f);
            }
        }
        d.flush();
        pad(out, 4L * pixels * n);
    }

    private static void pad(FitsOutputStream out, long written) throws IOException {
        long rem = (2880 - written % 2880) % 2880;
        out.write(new byte[(int) rem]);
        out.flush();
    }
}
