package org.redward.api.survey;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.redward.api.redshift.Alternative;

/**
 * One catalogue row: one spectrum of a run, measured or failed. Carries the keys every
 * catalogue begins with ({@code source, index, id, status, error, z, z_err, class, grade,
 * estimator, alternatives}), the sky position, warnings a user must see, the time taken, the
 * plug-in at fault when one misbehaved, and the derived quantities (frame velocities, distances
 * and their uncertainties) by column name with the unit in the name, and the measured lines when
 * the run measured them.
 *
 * <p>Immutable and thread-safe. Build with {@link #builder()}.
 */
public final class MeasuredRow {

    /** Status words. */
    public static final String OK = "ok";
    public static final String FAILED = "failed";

    /** Fault words: what misbehaved (empty when nothing did). */
    public static final String FAULT_THREW = "threw";
    public static final String FAULT_TIMED_OUT = "timed_out";
    public static final String FAULT_NONSENSE = "nonsense";
    public static final String FAULT_READER = "reader";

    private final long sequence;
    private final String source;
    private final int index;
    private final String location;
    private final String id;
    private final String status;
    private final String error;
    private final double z;
    private final double zErr;
    private final String objectClass;
    private final String subclass;
    private final String grade;
    private final double reliability;
    private final String estimator;
    private final List<Alternative> alternatives;
    private final double raDeg;
    private final double decDeg;
    private final List<String> warnings;
    private final double seconds;
    private final String fault;
    private final String faultBundle;
    private final Map<String, Double> derived;
    private final List<MeasuredLine> lines;

    private MeasuredRow(Builder b) {
        sequence = b.sequence;
        source = b.source;
        index = b.index;
        location = b.location;
        id = b.id;
        status = b.status;
        error = b.error;
        z = b.z;
        zErr = b.zErr;
        objectClass = b.objectClass;
        subclass = b.subclass;
        grade = b.grade;
        reliability = b.reliability;
        estimator = b.estimator;
        alternatives = List.copyOf(b.alternatives);
        raDeg = b.raDeg;
        decDeg = b.decDeg;
        warnings = List.copyOf(b.warnings);
        seconds = b.seconds;
        fault = b.fault;
        faultBundle = b.faultBundle;
        derived = Collections.unmodifiableMap(new LinkedHashMap<>(b.derived));
        lines = List.copyOf(b.lines);
    }

    public static Builder builder() {
        return new Builder();
    }

    public Builder toBuilder() {
        Builder b = new Builder();
        b.sequence = sequence;
        b.source = source;
        b.index = index;
        b.location = location;
        b.id = id;
        b.status = status;
        b.error = error;
        b.z = z;
        b.zErr = zErr;
        b.objectClass = objectClass;
        b.subclass = subclass;
        b.grade = grade;
        b.reliability = reliability;
        b.estimator = estimator;
        b.alternatives.addAll(alternatives);
        b.raDeg = raDeg;
        b.decDeg = decDeg;
        b.warnings.addAll(warnings);
        b.seconds = seconds;
        b.fault = fault;
        b.faultBundle = faultBundle;
        b.derived.putAll(derived);
        b.lines.addAll(lines);
        return b;
    }

