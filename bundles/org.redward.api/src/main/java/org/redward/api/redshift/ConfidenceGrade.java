package org.redward.api.redshift;

import java.util.Locale;

/**
 * Redward's confidence grades ("reliability tiers"): each grade stands for a measured fraction
 * of correct redshifts. An estimator turns its own quality statistic (e.g. the cross-correlation
 * r, or the chi-square gap to the runner-up) into a calibrated probability that z is right, using
 * a calibration table measured on spectra of known redshift; the grade is the highest tier whose
 * floor that probability reaches. {@link RedshiftSolution#reliability()} carries the calibrated
 * probability itself.
 *
 * <p>Tier floors (fraction of correct redshifts): {@link #FIRM} 0.99, {@link #SOUND} 0.95,
 * {@link #FAIR} 0.80, {@link #SHAKY} 0.50, {@link #VOID} below 0.50 (or failed).
 */
public enum ConfidenceGrade {
    /** At least 99% of redshifts with this grade are right. */
    FIRM(0.99),
    /** At least 95% right. */
    SOUND(0.95),
    /** At least 80% right. */
    FAIR(0.80),
    /** At least 50% right: inspect by eye before use. */
    SHAKY(0.50),
    /** Fewer than half right, or no redshift: do not use without inspection. */
    VOID(0.0);

    private final double floor;

    ConfidenceGrade(double floor) {
        this.floor = floor;
    }

    /** The smallest fraction of correct redshifts this grade stands for (0..1). */
    public double floor() {
        return floor;
    }

    /** Lower-case key for machine-readable output: firm, sound, fair, shaky, void. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The highest grade whose floor {@code reliability} reaches; NaN gives {@link #VOID}. */
    public static ConfidenceGrade forReliability(double reliability) {
        for (ConfidenceGrade g : values()) {
            if (reliability >= g.floor) {
                return g;
            }
        }
        return VOID;
    }

    /** Parses a key (case-insensitive); unknown text gives {@link #VOID}. */
    public static ConfidenceGrade parse(String key) {
        for (ConfidenceGrade g : values()) {
            if (g.name().equalsIgnoreCase(key == null ? "" : key.trim())) {
                return g;
            }
        }
        return VOID;
    }
}
