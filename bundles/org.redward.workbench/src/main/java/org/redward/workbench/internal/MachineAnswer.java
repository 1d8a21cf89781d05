package org.redward.workbench.internal;

import java.util.List;

import org.redward.api.redshift.ScoreCurve;

/**
 * What one estimator said about one spectrum, as far as the workbench needs it: from a live
 * estimator run or from a catalogue row (then without a score curve).
 *
 * @param estimator the estimator's id
 * @param ok whether a z was measured
 * @param error why not, when not ok
 * @param z best z (NaN when failed)
 * @param zError its 1-sigma error (NaN if unknown)
 * @param objectClass class key ({@code galaxy}, {@code quasar}, {@code star}, {@code unknown})
 * @param grade the estimator's grade (may be empty)
 * @param alternatives ranked solutions' z, best first
 * @param curve score against z (null when not known)
 * @param warnings what the user must be told
 */
record MachineAnswer(String estimator, boolean ok, String error, double z, double zError, String objectClass, String grade,
        List<Double> alternatives, ScoreCurve curve, List<String> warnings) {
    MachineAnswer {
        alternatives = List.copyOf(alternatives);
        warnings = List.copyOf(warnings);
        error = error == null ? "" : error;
        grade = grade == null ? "" : grade;
        objectClass = objectClass == null ? "unknown" : objectClass;
    }

    static MachineAnswer failed(String estimator, String error) {
        return new MachineAnswer(estimator, false, error, Double.NaN, Double.NaN, "unknown", "", List.of(), null, List.of());
    }
}
