package org.redward.lines.internal;

import java.util.Map;

import org.redward.api.lines.LineList;
import org.redward.testkit.LineListContractTest;

/**
 * The standard list through the line-list conformance kit. Expected values: the usual NIST ASD
 * vacuum wavelengths as tabulated in REFERENCES.md section 2 (from memory there, seen in >= 2
 * third-party lists), 0.01 A for forbidden lines, 0.05 A for Balmer lines.
 */
class StandardListContractTest extends LineListContractTest {

    @Override
    protected LineList createLineList() {
        return LineListFile.standard();
    }

    @Override
    protected Map<String, double[]> expectedRestWavelengths() {
        return Map.of("H-alpha", new double[] {6564.614, 0.05}, "H-beta", new double[] {4862.683, 0.05},
                "[O III] 5008", new double[] {5008.240, 0.01}, "[O II] 3727", new double[] {3727.092, 0.01});
    }
}
