package org.redward.api.survey;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;

/**
 * How a run went: spectra measured and failed (including those restored from the journal of an
 * interrupted run), time taken, rate, the catalogue written, and every plug-in bundle that
 * misbehaved with a count and an example reason.
 *
 * @param total rows in the catalogue
 * @param ok rows with status ok
 * @param failed rows with status failed
 * @param resumed rows restored from an earlier, interrupted run
 * @param seconds wall-clock seconds of this run (resumed rows excluded)
 * @param catalog the catalogue file written, if any
 * @param misbehaving bundle (symbolic name and version) to a one-line account (counts and an example)
 * @param lines lines measured in all rows (0 unless the run measured lines)
 * @param spectraWithLines rows with at least one measured line
 */
public record MeasureSummary(long total, long ok, long failed, long resumed, double seconds, Optional<Path> catalog,
        Map<String, String> misbehaving, long lines, long spectraWithLines) {

    public MeasureSummary {
        misbehaving = Map.copyOf(misbehaving);
    }

    /** A summary of a run that measured no lines. */
    public MeasureSummary(long total, long ok, long failed, long resumed, double seconds, Optional<Path> catalog,
            Map<String, String> misbehaving) {
        this(total, ok, failed, resumed, seconds, catalog, misbehaving, 0, 0);
    }

    /** Spectra measured per second in this run (resumed rows excluded). */
    public double spectraPerSecond() {
        return seconds > 0 ? (total - resumed) / seconds : Double.NaN;
    }
}
