package org.redward.redshift.chisq.internal;

import java.util.ArrayList;
import java.util.List;

import org.redward.redshift.kit.FftCorrelator;
import org.redward.redshift.kit.GriddedTemplate;
import org.redward.spectrum.ObjectClass;

/**
 * Templates fitted together as one linear basis (a class's galaxy or quasar templates; each star
 * template alone), placed on one common rest-frame grid: pixel j is at log10(lambda) =
 * (startIndex + j) * step; a template is 0 where it has no data. {@code covered[j]} is true where
 * every member has data. Immutable.
 */
final class BasisGroup {

    final ObjectClass objectClass;
    final String name;
    final List<GriddedTemplate> members;
    /** Members 0..primary-1 belong to the class; the rest (if any) are extra light such as a host. */
    final int primary;
    final long startIndex;
    final int length;
    /** [member][pixel] */
    final double[][] basis;
    final double[] covered;

    BasisGroup(ObjectClass c, String name, List<GriddedTemplate> members, int primary) {
        this.objectClass = c;
        this.name = name;
        this.members = List.copyOf(members);
        this.primary = primary;
        long lo = Long.MAX_VALUE, hi = Long.MIN_VALUE;
        for (GriddedTemplate g : members) {
            lo = Math.min(lo, g.startIndex);
            hi = Math.max(hi, g.startIndex + g.size());
        }
        this.startIndex = lo;
        this.length = (int) (hi - lo);
        this.basis = new double[members.size()][length];
        this.covered = new double[length];
        java.util.Arrays.fill(covered, 1.0);
        boolean[] any = new boolean[length];
        for (int m = 0; m < members.size(); m++) {
            GriddedTemplate g = members.get(m);
            int off = (int) (g.startIndex - lo);
            boolean[] in = new boolean[length];
            for (int j = 0; j < g.size(); j++) {
                basis[m][off + j] = g.flux[j];
                in[off + j] = g.covered[j];
            }
            for (int j = 0; j < length; j++) {
                if (!in[j] && m < primary) {
                    covered[j] = 0.0;
                }
                any[j] |= in[j];
            }
        }
    }

    int size() {
        return members.size();
    }

    /** The FFTs of the basis, of all pairwise products and of the coverage, at FFT length n. */
    Prepared prepare(int n) {
        int m = size();
        double[][] t = new double[m][];
        double[][][] tt = new double[m][m][];
        for (int a = 0; a < m; a++) {
            t[a] = FftCorrelator.forward(basis[a], n);
            for (int b = 0; b <= a; b++) {
                double[] p = new double[length];
                for (int j = 0; j < length; j++) {
                    p[j] = basis[a][j] * basis[b][j];
                }
                tt[a][b] = FftCorrelator.forward(p, n);
                tt[b][a] = tt[a][b];
            }
        }
        return new Prepared(n, t, tt, FftCorrelator.forward(covered, n));
    }

    /** Transforms of one group at one FFT length. Immutable by convention. */
    record Prepared(int n, double[][] t, double[][][] tt, double[] coverage) {
    }

    /**
     * Groups of a bank: one per class for galaxies and quasars, one per template for stars.
     */
    static List<BasisGroup> of(List<GriddedTemplate> templates) {
        List<BasisGroup> out = new ArrayList<>();
        for (ObjectClass c : ObjectClass.values()) {
            List<GriddedTemplate> members = new ArrayList<>();
            for (GriddedTemplate g : templates) {
                if (g.template.objectClass() == c) {
                    members.add(g);
                }
            }
            if (members.isEmpty()) {
                continue;
            }
            if (c == ObjectClass.STAR) {
                for (GriddedTemplate g : members) {
                    out.add(new BasisGroup(c, g.template.subclass().isEmpty() ? g.template.id() : g.template.subclass(), List.of(g), 1));
                }
            } else {
                out.add(new BasisGroup(c, c.key(), members, members.size()));
            }
        }
        return out;
    }
}
