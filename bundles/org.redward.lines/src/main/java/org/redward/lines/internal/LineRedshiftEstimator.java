package org.redward.lines.internal;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.registry.Provided;
import org.redward.spectrum.Spectrum;

/**
 * The line-based redshift estimator ({@value #ID}): detected lines, identified by pair voting
 * (see {@link LineRedshift}). The line list is the context parameter {@code linelist} (default
 * {@value LineListRegistry#STANDARD}). Thread-safe; never throws for bad data.
 */
@Component(property = {Provided.ID + "=" + LineRedshiftEstimator.ID,
        Provided.DESCRIPTION + "=redshift from detected emission and absorption lines identified by pair voting (no templates)",
        RedshiftEstimator.USES_TEMPLATES + ":Boolean=false"})
public final class LineRedshiftEstimator implements RedshiftEstimator {

    public static final String ID = "lines";
    static final String LIST_PARAMETER = "linelist";

    @Reference
    private LineListRegistry lists;

    private final LineRedshift core = new LineRedshift();

    @Override
    public RedshiftSolution estimate(Spectrum spectrum, EstimationContext context) {
        String want = context.parameters().getOrDefault(LIST_PARAMETER, LineListRegistry.STANDARD);
        LineList list = lists.find(want).map(Provided::service).orElse(null);
        if (list == null) {
            if (!want.equals(LineListRegistry.STANDARD)) {
                return RedshiftSolution.failed("no line list with id '" + want + "' (available: " + String.join(", ", lists.ids()) + ")");
            }
            list = LineListFile.standard();
        }
        try {
            return core.estimate(spectrum, context, list);
        } catch (RuntimeException e) {
            return RedshiftSolution.failed("line-based estimate failed: " + e);
        }
    }
}
