package org.redward.lines.internal;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
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
        return sol.toBuilder().provenance("estimator", ID).provenance("estimator_bundle", bundle)
                .provenance("estimator_version", version).build();
    }
}
