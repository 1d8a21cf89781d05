package org.redward.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The optional sky spectrum of the model: copied in and out, unknown values NaN, kept by withMetadata. */
class SpectrumSkyTest {

    private static Spectrum plain() {
        SpectralAxis axis = SpectralAxis.logLinear(3.6, 1e-4, 4, Medium.VACUUM);
        return Spectrum.of(axis, new double[] {1, 2, 3, 4}, null, null, "", SpectrumMetadata.EMPTY);
    }

    @Test
    void absentByDefault() {
        Spectrum s = plain();
        assertFalse(s.hasSky());
        assertNull(s.sky());
        assertSame(s, s.withSky(null));
    }

    @Test
    void copiedAndCleaned() {
        double[] sky = {10, Double.POSITIVE_INFINITY, Double.NaN, 13};
        Spectrum s = plain().withSky(sky);
        sky[0] = -1;
        assertTrue(s.hasSky());
        assertArrayEquals(new double[] {10, Double.NaN, Double.NaN, 13}, s.sky());
        s.sky()[3] = 0;
        assertEquals(13, s.sky()[3], "accessor returns a copy");
        assertArrayEquals(s.sky(), s.withMetadata(SpectrumMetadata.builder().objectId("x").build()).sky(), "metadata change keeps the sky");
        assertNotEquals(plain(), s);
        assertEquals(plain(), s.withSky(null));
    }

    @Test
    void lengthMustMatch() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> plain().withSky(new double[3]));
        assertTrue(e.getMessage().contains("3 values") && e.getMessage().contains("4 pixels"), e.getMessage());
    }
}
