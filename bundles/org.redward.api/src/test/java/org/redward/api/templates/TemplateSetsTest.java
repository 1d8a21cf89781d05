package org.redward.api.templates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.redward.spectrum.ObjectClass;

/** The checksum and contiguity rules of every template set. */
class TemplateSetsTest {

    @Test
    void checksumMatchesAnIndependentImplementationOfTheRule() {
        // Expected digest computed outside the project with Python's hashlib.sha256 and struct.pack('>i'/'>d')
        // over b'a\0galaxy\0sub\0', the count 3, the wavelengths 4000, 4001, 4002.5 and the fluxes 1, -0.0, 2.5.
        Template t = Template.of("a", ObjectClass.GALAXY, "sub", new double[] {4000.0, 4001.0, 4002.5}, new double[] {1.0, -0.0, 2.5});
        assertEquals("2e764962878c39e52a64b5351b6e57bc04966f496bd6f5b972f6e29fa4432ec8", TemplateSets.checksum(List.of(t)));
        // SHA-256 of no input (FIPS 180-4 test vector, also hashlib)
        assertEquals("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855", TemplateSets.checksum(List.of()));
        Template plusZero = Template.of("a", ObjectClass.GALAXY, "sub", new double[] {4000.0, 4001.0, 4002.5}, new double[] {1.0, 0.0, 2.5});
        assertNotEquals(TemplateSets.checksum(List.of(t)), TemplateSets.checksum(List.of(plusZero)), "-0.0 and 0.0 are different data");
    }

    @Test
    void setsKnowTheirChecksumAndRefuseDuplicates() {
        Template t = Template.of("a", ObjectClass.STAR, "", new double[] {4000, 4001}, new double[] {1, 2});
        TemplateSet s = TemplateSets.of("x", "1.0.0", "d", List.of(t));
        assertEquals(TemplateSets.checksum(List.of(t)), s.checksum());
        assertThrows(IllegalArgumentException.class, () -> TemplateSets.of("x", "1", "d", List.of(t, t)));
        assertThrows(IllegalArgumentException.class, () -> TemplateSets.of("x", "1", "d", List.of()));
        assertThrows(IllegalArgumentException.class, () -> TemplateSets.of(" ", "1", "d", List.of(t)));
    }

    @Test
    void gapsFollowTheContiguityRule() {
        double[] even = new double[100];
        double[] log = new double[1000];
        for (int i = 0; i < even.length; i++) {
            even[i] = 4000 + 2 * i;
        }
        for (int i = 0; i < log.length; i++) {
            log[i] = Math.pow(10, 3.0 + 1e-3 * i); // 1000 to 9977 A: the step grows tenfold, which is no gap
        }
        assertEquals(-1, TemplateSets.firstGap(even));
        assertEquals(-1, TemplateSets.firstGap(log));
        double[] gappy = even.clone();
        for (int i = 50; i < gappy.length; i++) {
            gappy[i] += 11; // one step of 13 A among steps of 2 A: more than 5 times the median
        }
        assertEquals(49, TemplateSets.firstGap(gappy));
    }
}
