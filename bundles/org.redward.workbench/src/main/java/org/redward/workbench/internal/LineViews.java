package org.redward.workbench.internal;

import java.util.ArrayList;
import java.util.List;

import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.LineKind;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineSearch;
import org.redward.api.lines.SpectralLine;
import org.redward.charts.FoundLine;
import org.redward.charts.RestLine;

/** Turns the lines family's values into what the charts draw. Pure functions; thread-safe. */
final class LineViews {

    private LineViews() {
    }

    /** The list's lines as chart rest lines (same names and vacuum wavelengths). */
    static List<RestLine> restLines(LineList list) {
        List<RestLine> out = new ArrayList<>();
        for (SpectralLine l : list.lines()) {
            out.add(new RestLine(l.name(), l.vacuumAngstrom(), kind(l.kind())));
        }
        return out;
    }

    static RestLine.Kind kind(LineKind k) {
        return switch (k) {
            case EMISSION -> RestLine.Kind.EMISSION;
            case ABSORPTION -> RestLine.Kind.ABSORPTION;
            case BOTH -> RestLine.Kind.BOTH;
        };
    }

    /** Detected lines as chart marks at their fitted centres. */
    static List<FoundLine> found(LineSearch search) {
        List<FoundLine> out = new ArrayList<>();
        for (DetectedLine d : search.lines()) {
            out.add(new FoundLine(d.centreAngstrom(), "", d.snr(), d.kind() == LineKind.EMISSION));
        }
        return out;
    }
}
