package org.redward.grades;

import org.junit.jupiter.api.Test;

/**
 * Runs {@link CalibrateGrades} under Maven (profile {@code calibrate-grades}; the arguments come
 * from the system property {@code grades.args}). Not a test: no ordinary build runs it.
 */
class GradeRecalibration {

    @Test
    void recalibrate() throws Exception {
        String args = System.getProperty("grades.args", "").trim();
        CalibrateGrades.main(args.isEmpty() ? new String[0] : args.split("\\s+"));
    }
}
