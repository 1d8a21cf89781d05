package org.redward.lines.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.redshift.ConfidenceGrade;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.GradeCalibration;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.registry.Provided;
import org.redward.spectrum.Spectrum;

/**
 * The line-based redshift estimator ({@value #ID}): detected lines, identified by pair voting
 * (see {@link LineRedshift}). The line list is the context parameter {@code linelist} (default
 * {@value LineListRegistry#STANDARD}).
 *
 * <p>Grade: from the diagnostic {@value #GRADE_STATISTIC} (the identification's score) and the
 * class given, through the table {@code calibration.tsv} beside this class, measured on the mock
 * survey (see {@link GradeCalibration}); a failed solution is graded void. Thread-safe; never
 * throws for bad data.
 */
@Component(property = {Provided.ID + "=" + LineRedshiftEstimator.ID,
        Provided.DESCRIPTION + "=redshift from detected emission and absorption lines identified by pair voting (no templates);"
                + " grades from the line score per class, calibrated on the mock survey (fraction of |dz|/(1+z) < 0.001)",
        RedshiftEstimator.USES_TEMPLATES + ":Boolean=false"})
public final class LineRedshiftEstimator implements RedshiftEstimator {

    public static final String ID = "lines";
    static final String LIST_PARAMETER = "linelist";
    /** The diagnostic the grades are read from. */
    static final String GRADE_STATISTIC = "line_score";

    private static final GradeCalibration CALIBRATION = loadCalibration();

    @Reference
    LineListRegistry lists;

    private final LineRedshift core = new LineRedshift();
    private volatile String bundle = "org.redward.lines";
    private volatile String version = "";

    @Activate
    void activate(BundleContext context) {
        bundle = context.getBundle().getSymbolicName();
        version = context.getBundle().getVersion().toString();
    }

    @Override
    public RedshiftSolution estimate(Spectrum spectrum, EstimationContext context) {
        String want = context.parameters().getOrDefault(LIST_PARAMETER, LineListRegistry.STANDARD);
        LineListRegistry registry = lists;
        LineList list = registry == null ? null : registry.find(want).map(Provided::service).orElse(null);
        RedshiftSolution sol;
        if (list == null && !want.equals(LineListRegistry.STANDARD)) {
            sol = RedshiftSolution.failed("no line list with id '" + want + "' (available: "
                    + (registry == null ? "standard" : String.join(", ", registry.ids())) + ")");
        } else {
            try {
                sol = core.estimate(spectrum, context, list == null ? LineListFile.standard() : list);
            } catch (RuntimeException e) {
                sol = RedshiftSolution.failed("line-based estimate failed: " + e);
            }
        }
        RedshiftSolution.Builder b = sol.toBuilder().provenance("estimator", ID).provenance("estimator_bundle", bundle)
                .provenance("estimator_version", version).provenance("grade_calibration", CALIBRATION.origin());
        if (sol.ok()) {
            double stat = sol.diagnostics().getOrDefault(GRADE_STATISTIC, Double.NaN);
            String cls = sol.objectClass().key();
            b.grade(CALIBRATION.grade(cls, stat).key(), CALIBRATION.reliability(cls, stat));
        } else {
            b.grade(ConfidenceGrade.VOID.key(), 0.0);
        }
        return b.build();
    }

    private static GradeCalibration loadCalibration() {
        try (InputStream in = LineRedshiftEstimator.class.getResourceAsStream("calibration.tsv")) {
            if (in == null) {
                throw new IllegalStateException(LineRedshiftEstimator.class.getName() + ": calibration.tsv missing beside the class");
            }
            return GradeCalibration.read(GRADE_STATISTIC, in, 0.0);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
