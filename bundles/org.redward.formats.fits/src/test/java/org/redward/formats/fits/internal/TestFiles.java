package org.redward.formats.fits.internal;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;

import nom.tam.fits.Fits;
import nom.tam.fits.Header;
import nom.tam.fits.ImageHDU;
import nom.tam.util.FitsOutputStream;

/** Small FITS files for tests, made with nom-tam-fits. */
final class TestFiles {

    private TestFiles() {
    }

    /** A 1D float image with the given header cards (key, value pairs; values String, Number or Boolean). */
    static Path image1d(Path dir, String name, float[] data, Object... cards) throws Exception {
        ImageHDU hdu = (ImageHDU) Fits.makeHDU(data);
        addCards(hdu.getHeader(), cards);
        Path p = dir.resolve(name);
        try (Fits f = new Fits(); FitsOutputStream out = new FitsOutputStream(java.nio.file.Files.newOutputStream(p))) {
            f.addHDU(hdu);
            f.write(out);
        }
        return p;
    }

    static void addCards(Header h, Object... cards) throws Exception {
        for (int i = 0; i < cards.length; i += 2) {
            String k = (String) cards[i];
            Object v = cards[i + 1];
            if (v instanceof String s) {
                h.addValue(k, s, "");
            } else if (v instanceof Boolean b) {
                h.addValue(k, b, "");
            } else {
                h.addValue(k, (Number) v, "");
            }
        }
    }

    static List<SpectrumRecord> read(Path p, Optional<InstrumentProfile> profile) throws Exception {
        List<SpectrumRecord> out = new ArrayList<>();
        try (SpectrumSource s = new FitsReader().open(p, profile)) {
            while (s.hasNext()) {
                out.add(s.next());
            }
        }
        return out;
    }

    /** The error of the first record of a file in dir, or the open error. */
    static String readQuietly(Path dir, String name) {
        try {
            List<SpectrumRecord> r = read(dir.resolve(name), Optional.empty());
            return r.isEmpty() ? "no records" : r.get(0).error();
        } catch (Exception e) {
            return e.getMessage();
        }
    }

    static float[] ramp(int n) {
        float[] f = new float[n];
        for (int i = 0; i < n; i++) {
            f[i] = 1 + i % 7;
        }
        return f;
    }
}
