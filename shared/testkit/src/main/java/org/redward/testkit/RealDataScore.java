package org.redward.testkit;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;

/**
 * Runs an estimator over the real spectra of {@link RealData} and scores it against the
 * published redshifts and classes (a redshift is right within the entry's tolerance; a class is
 * right when it equals the published one). Prints one line per spectrum and a total.
 */
public final class RealDataScore {

    /** One spectrum's outcome. */
    public record Row(RealData.Entry entry, RedshiftSolution solution, boolean zRight, boolean classRight) {
    }

    private final List<Row> rows;

    private RealDataScore(List<Row> rows) {
        this.rows = List.copyOf(rows);
    }

    public static RealDataScore run(String label, RedshiftEstimator estimator, EstimationContext context, PrintStream out) {
        List<Row> rows = new ArrayList<>();
        for (RealData.Entry e : RealData.load()) {
            RedshiftSolution s = estimator.estimate(e.spectrum(), context);
            boolean zr = s.ok() && e.redshiftRight(s.z());
            boolean cr = s.ok() && s.objectClass() == e.objectClass();
            rows.add(new Row(e, s, zr, cr));
        }
        RealDataScore score = new RealDataScore(rows);
        score.print(label, out);
        return score;
    }

    public void print(String label, PrintStream out) {
        out.println("== real spectra (SDSS and LAMOST DR1 public releases, ../shared/realdata): " + label);
        for (Row r : rows) {
            RedshiftSolution s = r.solution();
            out.println(String.format(Locale.ROOT, "%-32s published z=%.5f %-7s | %s | dv=%7.0f km/s %s %s | %s",
                    r.entry().file(), r.entry().z(), r.entry().objectClass().key(),
                    s.ok() ? String.format(Locale.ROOT, "z=%.5f+-%.5f %-7s %-14s grade=%-6s", s.z(), s.zError(),
                            s.objectClass().key(), s.subclass(), s.grade()) : "FAILED " + s.error(),
                    s.ok() ? r.entry().offsetKmPerS(s.z()) : Double.NaN, r.zRight() ? "z-ok" : "z-WRONG",
                    r.classRight() ? "class-ok" : "class-WRONG", String.join(" / ", s.warnings())));
        }
        out.println(String.format(Locale.ROOT, "== %s: %d of %d redshifts right, %d of %d redshifts and classes right",
                label, redshiftsRight(), rows.size(), bothRight(), rows.size()));
    }

    public List<Row> rows() {
        return rows;
    }

    public int redshiftsRight() {
        return (int) rows.stream().filter(Row::zRight).count();
    }

    public int bothRight() {
        return (int) rows.stream().filter(r -> r.zRight() && r.classRight()).count();
    }
}
