package org.redward.workbench.internal;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * One spectrum in the queue: where it is, what the machines said about it, what the person
 * decided. Mutable; touched only on the UI thread (background work hands results back through
 * the display).
 */
final class QueueItem {

    private final Path source;
    private final int index;
    private String id;
    private final Map<String, MachineAnswer> answers = new LinkedHashMap<>();
    private String problem = "";
    private Decision decision;

    QueueItem(Path source, int index, String id) {
        this.source = Objects.requireNonNull(source);
        this.index = index;
        this.id = id == null || id.isBlank() ? source.getFileName() + (index > 0 ? "#" + index : "") : id;
    }

    /** The journal key: the absolute file and the spectrum's index in it. */
    String key() {
        return key(source, index);
    }

    static String key(Path source, int index) {
        return source.toAbsolutePath().normalize() + "#" + index;
    }

    Path source() { return source; }
    int index() { return index; }
    String id() { return id; }
    void id(String v) { if (v != null && !v.isBlank()) { id = v; } }

    Map<String, MachineAnswer> answers() { return answers; }

    /** The first estimator's answer, or null. */
    MachineAnswer primary() {
        return answers.isEmpty() ? null : answers.values().iterator().next();
    }

    /** Why the spectrum cannot be shown (empty when fine). */
    String problem() { return problem; }
    void problem(String p) { problem = p == null ? "" : p; }

    Decision decision() { return decision; }
    void decision(Decision d) { decision = d; }

    /** The z to show: the person's if decided, else the first estimator's best, else NaN. */
    double currentZ() {
        if (decision != null) {
            return decision.z();
        }
        MachineAnswer a = primary();
        return a != null && a.ok() ? a.z() : Double.NaN;
    }

    /** The class key of the first estimator (or {@code unknown}). */
    String objectClass() {
        MachineAnswer a = primary();
        return a == null ? "unknown" : a.objectClass();
    }

    /** The first estimator's grade (or empty). */
    String machineGrade() {
        MachineAnswer a = primary();
        return a == null ? "" : a.grade();
    }

    /**
     * The largest velocity difference between the estimators' best redshifts, in km/s,
     * {@code c |z1 - z2| / (1 + z1)} (the rest-frame velocity difference, common practice); NaN with
     * fewer than two successful answers.
     */
    double disagreementKmPerS() {
        double max = Double.NaN;
        MachineAnswer[] a = answers.values().stream().filter(MachineAnswer::ok).toArray(MachineAnswer[]::new);
        for (int i = 0; i < a.length; i++) {
            for (int j = i + 1; j < a.length; j++) {
                double d = Kinematics.velocityDifferenceKmPerS(a[i].z(), a[j].z());
                max = Double.isNaN(max) ? Math.abs(d) : Math.max(max, Math.abs(d));
            }
        }
        return max;
    }
}
