package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.testkit.SharedData;

/**
 * Spectra in, as a user meets it: {@code redward info} on the real spectra of ../shared/realdata
 * (public survey and archive files, see its README) with the shipped instrument profiles, and
 * bad files reported one line each while the others go on.
 */
class SpectraInIT {

    @TempDir
    Path temp;

    @Test
    void infoReadsTheRealSpectraWithTheShippedProfiles() throws Exception {
        Product.Run r = Product.run("info", "--json", SharedData.realData().toString());
        assertEquals(0, r.status(), r.toString());
        List<String> lines = r.out().lines().filter(l -> l.startsWith("{")).toList();
        assertEquals(12, lines.size(), r.toString());
        String all = String.join("\n", lines);
        assertEquals(9, count(all, "\"profile\":\"sdss-coadd\""), all);
        assertEquals(2, count(all, "\"profile\":\"lamost-dr1\""), all);
        // spec-0266-51630-0168: 3808 pixels, 3824.7-9189.7 Angstrom vacuum (realdata truth.tsv)
        String one = lines.stream().filter(l -> l.contains("spec-0266-51630-0168")).findFirst().orElseThrow();
        assertTrue(one.contains("\"pixels\":3808") && one.contains("\"wavelength_min_angstrom\":3824.7")
                && one.contains("\"medium\":\"vacuum\""), one);
        assertTrue(r.err().contains("taken as AIR"), "the assumed medium of 3C433.fits is pointed out: " + r.err());
    }

    @Test
    void badFilesAreReportedAndTheOthersGoOn() throws Exception {
        Path bad = temp.resolve("broken.fits");
        Files.writeString(bad, "SIMPLE  = T but not really FITS");
        Path good = SharedData.realData().resolve("spec-55862-B6212_sp06-093.fits");
        Product.Run r = Product.run("info", "--json", bad.toString(), temp.resolve("absent.fits").toString(), good.toString());
        assertEquals(1, r.status(), r.toString());
        List<String> lines = r.out().lines().filter(l -> l.startsWith("{")).toList();
        assertEquals(3, lines.size(), r.toString());
        assertTrue(lines.get(0).contains("\"status\":\"failed\"") && lines.get(0).contains("broken.fits")
                && lines.get(0).contains("HDU 0"), lines.get(0));
        assertTrue(lines.get(1).contains("file not found"), lines.get(1));
        assertTrue(lines.get(2).contains("\"status\":\"ok\"") && lines.get(2).contains("\"profile\":\"lamost-dr1\""), lines.get(2));
        assertTrue(!r.err().contains("Exception"), "no stack trace: " + r.err());

        Product.Run p = Product.run("info", "--profile", "nope", good.toString());
        assertEquals(1, p.status(), p.toString());
        assertTrue(p.out().contains("no instrument profile 'nope' (available: ") && p.out().contains("lamost-dr1")
                && p.out().contains("sdss-coadd"), p.toString());
    }

    private static int count(String s, String what) {
        int n = 0;
        for (int i = s.indexOf(what); i >= 0; i = s.indexOf(what, i + 1)) {
            n++;
        }
        return n;
    }
}
