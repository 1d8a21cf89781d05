package org.redward.lines.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.LineKind;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineMatch;
import org.redward.api.lines.LineSearch;
import org.redward.api.lines.RedshiftHypothesis;
import org.redward.api.redshift.Alternative;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.redshift.ScoreCurve;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.Spectrum;

/**
 * The line-based redshift: find the lines ({@link MatchedFilterFinder}), identify them
 * ({@link PairVoteIdentifier}) and turn the best hypothesis into a {@link RedshiftSolution}.
 * A redshift that rests on one line carries a warning and every candidate identity as an
 * alternative; it is never given as if certain. Stateless; thread-safe.
 *
 * <p>Parameters read from the context: {@code snr_threshold} (default 5) and {@code linelist}
 * (the list id; chosen by the caller).
 */
final class LineRedshift {

    static final String SNR_PARAMETER = "snr_threshold";

    private final MatchedFilterFinder finder = new MatchedFilterFinder();
    private final PairVoteIdentifier identifier = new PairVoteIdentifier();

    /** The finder settings the context asks for (threshold, masked regions). */
    static FinderSettings finderSettings(EstimationContext context) {
        FinderSettings fs = FinderSettings.defaults();
        String t = context.parameters().get(SNR_PARAMETER);
        if (t != null) {
            fs = fs.withSnrThreshold(Double.parseDouble(t));
        }
        double[][] masked = context.maskedRegionsVacuumAngstrom();
        if (masked.length > 0) {
            fs = fs.withMaskedRegions(List.of(masked));
        }
        return fs;
    }

    RedshiftSolution estimate(Spectrum spectrum, EstimationContext context, LineList list) {
        FinderSettings fs;
        try {
            fs = finderSettings(context);
        } catch (IllegalArgumentException e) {
            return RedshiftSolution.failed("parameter " + SNR_PARAMETER + ": " + e.getMessage());
        }
        LineSearch search = finder.find(spectrum, fs);
        Map<String, String> prov = new TreeMap<>();
        prov.put("line_list", list.id());
        prov.put("line_list_version", list.version());
        prov.put("line_list_sha256", list.checksum());
        prov.put("line_finder", MatchedFilterFinder.ID);
        prov.put("line_identifier", PairVoteIdentifier.ID);
        prov.put(SNR_PARAMETER, String.format(Locale.ROOT, "%g", fs.snrThreshold()));
        if (search.empty()) {
            String why = search.statements().isEmpty() ? "no lines found" : search.statements().get(0);
            return RedshiftSolution.builder().failed(why).provenance(prov).build();
        }
        IdentifySettings is = IdentifySettings.defaults().withRedshiftRange(context.zMin(), context.zMax());
        Identification id = identifier.identify(search.lines(), list, is, spectrum.axis().minVacuumAngstrom(),
                spectrum.axis().maxVacuumAngstrom());
        if (id.best().isEmpty()) {
            String why = id.warnings().isEmpty() ? "the detected lines match no line of the list" : id.warnings().get(0);
            return RedshiftSolution.builder().failed(why).provenance(prov)
                    .diagnostic("lines_detected", search.lines().size()).build();
        }
        RedshiftHypothesis best = id.best().get();
        ObjectClass cls = classify(best, search.lines());
        RedshiftSolution.Builder b = RedshiftSolution.builder()
                .z(best.z(), best.zError())
                .objectClass(cls, subclass(best, search.lines()))
                .provenance(prov)
                .diagnostic("lines_detected", search.lines().size())
                .diagnostic("lines_matched", best.matchedCount())
                .diagnostic("line_score", best.score())
                .diagnostic("rms_offset_km_s", rmsOffset(best))
                .diagnostic("noise_scale", search.noiseScale());
        List<Alternative> alts = new ArrayList<>();
        if (id.singleLine()) {
            List<LineMatch> cands = id.singleLineCandidates();
            double top = cands.isEmpty() ? 0 : cands.get(0).line().weight();
            for (LineMatch m : cands) {
                alts.add(new Alternative(m.z(), m.zError(), m.line().weight(), top - m.line().weight(), cls,
                        "single line as " + label(m)));
            }
            if (!cands.isEmpty()) {
                LineMatch first = cands.get(0);
                b.z(first.z(), first.zError()).objectClass(cls, "single line as " + label(first));
            }
            b.warning("a redshift from a single line is a guess among candidate identities: confirm it by eye or with a template fit");
        } else {
            for (RedshiftHypothesis h : id.hypotheses()) {
                alts.add(new Alternative(h.z(), h.zError(), h.score(), best.score() - h.score(), cls, names(h)));
            }
        }
        b.alternatives(alts);
        for (String w : id.warnings()) {
            b.warning(w);
        }
        if (cls == ObjectClass.STAR || cls == ObjectClass.QUASAR) {
            b.warning("the class comes from the lines alone (" + (cls == ObjectClass.QUASAR ? "broad emission" : "absorption at z near 0")
                    + "): a rough guess");
        }
        b.scoreCurve(curve(id.hypotheses()));
        return b.build();
    }

    /** The name of a match: the line, or its group for an unresolved doublet. */
    static String label(LineMatch m) {
        return m.label();
    }

    private static String names(RedshiftHypothesis h) {
        StringBuilder sb = new StringBuilder();
        for (LineMatch m : h.matches()) {
            if (sb.length() > 0) {
                sb.append(", ");
            }
            sb.append(label(m));
        }
        return sb.toString();
    }

    /** Quasar if a matched emission line is broad; star if only absorption at |cz| &lt; 600 km/s; else galaxy. */
    static ObjectClass classify(RedshiftHypothesis h, List<DetectedLine> lines) {
        boolean emission = false;
        for (LineMatch m : h.matches()) {
            DetectedLine d = lines.get(m.detectedIndex());
            if (d.kind() == LineKind.EMISSION) {
                emission = true;
                if (d.fwhmKmPerS() > PairVoteIdentifier.BROAD_KMS && d.snr() >= 5) {
                    return ObjectClass.QUASAR;
                }
            }
        }
        if (!emission && Math.abs(h.z()) * DetectedLine.C_KM_PER_S < 600) {
            return ObjectClass.STAR;
        }
        return ObjectClass.GALAXY;
    }

    private static String subclass(RedshiftHypothesis h, List<DetectedLine> lines) {
        int em = 0;
        int ab = 0;
        for (LineMatch m : h.matches()) {
            if (lines.get(m.detectedIndex()).kind() == LineKind.EMISSION) {
                em++;
            } else {
                ab++;
            }
        }
        return em > 0 && ab > 0 ? "emission and absorption lines" : em > 0 ? "emission lines" : "absorption lines";
    }

    private static double rmsOffset(RedshiftHypothesis h) {
        double s = 0;
        for (LineMatch m : h.matches()) {
            s += m.offsetKmPerS() * m.offsetKmPerS();
        }
        return Math.sqrt(s / h.matchedCount());
    }

    private static ScoreCurve curve(List<RedshiftHypothesis> hs) {
        TreeMap<Double, Double> byZ = new TreeMap<>();
        for (RedshiftHypothesis h : hs) {
            byZ.merge(h.z(), h.score(), Math::max);
        }
        double[] z = new double[byZ.size()];
        double[] s = new double[byZ.size()];
        int i = 0;
        for (Map.Entry<Double, Double> e : byZ.entrySet()) {
            z[i] = e.getKey();
            s[i] = e.getValue();
            i++;
        }
        return new ScoreCurve(z, s, "line_score", false);
    }
}
