package org.redward.formats.fits.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.zip.GZIPInputStream;
import java.util.zip.ZipException;

import org.redward.api.formats.SpectrumReadException;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.Header;

/**
 * An open FITS file: every HDU's header read, every data part deferred (left on disk and read
 * on demand), so that a file of many spectra is never held whole in memory. A gzip-compressed
 * file is first inflated to a temporary file (deleted on close) so that it can be read by
 * random access. The JDK's own gzip is used, not nom-tam-fits' compression providers, so no
 * thread context class loader is involved. Not thread-safe.
 */
final class FitsFileView implements AutoCloseable {

    /** Largest number of values one spectrum may have (guards against absurd headers). */
    static final long MAX_PIXELS = 50_000_000L;

    final Path file;
    private final Path temporary;
    private final Fits fits;
    final List<BasicHDU<?>> hdus;
    /** Why reading stopped before the end of the file (a damaged later HDU), or empty. */
    final String damage;

    private FitsFileView(Path file, Path temporary, Fits fits, List<BasicHDU<?>> hdus, String damage) {
        this.file = file;
        this.temporary = temporary;
        this.fits = fits;
        this.hdus = hdus;
        this.damage = damage;
    }

    static boolean isGzip(byte[] head) {
        return head.length >= 2 && (head[0] & 0xff) == 0x1f && (head[1] & 0xff) == 0x8b;
    }

    static boolean isFits(byte[] head) {
        if (head.length < 30) {
            return false;
        }
        String first = new String(head, 0, 30, java.nio.charset.StandardCharsets.US_ASCII);
        return first.startsWith("SIMPLE  =") && first.substring(9).trim().startsWith("T");
    }

