package org.redward.lines.internal;

import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineMatch;
import org.redward.api.lines.LineSearch;
import org.redward.api.lines.RedshiftHypothesis;

/** Scratch: prints the lines found and identified in each real spectrum. */
public final class Explore {
    public static void main(String[] args) throws Exception {
        System.setProperty("redward.shared", "/work/shared");
        MatchedFilterFinder finder = new MatchedFilterFinder();
        PairVoteIdentifier idf = new PairVoteIdentifier();
        LineList list = LineListFile.standard();
        boolean verbose = args.length > 1;
        for (String name : RealSpectra.publishedZ().keySet()) {
            if (args.length > 0 && !name.contains(args[0])) continue;
            var s = RealSpectra.read(name);
            LineSearch ls = finder.find(s, FinderSettings.defaults());
            Identification id = idf.identify(ls.lines(), list, IdentifySettings.defaults(), s.axis().minVacuumAngstrom(), s.axis().maxVacuumAngstrom());
            double zp = RealSpectra.publishedZ().get(name);
            System.out.printf("== %s zpub=%.5f lines=%d %s%n", name, zp, ls.lines().size(), ls.statements());
            int k = 0;
            for (RedshiftHypothesis h : id.hypotheses()) {
                System.out.printf("  H%d z=%.5f +- %.5f (dv=%.0f km/s) score %.2f n=%d missing=%s%n", k++, h.z(), h.zError(), 299792.458*(h.z()-zp)/(1+zp), h.score(), h.matchedCount(), h.missing().stream().map(l->l.name()).toList());
                if (k > 3) break;
            }
            System.out.println("  warnings: " + id.warnings());
            if (verbose && id.best().isPresent()) {
                RedshiftHypothesis b = id.best().get();
                for (int i = 0; i < ls.lines().size(); i++) {
                    DetectedLine d = ls.lines().get(i);
                    LineMatch m = b.matchOf(i);
                    System.out.printf("   %-10s %9.2f snr %6.1f fwhm %6.0f  %s%n", d.kind(), d.centreAngstrom(), d.snr(), d.fwhmKmPerS(), m == null ? "" : m.line().name() + " " + m.note() + String.format(" off %.0f", m.offsetKmPerS()));
                }
            }
        }
    }
}
