package org.redward.lines.internal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.LineIdentifier;
import org.redward.api.lines.LineKind;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineMatch;
import org.redward.api.lines.RedshiftHypothesis;
import org.redward.api.lines.SpectralLine;
import org.redward.api.registry.Provided;

/**
 * Identification by pair voting. Every detected line could be any line of the list whose kind
 * admits it (and, for a doublet narrower than the detected line, the unresolved doublet at the
 * mean of its members); each such identity implies a redshift z = observed / rest - 1. Two
 * detected lines whose identities imply the same redshift within their tolerances cast a vote for
 * it (the classic coincidence method of redshift work; common practice). Each voted redshift, and
 * each single identity, is then tested against all detected lines at once: every line is matched
 * to its nearest identity within tolerance (each list line used once), z is refined as the
 * weighted mean of the matches, and the hypothesis is scored:
 * <pre>score = P - min(M, P / 2),  P = sum over matches of weight(line) * k * ln(1 + S/N),
 * M = sum over strong lines (or doublets) missed of 0.3 * weight * ln(1 + S/N_max)</pre>
 * where k = 0.3 when a broad detected line (FWHM &gt; 2000 km/s) is matched to a line that is never
 * broad, and 1 otherwise; "strong lines missed" are lines of weight &gt;= 0.8, of a kind already
 * matched, predicted inside the observed range but not found. Hypotheses that explain two or
 * more lines with a positive score rank before single-line ones, then by score; hypotheses closer
 * than 300 km/s to a better one are merged.
 *
 * <p>Tolerance of a match: sqrt(t^2 + (3 sigma_v)^2) km/s, with t the settings' tolerance and
 * sigma_v the centre's error; broad lines (FWHM &gt; 2000 km/s) add min(FWHM / 4, 2000) km/s,
 * since broad lines sit hundreds of km/s from the systemic redshift (common practice).
 * Redshift error: the weighted-mean error, with each line's error including a systematic floor
 * (30 km/s narrow, 60 km/s unresolved doublet, 500 km/s broad), scaled up by sqrt(chi2 / (n - 1))
 * when the lines disagree more than that.
 *
 * <p>Stateless and thread-safe.
 */
@Component(property = {Provided.ID + "=" + PairVoteIdentifier.ID,
        Provided.DESCRIPTION + "=pairs of detected lines vote for z; the redshift that explains the most lines wins"})
public final class PairVoteIdentifier implements LineIdentifier {

    public static final String ID = "pair-vote";
    static final double C = DetectedLine.C_KM_PER_S;
    static final double BROAD_KMS = 2000.0;
    private static final int MAX_HYPOTHESES = 10;
    private static final double MERGE_KMS = 300.0;

    /** A possible identity of a detected line: one list line, or an unresolved group at its mean. */
    record Identity(SpectralLine line, double rest, int[] members, String note, double weight, boolean broad) {
    }

    private record Entry(double lnz, int detected, Identity id) {
    }

