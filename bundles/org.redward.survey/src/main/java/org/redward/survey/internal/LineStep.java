package org.redward.survey.internal;

import org.redward.api.formats.SpectrumRecord;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/**
 * The optional line step of a run ({@code measure --lines}): after the estimator gave a row with
 * status ok, finds, measures and identifies the lines of the spectrum at the row's z. Called from
 * several threads at once, inside the pipeline's time bound. May throw or hang: the pipeline
 * keeps the row (status ok) and adds a warning naming the reason.
 */
interface LineStep {

    /** The row with its lines ({@link MeasuredRow#lines()}); {@code row} is ok. */
    MeasuredRow measure(SpectrumRecord record, Spectrum spectrum, MeasuredRow row) throws Exception;

    /** The bundle (symbolic name and version) of the line finder, to name it when the step misbehaves. */
    String bundle();

    /** What the step uses, for the catalogue's provenance (finder, identifier, line list: ids and versions). */
    java.util.Map<String, String> provenance();
}
