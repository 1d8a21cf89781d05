package org.redward.mock.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.redward.spectrum.ObjectClass;

class ScorecardTest {

    @Test
    void nmadConstantIsTheNormalQuartile() {
        // 1.4826 = 1 / Phi^-1(3/4) (common practice), checked with Commons Math's normal distribution
        assertEquals(1.0 / new NormalDistribution().inverseCumulativeProbability(0.75), 1.4826, 1e-4);
        // and the NMAD of a large normal sample estimates its sigma (to 2%, 100000 draws)
        SplittableRandom r = new SplittableRandom(1);
        double[] x = new double[100_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = 25.0 * r.nextGaussian() + 3;
        }
        assertEquals(25.0, Scorecard.nmad(x), 0.5);
    }

    @Test
    void thresholdsFollowTheDefinitions() {
        TruthRow t = truth(1.0);
        // |dz|/(1+z) = 0.0009 (success), 0.002 (neither), 0.02 (catastrophic), no redshift
        List<Scorecard.Outcome> o = new ArrayList<>();
        o.add(new Scorecard.Outcome(t, true, 1.0018, ObjectClass.GALAXY, "A", 0.99));
        o.add(new Scorecard.Outcome(t, true, 1.004, ObjectClass.GALAXY, "B", 0.9));
        o.add(new Scorecard.Outcome(t, true, 1.04, ObjectClass.QUASAR, "B", 0.9));
        o.add(new Scorecard.Outcome(t, false, Double.NaN, ObjectClass.UNKNOWN, "", Double.NaN));
        Scorecard.Figures f = Scorecard.of(o).figures("all", x -> true);
        assertEquals(4, f.objects());
        assertEquals(3, f.measured());
        assertEquals(1, f.successes());
        assertEquals(1, f.catastrophic());
        assertEquals(2, f.classRight());
        assertEquals(0.0009 * Grid.C_KM_S, f.dvMedian(), 1e-6);
        assertEquals("A", Scorecard.of(o).topGrade());
    }

    static TruthRow truth(double z) {
        return new TruthRow("X-1", "f.fits", 0, 1, Kind.GALAXY_EMISSION, 0, 0, 0, z, 0, z, 0, z, 10, 20, 0, 0, Map.of());
    }
}
