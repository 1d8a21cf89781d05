package org.redward.api.survey;

import java.io.IOException;

import org.osgi.annotation.versioning.ProviderType;

/**
 * The measuring pipeline as a service: reads every spectrum of the inputs, estimates its
 * redshift with the chosen estimator on all cores, adds frame velocities and distances, journals
 * every row as it comes (so that {@link MeasureRequest#resume()} finishes an interrupted run
 * with every spectrum exactly once), and writes the catalogue atomically.
 *
 * <p>Failures never stop a run: a spectrum that cannot be read, an estimator that throws, hangs
 * beyond {@link MeasureRequest#timeLimit()} or returns nonsense (non-finite z or error, z out of
 * range) gives a row with status {@code failed} and the reason, and the bundle at fault is named
 * in {@link MeasureSummary#misbehaving()}. Thread-safe: several runs may go at once.
 */
@ProviderType
public interface SurveyMeasurer {

    /**
     * Runs the measurement.
     *
     * @throws IllegalArgumentException for a bad request (unknown estimator, template set,
     *     cosmology or frame; no writer for the output's extension; a journal in the way); the
     *     message names the option at fault
     * @throws IOException if the journal or the catalogue cannot be written
     */
    MeasureSummary measure(MeasureRequest request, MeasureListener listener) throws IOException;

    /**
     * The catalogue table of rows measured with {@code request}: exactly the columns and cells of
     * the catalogue file that {@link #measure} writes for it (so that other engines, such as the
     * survey job on Apache Spark, produce the same catalogue).
     *
     * @throws IllegalArgumentException for a bad request, as {@link #measure}
     */
    org.redward.api.catalog.CatalogTable table(MeasureRequest request, Iterable<MeasuredRow> rows, long rowCount);
}
