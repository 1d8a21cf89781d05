package org.redward.redshift.kit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** The selection median equals the textbook definition (sort, middle value or mean of the two middle ones). */
class StatsTest {

    @Test
    void selectionMedianEqualsTheSortedDefinition() {
        Random r = new Random(11);
        for (int n = 1; n < 300; n++) {
            double[] a = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = r.nextInt(5) == 0 ? Math.rint(r.nextGaussian() * 3) : r.nextGaussian(); // ties too
            }
            double[] s = a.clone();
            Arrays.sort(s);
            double expected = (n & 1) == 1 ? s[n / 2] : 0.5 * (s[n / 2 - 1] + s[n / 2]);
            double[] before = a.clone();
            assertEquals(expected, Stats.median(a), 0.0, "n = " + n);
            assertEquals(Arrays.toString(before), Arrays.toString(a), "the input is left as it was");
        }
        assertEquals(Double.NaN, Stats.median(new double[0]));
        assertEquals(2.5, Stats.median(new double[] {Double.NaN, 1, 2, 3}), 0.0, "NaN sorts last, as Arrays.sort orders it: mean of 2 and 3");
    }
}