    static FitsFileView open(Path file) throws SpectrumReadException {
        byte[] head = new byte[2];
        long length;
        try (InputStream in = Files.newInputStream(file)) {
            int r = in.readNBytes(head, 0, 2);
            if (r < 2) {
                throw new SpectrumReadException(file, "the file is empty");
            }
            length = Files.size(file);
        } catch (IOException e) {
            throw new SpectrumReadException(file, "cannot be read: " + e.getMessage(), e);
        }
        Path tmp = null;
        Path readFrom = file;
        if (isGzip(head)) {
            try {
                tmp = Files.createTempFile("redward-", ".fits");
                try (InputStream in = new GZIPInputStream(Files.newInputStream(file), 1 << 16);
                        OutputStream out = Files.newOutputStream(tmp)) {
                    in.transferTo(out);
                }
                length = Files.size(tmp);
                readFrom = tmp;
            } catch (ZipException | java.io.EOFException e) {
                delete(tmp);
                throw new SpectrumReadException(file, "starts like gzip but is not a valid gzip stream (" + e.getMessage() + ")", e);
            } catch (IOException e) {
                delete(tmp);
                throw new SpectrumReadException(file, "cannot be decompressed: " + e.getMessage(), e);
            }
        }
        Fits fits = null;
        try {
            byte[] six = new byte[30];
            try (InputStream in = Files.newInputStream(readFrom)) {
                in.readNBytes(six, 0, 30);
            }
            if (!isFits(six)) {
                throw new SpectrumReadException(file, file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".gz")
                        ? "named .gz but is neither gzip nor FITS" : "not a FITS file (it does not begin with SIMPLE = T)");
            }
            // nom-tam-fits finds its compression providers through the thread context class loader:
            // make it this bundle's, or a host whose class path also holds nom-tam-fits (a Spark
            // executor, a test JVM) hands it providers of another class space.
            Thread thread = Thread.currentThread();
            ClassLoader previous = thread.getContextClassLoader();
            thread.setContextClassLoader(Fits.class.getClassLoader());
            try {
                fits = new Fits(readFrom.toFile());
            } finally {
                thread.setContextClassLoader(previous);
            }
            List<BasicHDU<?>> list = new ArrayList<>();
            String damage = "";
            for (int i = 0; ; i++) {
                BasicHDU<?> h;
                try {
                    h = fits.readHDU();
                } catch (Exception | OutOfMemoryError e) {
                    // OutOfMemoryError here comes from absurd axis counts in a damaged header, not from a full heap
                    if (i == 0) {
                        throw new SpectrumReadException(file, "HDU 0: the primary header cannot be read (" + message(e) + ")", e);
                    }
                    // a damaged later HDU: keep what came before, say so if nothing usable is found
                    damage = "HDU " + i + " cannot be read (" + message(e) + ")";
                    break;
                }
                if (h == null) {
                    break;
                }
                long dataStart = h.getFileOffset() + h.getHeader().getSize();
                long dataBytes = dataBytes(h.getHeader());
                if (dataBytes < 0) {
                    throw new SpectrumReadException(file, "HDU " + i + ": the header gives an impossible data size");
                }
                if (dataStart + dataBytes > length || dataStart + dataBytes < 0) {
                    throw new SpectrumReadException(file, "HDU " + i + ": truncated (the header announces " + dataBytes
                            + " bytes of data, the file ends " + Math.max(0, length - dataStart) + " bytes after the header)");
                }
                list.add(h);
            }
            if (list.isEmpty()) {
                throw new SpectrumReadException(file, "HDU 0: the primary header is damaged or cut short (not a readable FITS file)");
            }
            return new FitsFileView(file, tmp, fits, list, damage);
        } catch (SpectrumReadException e) {
            closeQuietly(fits);
            delete(tmp);
            throw e;
        } catch (Exception | StackOverflowError | OutOfMemoryError e) {
            closeQuietly(fits);
            delete(tmp);
            throw new SpectrumReadException(file, "not a readable FITS file (" + message(e) + ")", e);
        }
    }

    /** Unpadded size of an HDU's data from its header, or -1 if the header is inconsistent. */
    static long dataBytes(Header h) {
        int naxis = h.getIntValue("NAXIS", 0);
        if (naxis < 0 || naxis > 999) {
            return -1;
        }
        if (naxis == 0) {
            return 0;
        }
        long n = 1;
        for (int i = 1; i <= naxis; i++) {
            long ni = h.getLongValue("NAXIS" + i, -1);
            if (ni < 0) {
                return -1;
            }
            n = Math.multiplyHigh(n, ni) != 0 ? -1 : n * ni;
            if (n < 0) {
                return -1;
            }
        }
        long bitpix = Math.abs(h.getLongValue("BITPIX", 0));
        if (bitpix != 8 && bitpix != 16 && bitpix != 32 && bitpix != 64) {
            return -1;
        }
        long bytes = n * (bitpix / 8);
        long pcount = h.getLongValue("PCOUNT", 0);
        long gcount = h.getLongValue("GCOUNT", 1);
        if (pcount < 0 || gcount < 0) {
            return -1;
        }
        return bytes < 0 ? -1 : gcount * (pcount + bytes);
    }

    /** A short description: {@code HDU 1 (COADD)}. */
    String name(int index) {
        String ext = hdus.get(index).getHeader().getStringValue("EXTNAME");
        return "HDU " + index + (ext == null || ext.isBlank() ? "" : " (" + ext.trim() + ")");
    }

    /** Index of the HDU named by EXTNAME (case-insensitive) or by number; -1 if absent. */
    int find(String ref) {
        String r = ref.trim();
        if (r.matches("\\d+")) {
            int i = Integer.parseInt(r);
            return i < hdus.size() ? i : -1;
        }
        for (int i = 0; i < hdus.size(); i++) {
            String ext = hdus.get(i).getHeader().getStringValue("EXTNAME");
            if (ext != null && ext.trim().equalsIgnoreCase(r)) {
                return i;
            }
        }
        return -1;
    }

    Header primary() {
        return hdus.get(0).getHeader();
    }

    Keys keys(int index) {
        return new Keys(hdus.get(index).getHeader(), primary());
    }

    static String message(Throwable e) {
        String m = e.getMessage();
        return m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
    }

    private static void closeQuietly(Fits f) {
        if (f != null) {
            try {
                f.close();
            } catch (Exception ignored) {
                // nothing more to do
            }
        }
    }

    private static void delete(Path p) {
        if (p != null) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException ignored) {
                // temporary file; the OS cleans up
            }
        }
    }

    @Override
    public void close() {
        closeQuietly(fits);
        delete(temporary);
    }
}
