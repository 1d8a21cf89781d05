package org.redward.api.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

/**
 * Numbers as the journal and {@code --json} write them. The grammar is that of a JSON number
 * (RFC 8259, section 6); every finite double must read back as the same double
 * ({@link Double#parseDouble}), and whole numbers keep one decimal so that a reader can tell
 * them from integers (our convention).
 */
class JsonTest {

    /** RFC 8259, section 6: number = [ minus ] int [ frac ] [ exp ]. */
    private static final Pattern NUMBER = Pattern.compile("-?(0|[1-9][0-9]*)(\\.[0-9]+)?([eE][+-]?[0-9]+)?");

    private static String number(double d) {
        String s = Json.object().put("v", d).toString();
        return s.substring(s.indexOf(':') + 1, s.length() - 1);
    }

    @Test
    void wholeNumbersKeepOneDecimal() {
        assertEquals("3.0", number(3.0));
        assertEquals("-42.0", number(-42.0));
        assertEquals("0.0", number(0.0));
        assertEquals("-0.0", number(-0.0));
        assertEquals("123456789012345.0", number(123456789012345.0));
    }

    @Test
    void nonFiniteIsNull() {
        assertEquals("null", number(Double.NaN));
        assertEquals("null", number(Double.POSITIVE_INFINITY));
    }

    @Test
    void everyFiniteDoubleIsAJsonNumberThatReadsBackExactly() {
        double[] values = {0.1, -2.5e-7, 1e15, 9.99e14, 1.7976931348623157e308, Double.MIN_VALUE, 299792.458, 0.06838,
            -0.0, 4.0, 1e-300, 67.4};
        for (double d : values) {
            String s = number(d);
            // Double.toString writes "1.0E15": the JSON grammar allows the exponent letter in
            // either case, so only the grammar is checked, then the exact value
            assertTrue(NUMBER.matcher(s).matches(), s + " is not a JSON number (RFC 8259 section 6)");
            assertEquals(Double.doubleToLongBits(d), Double.doubleToLongBits(Double.parseDouble(s)), s);
        }
    }
}
