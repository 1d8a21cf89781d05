package org.redward.workbench.internal;

import java.util.List;

import org.redward.charts.RestLine;
import org.redward.charts.RestLine.Kind;

/**
 * The lines the workbench draws and offers for naming when no line list service is installed:
 * the strong optical and near-UV lines of galaxy and quasar spectra. Vacuum wavelengths in
 * Angstrom, the usual NIST Atomic Spectra Database values as tabulated in the team's reference
 * notes (from memory there, cross-checked against two third-party line lists); [O II] is the
 * mean of the doublet.
 */
final class DisplayLines {

    private DisplayLines() {
    }

    static final List<RestLine> FALLBACK = List.of(
            new RestLine("Lyα", 1215.67, Kind.EMISSION),
            new RestLine("C IV", 1549.48, Kind.EMISSION),
            new RestLine("Mg II", 2799.94, Kind.BOTH),
            new RestLine("[O II]", 3728.48, Kind.EMISSION),
            new RestLine("Ca II K", 3934.777, Kind.ABSORPTION),
            new RestLine("Ca II H", 3969.591, Kind.ABSORPTION),
            new RestLine("Hδ", 4102.892, Kind.BOTH),
            new RestLine("G band", 4305.6, Kind.ABSORPTION),
            new RestLine("Hγ", 4341.684, Kind.BOTH),
            new RestLine("Hβ", 4862.683, Kind.BOTH),
            new RestLine("[O III] 4960", 4960.295, Kind.EMISSION),
            new RestLine("[O III] 5008", 5008.240, Kind.EMISSION),
            new RestLine("Mg b", 5174.125, Kind.ABSORPTION),
            new RestLine("Na D", 5894.57, Kind.ABSORPTION),
            new RestLine("[N II] 6550", 6549.86, Kind.EMISSION),
            new RestLine("Hα", 6564.614, Kind.EMISSION),
            new RestLine("[N II] 6585", 6585.27, Kind.EMISSION),
            new RestLine("[S II] 6718", 6718.29, Kind.EMISSION),
            new RestLine("[S II] 6733", 6732.67, Kind.EMISSION));
}
