package org.redward.redshift.kit;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.api.redshift.ConfidenceGrade;

/**
 * Maps an estimator's quality statistic (larger = better) to a calibrated probability that the
 * redshift is right, by a step table of (threshold, fraction correct) rows measured on spectra of
 * known redshift, and from it a {@link ConfidenceGrade}. A statistic below the lowest threshold
 * gets the table's floor fraction. Immutable and thread-safe.
 *
 * <p>Table text format (one row a line, '#' comments): {@code threshold fraction [count]};
 * the header comment names the spectra and the command that produced it.
 */
public final class Calibration {

    private final String statistic;
    private final double[] thresholds;
    private final double[] fractions;
    private final double floorFraction;
    private final String origin;

    private Calibration(String statistic, double[] t, double[] f, double floorFraction, String origin) {
        this.statistic = statistic;
        this.thresholds = t;
        this.fractions = f;
        this.floorFraction = floorFraction;
        this.origin = origin;
    }

    /** Reads a table; rows in increasing threshold. {@code floor} applies below the first row. */
    public static Calibration read(String statistic, InputStream in, double floor) throws IOException {
        List<double[]> rows = new ArrayList<>();
        StringBuilder origin = new StringBuilder();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                String t = line.trim();
                if (t.startsWith("#")) {
                    if (origin.length() == 0) {
                        origin.append(t.substring(1).trim());
                    }
                    continue;
                }
                if (t.isEmpty()) {
                    continue;
                }
                String[] p = t.split("\\s+");
                rows.add(new double[] {Double.parseDouble(p[0]), Double.parseDouble(p[1])});
            }
        }
        rows.sort((a, b) -> Double.compare(a[0], b[0]));
        double[] th = new double[rows.size()];
        double[] fr = new double[rows.size()];
        for (int i = 0; i < th.length; i++) {
            th[i] = rows.get(i)[0];
            fr[i] = rows.get(i)[1];
        }
        return new Calibration(statistic, th, fr, floor, origin.toString());
    }

    /** The calibrated fraction of correct redshifts for this statistic value (NaN gives the floor). */
    public double reliability(double value) {
        double best = floorFraction;
        for (int i = 0; i < thresholds.length; i++) {
            if (value >= thresholds[i]) {
                best = fractions[i];
            }
        }
        return best;
    }

    public ConfidenceGrade grade(double value) {
        return ConfidenceGrade.forReliability(reliability(value));
    }

    public String statistic() {
        return statistic;
    }

    /** The first header comment of the table (where it comes from). */
    public String origin() {
        return origin;
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("Calibration[" + statistic);
        for (int i = 0; i < thresholds.length; i++) {
            b.append(String.format(Locale.ROOT, " >=%g:%.3f", thresholds[i], fractions[i]));
        }
        return b.append(']').toString();
    }
}
