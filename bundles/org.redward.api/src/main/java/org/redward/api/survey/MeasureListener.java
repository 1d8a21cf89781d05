package org.redward.api.survey;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Receives the rows of a run as they are journalled, in input order, on one thread (never two
 * calls at once). Rows restored from the journal of an interrupted run are not repeated.
 * A listener must be quick: the run waits for it.
 */
@ConsumerType
public interface MeasureListener {

    /** Called once before the first row: the number of spectra already done by an earlier, interrupted run. */
    default void started(long resumedRows) {
    }

    /** One new row. */
    void row(MeasuredRow row);

    /** A listener that ignores everything. */
    static MeasureListener none() {
        return r -> { };
    }
}