    @Override
    public Identification identify(List<DetectedLine> lines, LineList list, IdentifySettings settings,
            double spectrumMinAngstrom, double spectrumMaxAngstrom) {
        List<String> warnings = new ArrayList<>();
        if (lines.isEmpty()) {
            warnings.add("no lines were detected: nothing to identify");
            return new Identification(lines, List.of(), List.of(), warnings, list.id(), list.version());
        }
        List<SpectralLine> all = list.lines();
        double[] tol = new double[lines.size()];
        List<List<Identity>> ids = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            DetectedLine d = lines.get(i);
            tol[i] = tolerance(d, settings.toleranceKmPerS());
            ids.add(identities(d, all, settings, tol[i]));
        }
        Scorer scorer = new Scorer(lines, ids, tol, all, spectrumMinAngstrom, spectrumMaxAngstrom);
        List<RedshiftHypothesis> ranked;
        if (settings.hasFixedZ()) {
            RedshiftHypothesis h = scorer.evaluate(settings.fixedZ(), false);
            ranked = h.matches().isEmpty() ? List.of() : List.of(h);
            if (ranked.isEmpty()) {
                warnings.add(String.format(Locale.ROOT, "no detected line matches a line of list '%s' at the given z = %.5f", list.id(), settings.fixedZ()));
            }
            return new Identification(lines, ranked, List.of(), warnings, list.id(), list.version());
        }
        // redshifts voted for by pairs of lines, then every single identity (for the one-line case)
        List<Double> trials = votes(lines, ids, tol);
        for (int i = 0; i < lines.size(); i++) {
            for (Identity id : ids.get(i)) {
                trials.add(lines.get(i).centreAngstrom() / id.rest() - 1.0);
            }
        }
        List<RedshiftHypothesis> hs = new ArrayList<>();
        for (double z : trials) {
            RedshiftHypothesis h = scorer.evaluate(z, true);
            if (!h.matches().isEmpty() && h.z() >= settings.zMin() && h.z() <= settings.zMax()) {
                hs.add(h);
            }
        }
        // a redshift that explains two or more lines outranks any single-line one
        hs.sort(Comparator.comparing((RedshiftHypothesis h) -> h.matchedCount() >= 2 && h.score() > 0 ? 0 : 1)
                .thenComparing(Comparator.comparingDouble(RedshiftHypothesis::score).reversed())
                .thenComparing(Comparator.comparingInt(RedshiftHypothesis::matchedCount).reversed())
                .thenComparingDouble(RedshiftHypothesis::z));
        ranked = new ArrayList<>();
        for (RedshiftHypothesis h : hs) {
            boolean dup = false;
            for (RedshiftHypothesis k : ranked) {
                if (Math.abs(h.z() - k.z()) * C / (1 + k.z()) < Math.max(MERGE_KMS, 3 * C * k.zError() / (1 + k.z()))) {
                    dup = true;
                    break;
                }
            }
            if (!dup) {
                ranked.add(h);
                if (ranked.size() >= MAX_HYPOTHESES) {
                    break;
                }
            }
        }
        List<LineMatch> single = List.of();
        if (ranked.isEmpty()) {
            warnings.add(String.format(Locale.ROOT, "none of the %d detected lines matches a line of list '%s' for z in %.3f..%.3f",
                    lines.size(), list.id(), settings.zMin(), settings.zMax()));
        } else {
            RedshiftHypothesis best = ranked.get(0);
            if (best.matchedCount() == 1) {
                single = singleCandidates(lines, ids, best.matches().get(0).detectedIndex(), settings);
                warnings.add(singleWarning(lines.get(best.matches().get(0).detectedIndex()), single));
            } else {
                if (ranked.size() > 1 && ranked.get(1).score() >= 0.8 * best.score() && ranked.get(1).matchedCount() > 1) {
                    RedshiftHypothesis r2 = ranked.get(1);
                    warnings.add(String.format(Locale.ROOT, "another redshift explains the lines almost as well: z = %.5f (%d lines, score %.1f against %.1f)",
                            r2.z(), r2.matchedCount(), r2.score(), best.score()));
                }
                if (best.matchedCount() == 2) {
                    warnings.add(String.format(Locale.ROOT, "the redshift rests on two lines only (%s and %s): check it by eye",
                            best.matches().get(0).line().name(), best.matches().get(1).line().name()));
                }
                int unexplained = lines.size() - best.matchedCount();
                if (unexplained > best.matchedCount()) {
                    warnings.add(String.format(Locale.ROOT, "%d of the %d detected lines are not explained at z = %.5f", unexplained, lines.size(), best.z()));
                }
            }
        }
        return new Identification(lines, ranked, single, warnings, list.id(), list.version());
    }

    /** Velocity tolerance of a match for this detected line, km/s. */
    static double tolerance(DetectedLine d, double base) {
        double sv = d.centreErrorKmPerS();
        double t = Math.sqrt(base * base + 9 * (Double.isFinite(sv) ? sv * sv : 0));
        if (d.fwhmKmPerS() > BROAD_KMS) {
            t += Math.min(d.fwhmKmPerS() / 4, 2000.0);
        }
        return t;
    }

    private static List<Identity> identities(DetectedLine d, List<SpectralLine> all, IdentifySettings s, double tol) {
        List<Identity> out = new ArrayList<>();
        double slack = tol / C;
        Map<String, List<Integer>> groups = new LinkedHashMap<>();
        for (int j = 0; j < all.size(); j++) {
            SpectralLine l = all.get(j);
            if (!l.kind().admits(d.kind())) {
                continue;
            }
            if (l.grouped()) {
                groups.computeIfAbsent(l.group(), g -> new ArrayList<>()).add(j);
            }
            double z = d.centreAngstrom() / l.vacuumAngstrom() - 1;
            if (z >= s.zMin() - slack && z <= s.zMax() + slack) {
                out.add(new Identity(l, l.vacuumAngstrom(), new int[] {j}, "", l.weight(), l.broad()));
            }
        }
        for (Map.Entry<String, List<Integer>> g : groups.entrySet()) {
            List<Integer> m = g.getValue();
            if (m.size() < 2) {
                continue;
            }
            double lo = all.get(m.get(0)).vacuumAngstrom();
            double hi = all.get(m.get(m.size() - 1)).vacuumAngstrom();
            double mean = 0;
            double wsum = 0;
            double weight = 0;
            SpectralLine rep = all.get(m.get(0));
            for (int j : m) {
                SpectralLine l = all.get(j);
                double r = l.fixedRatio() ? l.ratioToGroupReference() : 1.0;
                mean += r * l.vacuumAngstrom();
                wsum += r;
                if (l.weight() > weight) {
                    weight = l.weight();
                    rep = l;
                }
            }
            mean /= wsum;
            if ((hi - lo) / mean * C > d.fwhmKmPerS()) {
                continue;
            }
            double z = d.centreAngstrom() / mean - 1;
            if (z >= s.zMin() - slack && z <= s.zMax() + slack) {
                int[] mem = m.stream().mapToInt(Integer::intValue).toArray();
                out.add(new Identity(rep, mean, mem, "unresolved " + g.getKey() + " group", weight, rep.broad()));
            }
        }
        return out;
    }

    /**
     * Redshifts on which two detected lines agree: all (ln(1 + z), line, identity) entries sorted
     * by ln(1 + z); two entries of different detected lines with disjoint identities vote for
     * their mean when they agree within the sum of their tolerances.
     */
    static List<Double> votes(List<DetectedLine> lines, List<List<Identity>> ids, double[] tol) {
        List<Entry> entries = new ArrayList<>();
        double maxTol = 0;
        for (int i = 0; i < ids.size(); i++) {
            maxTol = Math.max(maxTol, tol[i]);
            for (Identity id : ids.get(i)) {
                entries.add(new Entry(Math.log(lines.get(i).centreAngstrom() / id.rest()), i, id));
            }
        }
        entries.sort(Comparator.comparingDouble(Entry::lnz));
        List<Double> out = new ArrayList<>();
        double window = 2 * maxTol / C;
        for (int a = 0; a < entries.size(); a++) {
            Entry ea = entries.get(a);
            for (int b = a + 1; b < entries.size(); b++) {
                Entry eb = entries.get(b);
                double dl = eb.lnz() - ea.lnz();
                if (dl > window) {
                    break;
                }
                if (ea.detected() == eb.detected() || dl * C > tol[ea.detected()] + tol[eb.detected()]
                        || overlap(ea.id().members(), eb.id().members())) {
                    continue;
                }
                out.add(Math.exp(0.5 * (ea.lnz() + eb.lnz())) - 1.0);
            }
        }
        return out;
    }

    static boolean overlap(int[] a, int[] b) {
        for (int x : a) {
            for (int y : b) {
                if (x == y) {
                    return true;
                }
            }
        }
        return false;
    }

    private static List<LineMatch> singleCandidates(List<DetectedLine> lines, List<List<Identity>> ids, int i, IdentifySettings s) {
        DetectedLine d = lines.get(i);
        List<LineMatch> out = new ArrayList<>();
        for (Identity id : ids.get(i)) {
            double z = d.centreAngstrom() / id.rest() - 1;
            if (z < s.zMin() || z > s.zMax()) {
                continue;
            }
            out.add(new LineMatch(i, id.line(), id.rest(), z, (1 + z) * d.centreErrorAngstrom() / d.centreAngstrom(), 0.0, id.note()));
        }
        out.sort(Comparator.comparingDouble((LineMatch m) -> -m.line().weight()).thenComparingDouble(LineMatch::z));
        return out;
    }

    private static String singleWarning(DetectedLine d, List<LineMatch> cands) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "the redshift rests on a single line (%s at %.2f A): its identity is ambiguous; it could be ",
                d.kind().key(), d.centreAngstrom()));
        int k = 0;
        for (LineMatch m : cands) {
            if (k > 0) {
                sb.append(", ");
            }
            if (k == 5) {
                sb.append("and ").append(cands.size() - 5).append(" more");
                break;
            }
            sb.append(String.format(Locale.ROOT, "%s (z = %.4f)", m.note().isEmpty() ? m.line().name() : m.line().group(), m.z()));
            k++;
        }
        return sb.toString();
    }

    /** Matches detected lines to a trial redshift and scores the result. */
    static final class Scorer {
        private final List<DetectedLine> lines;
        private final List<List<Identity>> ids;
        private final double[] tol;
        private final List<SpectralLine> all;
        private final double lo;
        private final double hi;

        Scorer(List<DetectedLine> lines, List<List<Identity>> ids, double[] tol, List<SpectralLine> all, double lo, double hi) {
            this.lines = lines;
            this.ids = ids;
            this.tol = tol;
            this.all = all;
            this.lo = lo;
            this.hi = hi;
        }

        RedshiftHypothesis evaluate(double z0, boolean refine) {
            double z = z0;
            List<LineMatch> matches = match(z);
            if (refine) {
                for (int pass = 0; pass < 2 && !matches.isEmpty(); pass++) {
                    z = weightedZ(matches)[0];
                    matches = match(z);
                }
            }
            if (matches.isEmpty()) {
                return new RedshiftHypothesis(z0, Double.NaN, 0, List.of(), List.of());
            }
            double[] zw = weightedZ(matches);
            double zz = refine ? zw[0] : z0;
            List<LineMatch> fin = new ArrayList<>();
            for (LineMatch m : matches) {
                fin.add(new LineMatch(m.detectedIndex(), m.line(), m.restAngstrom(), m.z(), m.zError(),
                        C * (m.z() - zz) / (1 + zz), m.note()));
            }
            return score(zz, refine ? zw[1] : Double.NaN, fin);
        }

        private List<LineMatch> match(double z) {
            record Cand(int i, Identity id, double off) {
            }
            List<Cand> cands = new ArrayList<>();
            for (int i = 0; i < lines.size(); i++) {
                double obs = lines.get(i).centreAngstrom();
                for (Identity id : ids.get(i)) {
                    double zi = obs / id.rest() - 1;
                    double off = Math.abs(C * (zi - z) / (1 + z));
                    if (off <= tol[i]) {
                        cands.add(new Cand(i, id, off / tol[i]));
                    }
                }
            }
            cands.sort(Comparator.comparingDouble(Cand::off));
            boolean[] usedD = new boolean[lines.size()];
            boolean[] usedL = new boolean[all.size()];
            List<LineMatch> out = new ArrayList<>();
            for (Cand cd : cands) {
                if (usedD[cd.i()]) {
                    continue;
                }
                boolean taken = false;
                for (int mIdx : cd.id().members()) {
                    taken |= usedL[mIdx];
                }
                if (taken) {
                    continue;
                }
                usedD[cd.i()] = true;
                for (int mIdx : cd.id().members()) {
                    usedL[mIdx] = true;
                }
                DetectedLine d = lines.get(cd.i());
                double zi = d.centreAngstrom() / cd.id().rest() - 1;
                double sys = d.fwhmKmPerS() > BROAD_KMS ? 500.0 : cd.id().members().length > 1 ? 60.0 : 30.0;
                double sv = d.centreErrorKmPerS();
                double zErr = (1 + zi) * Math.sqrt(sv * sv + sys * sys) / C;
                out.add(new LineMatch(cd.i(), cd.id().line(), cd.id().rest(), zi, zErr, 0.0, cd.id().note()));
            }
            out.sort(Comparator.comparingInt(LineMatch::detectedIndex));
            return out;
        }

        /** {weighted mean z, its error scaled by sqrt(chi2/(n-1)) when above 1}. */
        private static double[] weightedZ(List<LineMatch> ms) {
            double sw = 0;
            double swz = 0;
            for (LineMatch m : ms) {
                double w = 1 / (m.zError() * m.zError());
                sw += w;
                swz += w * m.z();
            }
            double z = swz / sw;
            double err = Math.sqrt(1 / sw);
            if (ms.size() > 1) {
                double chi2 = 0;
                for (LineMatch m : ms) {
                    double d = (m.z() - z) / m.zError();
                    chi2 += d * d;
                }
                err *= Math.max(1.0, Math.sqrt(chi2 / (ms.size() - 1)));
            }
            return new double[] {z, err};
        }

        private RedshiftHypothesis score(double z, double zErr, List<LineMatch> ms) {
            double score = 0;
            double maxEm = 0;
            double maxAb = 0;
            boolean[] matchedLine = new boolean[all.size()];
            for (LineMatch m : ms) {
                DetectedLine d = lines.get(m.detectedIndex());
                double k = d.fwhmKmPerS() > BROAD_KMS && !m.line().broad() ? 0.3 : 1.0;
                score += m.line().weight() * k * Math.log1p(d.snr());
                if (d.kind() == LineKind.EMISSION) {
                    maxEm = Math.max(maxEm, d.snr());
                } else {
                    maxAb = Math.max(maxAb, d.snr());
                }
                for (int j = 0; j < all.size(); j++) {
                    SpectralLine l = all.get(j);
                    if (l == m.line() || (!m.note().isEmpty() && l.grouped() && l.group().equals(m.line().group()))) {
                        matchedLine[j] = true;
                    }
                }
            }
            List<SpectralLine> missing = new ArrayList<>();
            double penalty = 0;
            if (Double.isFinite(lo) && Double.isFinite(hi)) {
                java.util.Set<String> groupsCounted = new java.util.HashSet<>();
                for (int j = 0; j < all.size(); j++) {
                    SpectralLine l = all.get(j);
                    if (matchedLine[j] || l.weight() < 0.8) {
                        continue;
                    }
                    double obs = l.observedAngstrom(z);
                    if (obs < lo + 0.005 * obs || obs > hi - 0.005 * obs) {
                        continue;
                    }
                    double ref = l.kind() == LineKind.ABSORPTION ? maxAb : l.kind() == LineKind.EMISSION ? maxEm : Math.max(maxEm, maxAb);
                    // a doublet member counts as found when its partner was matched
                    if (ref <= 0 || (l.grouped() && partnerMatched(l, matchedLine))) {
                        continue;
                    }
                    missing.add(l);
                    if (!l.grouped() || groupsCounted.add(l.group())) {
                        penalty += 0.3 * l.weight() * Math.log1p(ref);
                    }
                }
            }
            // missing lines can demote a hypothesis, never outweigh what it explains
            score -= Math.min(penalty, 0.5 * score);
            return new RedshiftHypothesis(z, zErr, score, ms, missing);
        }

        private boolean partnerMatched(SpectralLine l, boolean[] matched) {
            for (int j = 0; j < all.size(); j++) {
                if (matched[j] && all.get(j).group().equals(l.group())) {
                    return true;
                }
            }
            return false;
        }
    }
}
