package org.redward.api.redshift;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

import org.redward.spectrum.ObjectClass;

/**
 * An estimator's answer for one spectrum: z with its 1-sigma error, a confidence grade, the
 * class, ranked alternatives (the first is the adopted solution), the score-versus-z curve,
 * warnings a user must see (e.g. a redshift from a single line) and the provenance (estimator
 * bundle and version, template set id, version and checksum, parameters).
 *
 * <p>Immutable and thread-safe. Build with {@link #builder()} or {@link #failed(String)}.
 */
public final class RedshiftSolution {

    /** Whether a redshift was measured. */
    public enum Status {
        OK, FAILED;

        public String key() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    private final Status status;
    private final String error;
    private final double z;
    private final double zError;
    private final ObjectClass objectClass;
    private final String subclass;
    private final String grade;
    private final double reliability;
    private final List<Alternative> alternatives;
    private final ScoreCurve scoreCurve;
    private final List<String> warnings;
    private final Map<String, Double> diagnostics;
    private final Map<String, String> provenance;

    private RedshiftSolution(Builder b) {
        this.status = b.status;
        this.error = b.error;
        this.z = b.z;
        this.zError = b.zError;
        this.objectClass = b.objectClass;
        this.subclass = b.subclass;
        this.grade = b.grade;
        this.reliability = b.reliability;
        this.alternatives = List.copyOf(b.alternatives);
        this.scoreCurve = b.scoreCurve;
        this.warnings = List.copyOf(b.warnings);
        this.diagnostics = Collections.unmodifiableMap(new LinkedHashMap<>(b.diagnostics));
        this.provenance = Collections.unmodifiableMap(new LinkedHashMap<>(b.provenance));
    }

    public static Builder builder() {
        return new Builder();
    }

    /** A failed solution with a reason the user can act on. */
    public static RedshiftSolution failed(String reason) {
        Builder b = new Builder();
        b.status = Status.FAILED;
        b.error = Objects.requireNonNull(reason, "reason");
        return b.build();
    }

    /** A builder pre-filled with this solution (e.g. to add provenance). */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.status = status;
        b.error = error;
        b.z = z;
        b.zError = zError;
        b.objectClass = objectClass;
        b.subclass = subclass;
        b.grade = grade;
        b.reliability = reliability;
        b.alternatives.addAll(alternatives);
        b.scoreCurve = scoreCurve;
        b.warnings.addAll(warnings);
        b.diagnostics.putAll(diagnostics);
        b.provenance.putAll(provenance);
        return b;
    }

    public Status status() { return status; }
    public boolean ok() { return status == Status.OK; }
    /** The reason for failure; empty when OK. */
    public String error() { return error; }
    /** Redshift (NaN when failed). */
    public double z() { return z; }
    /** 1-sigma error of z (NaN when unknown). */
    public double zError() { return zError; }
    public ObjectClass objectClass() { return objectClass; }
    public String subclass() { return subclass; }
    /** Confidence grade (the estimator's or the platform's grading scheme; empty if ungraded). */
    public String grade() { return grade; }
    /** Estimated probability (0..1) that z is right, as calibrated for the grade; NaN if unknown. */
    public double reliability() { return reliability; }
    /** Ranked solutions; the first equals the adopted one. */
    public List<Alternative> alternatives() { return alternatives; }
    public Optional<ScoreCurve> scoreCurve() { return Optional.ofNullable(scoreCurve); }
    /** Things a user must be told (e.g. "redshift from a single line: identity ambiguous"). */
    public List<String> warnings() { return warnings; }
    /** Named numbers describing the fit (e.g. {@code r}, {@code delta_chi2}, {@code snr_median}). */
    public Map<String, Double> diagnostics() { return diagnostics; }
    /** How this solution was made: estimator bundle and version, template set, parameters. */
    public Map<String, String> provenance() { return provenance; }

    @Override
    public String toString() {
        return ok() ? String.format(java.util.Locale.ROOT, "RedshiftSolution[z=%.6f+-%.6f %s %s grade=%s]", z, zError,
                objectClass.key(), subclass, grade) : "RedshiftSolution[failed: " + error + "]";
    }

    /** Builder; not thread-safe. */
    public static final class Builder {
        private Status status = Status.OK;
        private String error = "";
        private double z = Double.NaN;
        private double zError = Double.NaN;
        private ObjectClass objectClass = ObjectClass.UNKNOWN;
        private String subclass = "";
        private String grade = "";
        private double reliability = Double.NaN;
        private final List<Alternative> alternatives = new ArrayList<>();
        private ScoreCurve scoreCurve;
        private final List<String> warnings = new ArrayList<>();
        private final Map<String, Double> diagnostics = new LinkedHashMap<>();
        private final Map<String, String> provenance = new LinkedHashMap<>();

        private Builder() {
        }

        public Builder z(double v, double err) { z = v; zError = err; return this; }
        public Builder objectClass(ObjectClass c, String sub) { objectClass = Objects.requireNonNull(c); subclass = sub == null ? "" : sub; return this; }
        public Builder grade(String g, double reliabilityFraction) { grade = g == null ? "" : g; reliability = reliabilityFraction; return this; }
        public Builder alternatives(List<Alternative> a) { alternatives.clear(); alternatives.addAll(a); return this; }
        public Builder scoreCurve(ScoreCurve c) { scoreCurve = c; return this; }
        public Builder warning(String w) { warnings.add(w); return this; }
        public Builder diagnostic(String name, double value) { diagnostics.put(name, value); return this; }
        public Builder provenance(String key, String value) { provenance.put(key, value); return this; }
        public Builder provenance(Map<String, String> p) { provenance.putAll(p); return this; }
        public Builder failed(String reason) { status = Status.FAILED; error = reason; return this; }

        public RedshiftSolution build() {
            if (status == Status.OK && !Double.isFinite(z)) {
                throw new IllegalStateException("an OK solution needs a finite z");
            }
            return new RedshiftSolution(this);
        }
    }
}
