package org.redward.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Air/vacuum conversion against the test pairs of the team's reference sheet (REFERENCES.md
 * section 3): Morton (2000, ApJS 130, 403) inverted exactly; 4861.363 -> 4862.721 and
 * 6056.125 -> 6057.802 also appear as examples of the IDL astrolib airtovac routine (Ciddor
 * 1996), which agrees to 0.0006 Angstrom. Tolerance 0.01 Angstrom as the issue asks.
 */
class AirVacuumTest {

    private static final double[][] AIR_TO_VACUUM = {
        {2000.000, 2000.648},
        {3933.663, 3934.777},
        {4861.363, 4862.721},
        {5006.843, 5008.240},
        {6056.125, 6057.802},
        {6562.801, 6564.614},
        {10000.000, 10002.742},
    };

    @Test
    void publishedPairsAirToVacuum() {
        for (double[] p : AIR_TO_VACUUM) {
            assertEquals(p[1], AirVacuum.airToVacuumAngstrom(p[0]), 0.01, "air " + p[0]);
        }
    }

    @Test
    void publishedPairsVacuumToAir() {
        for (double[] p : AIR_TO_VACUUM) {
            assertEquals(p[0], AirVacuum.vacuumToAirAngstrom(p[1]), 0.01, "vacuum " + p[1]);
        }
        // vacuum 2000.000 -> air 1999.352 (Morton 2000; REFERENCES section 3)
        assertEquals(1999.352, AirVacuum.vacuumToAirAngstrom(2000.000 + 1e-9), 0.01);
    }

    @Test
    void inverseIsExact() {
        for (double w = 2000; w <= 30000; w += 37.3) {
            assertEquals(w, AirVacuum.vacuumToAirAngstrom(AirVacuum.airToVacuumAngstrom(w)), 1e-8);
        }
    }

    @Test
    void belowTheDomainAndNaNPassThrough() {
        // Lyman alpha 1215.67 is quoted in vacuum (common practice): unchanged
        assertEquals(1215.67, AirVacuum.airToVacuumAngstrom(1215.67), 0);
        assertTrue(Double.isNaN(AirVacuum.airToVacuumAngstrom(Double.NaN)));
    }
}
