package org.redward.survey.internal;

import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/**
 * Measures one spectrum into the measured fields of a row (z, error, class, grade, estimator,
 * alternatives, warnings; and derived quantities). Called from several threads at once.
 * May throw or hang: the pipeline isolates it.
 */
interface Estimation {

    /** Fills the measurement into {@code row} (already carrying source, index, id, sky). */
    void measure(Spectrum spectrum, MeasuredRow.Builder row) throws Exception;

    /** The estimator id written in every row. */
    String id();

    /** The bundle (symbolic name and version) that does the measuring, to name it when it misbehaves. */
    String bundle();
}
