package org.redward.grades;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.redward.api.redshift.ConfidenceGrade;
import org.redward.api.redshift.GradeCalibration;
import org.redward.testkit.GradeCalibrator;

/**
 * The committed grade tables state the truth on a mock survey they were not derived on: on a
 * small survey of the check seed ({@value CalibrateGrades#CHECK_SEED}, not the calibration seed
 * {@value CalibrateGrades#CALIBRATION_SEED}), each estimator's top grade (the best grade it gave)
 * is right at least as often as the grade's floor says, less three binomial standard errors
 * {@code 3 sqrt(f (1 - f) / n)} (common practice for a count test). The estimators grade through
 * their own tables here, exactly as in the product. Correct: {@link GradeCalibration#correct}.
 */
class TopGradeReliabilityTest {

    static final int SIZE = 200;
    static Map<String, List<MockSolutions.Outcome>> outcomes;

    @BeforeAll
    static void measure() throws Exception {
        outcomes = MockSolutions.measure(CalibrateGrades.CHECK_SEED, SIZE, GradedEstimator.ours(),
                Math.max(1, Runtime.getRuntime().availableProcessors()));
    }

    @Test
    void topGradeMeetsItsStatedFraction() {
        StringBuilder report = new StringBuilder();
        for (GradedEstimator e : GradedEstimator.ours()) {
            List<MockSolutions.Outcome> list = outcomes.get(e.id());
            ConfidenceGrade top = null;
            for (ConfidenceGrade g : ConfidenceGrade.values()) {
                if (g != ConfidenceGrade.VOID && list.stream().anyMatch(o -> o.solution().ok() && o.solution().grade().equals(g.key()))) {
                    top = g;
                    break;
                }
            }
            report.append(String.format(Locale.ROOT, "%s on seed %d (%d fibres), %s:%n", e.id(), CalibrateGrades.CHECK_SEED, SIZE,
                    GradeCalibration.CORRECT_DEFINITION));
            for (ConfidenceGrade g : ConfidenceGrade.values()) {
                List<MockSolutions.Outcome> given = list.stream().filter(o -> o.solution().ok() && o.solution().grade().equals(g.key())).toList();
                GradeCalibrator.GradeCheck c = new GradeCalibrator.GradeCheck(g, g.floor(),
                        given.isEmpty() ? Double.NaN : given.stream().filter(MockSolutions.Outcome::correct).count() / (double) given.size(),
                        given.size());
                report.append(String.format(Locale.ROOT, "  %-6s stated >=%.2f measured %s of %d%n", g.key(), g.floor(),
                        given.isEmpty() ? "-" : String.format(Locale.ROOT, "%.3f", c.measuredFraction()), c.count()));
                if (g == top) {
                    assertTrue(c.meets(3), String.format(Locale.ROOT, "%s: top grade %s is right for %.3f of %d, below its floor %.2f by more"
                            + " than 3 sigma (%.3f)", e.id(), g.key(), c.measuredFraction(), c.count(), g.floor(), 3 * c.sigma()));
                }
            }
        }
        System.out.print(report);
    }
}