    /** 0-based position of the spectrum in the run (input order). */
    public long sequence() { return sequence; }
    /** The file the spectrum came from. */
    public String source() { return source; }
    /** 0-based index of the spectrum in its file; -1 when the whole file failed. */
    public int index() { return index; }
    /** Where in the file (e.g. {@code HDU 1 row 17}); may be empty. */
    public String location() { return location; }
    /** The object id (from the file, or file name and index). */
    public String id() { return id; }
    /** {@value #OK} or {@value #FAILED}. */
    public String status() { return status; }
    public boolean ok() { return OK.equals(status); }
    /** The reason for failure, naming the file, HDU, column or plug-in at fault; empty when OK. */
    public String error() { return error; }
    public double z() { return z; }
    public double zErr() { return zErr; }
    /** {@code galaxy}, {@code quasar}, {@code star} or {@code unknown}. */
    public String objectClass() { return objectClass; }
    public String subclass() { return subclass; }
    public String grade() { return grade; }
    public double reliability() { return reliability; }
    /** The id of the estimator used. */
    public String estimator() { return estimator; }
    /** Ranked solutions, the first being the adopted one (at most a few). */
    public List<Alternative> alternatives() { return alternatives; }
    public double raDeg() { return raDeg; }
    public double decDeg() { return decDeg; }
    /** Things a user must be told (a redshift from a single line, a Hubble-law distance at high z...). */
    public List<String> warnings() { return warnings; }
    /** Wall-clock seconds the estimate took (NaN when not measured). */
    public double seconds() { return seconds; }
    /** What misbehaved ({@value #FAULT_THREW}, {@value #FAULT_TIMED_OUT}, {@value #FAULT_NONSENSE}, {@value #FAULT_READER}); empty when nothing did. */
    public String fault() { return fault; }
    /** The bundle (symbolic name and version) that misbehaved; empty when nothing did. */
    public String faultBundle() { return faultBundle; }
    /** Derived quantities by column name (unit in the name): frame velocities, distances, their errors. */
    public Map<String, Double> derived() { return derived; }
    /** One derived quantity, NaN if absent. */
    public double derived(String column) { return derived.getOrDefault(column, Double.NaN); }
    /**
     * The lines measured in the spectrum, by increasing observed wavelength (only when the run was
     * asked for them with {@link MeasureRequest#withLines}; empty otherwise, or when none was found).
     */
    public List<MeasuredLine> lines() { return lines; }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof MeasuredRow r)) {
            return false;
        }
        return sequence == r.sequence && index == r.index && source.equals(r.source) && location.equals(r.location)
                && id.equals(r.id) && status.equals(r.status) && error.equals(r.error)
                && Double.compare(z, r.z) == 0 && Double.compare(zErr, r.zErr) == 0 && objectClass.equals(r.objectClass)
                && subclass.equals(r.subclass) && grade.equals(r.grade) && Double.compare(reliability, r.reliability) == 0
                && estimator.equals(r.estimator) && alternatives.equals(r.alternatives)
                && Double.compare(raDeg, r.raDeg) == 0 && Double.compare(decDeg, r.decDeg) == 0
                && warnings.equals(r.warnings) && fault.equals(r.fault) && faultBundle.equals(r.faultBundle)
                && derived.equals(r.derived) && lines.equals(r.lines);
    }

    /** Equality ignores {@link #seconds()} (timing differs between runs); see {@link #equals}. */
    @Override
    public int hashCode() {
        return Objects.hash(sequence, source, index, id, status, z);
    }

    @Override
    public String toString() {
        return "MeasuredRow[" + sequence + " " + source + "[" + index + "] " + status
                + (ok() ? " z=" + z : " " + error) + "]";
    }

    /** Builder; not thread-safe. */
    public static final class Builder {
        private long sequence;
        private String source = "";
        private int index;
        private String location = "";
        private String id = "";
        private String status = OK;
        private String error = "";
        private double z = Double.NaN;
        private double zErr = Double.NaN;
        private String objectClass = "unknown";
        private String subclass = "";
        private String grade = "";
        private double reliability = Double.NaN;
        private String estimator = "";
        private final List<Alternative> alternatives = new ArrayList<>();
        private double raDeg = Double.NaN;
        private double decDeg = Double.NaN;
        private final List<String> warnings = new ArrayList<>();
        private double seconds = Double.NaN;
        private String fault = "";
        private String faultBundle = "";
        private final Map<String, Double> derived = new LinkedHashMap<>();
        private final List<MeasuredLine> lines = new ArrayList<>();

        private Builder() {
        }

        public Builder sequence(long v) { sequence = v; return this; }
        public Builder source(String v, int i, String loc) { source = nn(v); index = i; location = nn(loc); return this; }
        public Builder id(String v) { id = nn(v); return this; }
        public Builder ok() { status = OK; error = ""; return this; }
        public Builder failed(String reason) { status = FAILED; error = nn(reason); return this; }
        public Builder z(double v, double err) { z = v; zErr = err; return this; }
        public Builder objectClass(String c, String sub) { objectClass = c == null || c.isEmpty() ? "unknown" : c; subclass = nn(sub); return this; }
        public Builder grade(String g, double rel) { grade = nn(g); reliability = rel; return this; }
        public Builder estimator(String v) { estimator = nn(v); return this; }
        public Builder alternatives(List<Alternative> a) { alternatives.clear(); alternatives.addAll(a); return this; }
        public Builder sky(double ra, double dec) { raDeg = ra; decDeg = dec; return this; }
        public Builder warning(String w) { warnings.add(w); return this; }
        public Builder warnings(List<String> w) { warnings.clear(); warnings.addAll(w); return this; }
        public Builder seconds(double v) { seconds = v; return this; }
        public Builder fault(String what, String bundle) { fault = nn(what); faultBundle = nn(bundle); return this; }
        public Builder derived(String column, double value) { derived.put(column, value); return this; }
        public Builder derived(Map<String, Double> values) { derived.putAll(values); return this; }
        /** The measured lines (replacing any given before). */
        public Builder lines(List<MeasuredLine> l) { lines.clear(); lines.addAll(l); return this; }

        public MeasuredRow build() {
            if (OK.equals(status) && !Double.isFinite(z)) {
                throw new IllegalStateException("an OK row needs a finite z");
            }
            return new MeasuredRow(this);
        }

        private static String nn(String s) {
            return s == null ? "" : s;
        }
    }
}
