package org.redward.redshift.kit;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Map;

import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.GradeCalibration;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.Spectrum;

/**
 * What every template-based estimator of ours shares: its identity for provenance (bundle and
 * version, set by the DS component at activation), its grade calibration (the resource
 * {@code calibration.tsv} beside the subclass), single-threaded FFTs, and the rule that
 * {@link #estimate} never throws: bad parameters and unexpected errors become failed solutions
 * with a reason. Thread-safe when the subclass's {@link #run} is.
 */
public abstract class EstimatorBase implements RedshiftEstimator {

    private volatile String bundle;
    private volatile String version = "unpackaged";
    protected final GradeCalibration calibration;

    /**
     * @param defaultBundle the bundle symbolic name used outside a framework (tests)
     * @param statistic the diagnostic the calibration table is indexed by
     */
    protected EstimatorBase(String defaultBundle, String statistic) {
        this.bundle = defaultBundle;
        FftCorrelator.singleThreaded();
        try (InputStream in = getClass().getResourceAsStream("calibration.tsv")) {
            if (in == null) {
                throw new IllegalStateException(getClass().getName() + ": calibration.tsv missing beside the class");
            }
            calibration = GradeCalibration.read(statistic, in, 0.2);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Records the bundle that registered this estimator (call from the component's activate). */
    protected final void identify(String bundleSymbolicName, String bundleVersion) {
        this.bundle = bundleSymbolicName;
        this.version = bundleVersion;
    }

    /** The estimator's service id. */
    protected abstract String id();

    /** The work; may throw IllegalArgumentException for bad parameters (becomes a failed solution). */
    protected abstract RedshiftSolution run(Spectrum spectrum, EstimationContext context);

    @Override
    public final RedshiftSolution estimate(Spectrum spectrum, EstimationContext context) {
        if (spectrum == null || context == null) {
            return RedshiftSolution.failed("no spectrum or no estimation context given");
        }
        try {
            return run(spectrum, context);
        } catch (IllegalArgumentException e) {
            return RedshiftSolution.failed(e.getMessage());
        } catch (RuntimeException e) {
            return RedshiftSolution.failed(id() + " estimator internal error: " + e);
        }
    }

    /** The provenance map of a solution made with {@code set} and the effective parameters. */
    protected final Map<String, String> provenance(TemplateSet set, Map<String, String> parameters) {
        return Provenance.of(bundle, version, id(), set, parameters);
    }

    /** A failed solution that still carries its provenance and the lowest grade. */
    protected static RedshiftSolution failed(String reason, Map<String, String> provenance) {
        return RedshiftSolution.failed(reason).toBuilder().provenance(provenance).grade("void", 0.0).build();
    }
}
