package org.redward.api.survey;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What to measure and how: inputs (files, folders, list files), the estimator, template set,
 * instrument profile, velocity frame and cosmology ids, the catalogue file (its extension picks
 * the format), the number of worker threads, whether to resume an interrupted run, the time
 * bound per spectrum, the redshift range, and whether lines are measured too. Immutable; start from {@link #of(List)} and use
 * the {@code with...} copies.
 */
public final class MeasureRequest {

    /** The default time bound per spectrum: 60 s. */
    public static final Duration DEFAULT_TIME_LIMIT = Duration.ofSeconds(60);

    private final List<Path> inputs;
    private final String estimatorId;
    private final String templatesId;
    private final String profileId;
    private final String frame;
    private final String cosmologyId;
    private final Path output;
    private final int threads;
    private final boolean resume;
    private final Duration timeLimit;
    private final double zMin;
    private final double zMax;
    private final long sliceFirst;
    private final long sliceCount;
    private final boolean lines;

    private MeasureRequest(List<Path> inputs, String estimatorId, String templatesId, String profileId, String frame,
            String cosmologyId, Path output, int threads, boolean resume, Duration timeLimit, double zMin, double zMax,
            long sliceFirst, long sliceCount, boolean lines) {
        this.inputs = List.copyOf(inputs);
        this.estimatorId = estimatorId;
        this.templatesId = templatesId;
        this.profileId = profileId;
        this.frame = frame;
        this.cosmologyId = cosmologyId;
        this.output = output;
        this.threads = threads;
        this.resume = resume;
        this.timeLimit = timeLimit;
        this.zMin = zMin;
        this.zMax = zMax;
        this.sliceFirst = sliceFirst;
        this.sliceCount = sliceCount;
        this.lines = lines;
    }

    /** Default estimator and templates, no profile, no frame correction, default cosmology, all cores, no file. */
    public static MeasureRequest of(List<Path> inputs) {
        return new MeasureRequest(inputs, null, null, null, null, null, null, 0, false, DEFAULT_TIME_LIMIT, -0.005, 4.0, 0, -1, false);
    }

    public MeasureRequest withInputs(List<Path> v) {
        return new MeasureRequest(v, estimatorId, templatesId, profileId, frame, cosmologyId, output, threads, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** The estimator id (null: the platform's default). */
    public MeasureRequest withEstimator(String id) {
        return new MeasureRequest(inputs, blank(id), templatesId, profileId, frame, cosmologyId, output, threads, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** The template set id (null: the default set, for estimators that use templates). */
    public MeasureRequest withTemplates(String id) {
        return new MeasureRequest(inputs, estimatorId, blank(id), profileId, frame, cosmologyId, output, threads, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** A forced instrument profile id (null: found by sniffing). */
    public MeasureRequest withProfile(String id) {
        return new MeasureRequest(inputs, estimatorId, templatesId, blank(id), frame, cosmologyId, output, threads, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** The velocity frame for the corrected columns ({@code bary}, {@code helio}, {@code cmb}, {@code lg}; null: none). */
    public MeasureRequest withFrame(String f) {
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, blank(f), cosmologyId, output, threads, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** The named cosmology for the distance columns (null: the platform's default). */
    public MeasureRequest withCosmology(String id) {
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, blank(id), output, threads, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** The catalogue file (null: rows go only to the listener). */
    public MeasureRequest withOutput(Path file) {
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, cosmologyId, file, threads, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** Worker threads (0: one per available core). */
    public MeasureRequest withThreads(int n) {
        if (n < 0) {
            throw new IllegalArgumentException("threads must be 0 (all cores) or positive: " + n);
        }
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, cosmologyId, output, n, resume, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** Resume the interrupted run whose journal sits beside the output file. */
    public MeasureRequest withResume(boolean r) {
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, cosmologyId, output, threads, r, timeLimit, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** The most one spectrum may take (reading excluded); beyond it the spectrum fails and the run goes on. */
    public MeasureRequest withTimeLimit(Duration d) {
        Objects.requireNonNull(d, "time limit");
        if (d.isNegative() || d.isZero()) {
            throw new IllegalArgumentException("time limit must be positive: " + d);
        }
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, cosmologyId, output, threads, resume, d, zMin, zMax, sliceFirst, sliceCount, lines);
    }

    /** The redshift range searched; solutions outside it count as nonsense from the estimator. */
    public MeasureRequest withRedshiftRange(double min, double max) {
        if (!(min < max)) {
            throw new IllegalArgumentException("redshift range: minimum " + min + " is not below maximum " + max);
        }
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, cosmologyId, output, threads, resume, timeLimit, min, max, sliceFirst, sliceCount, lines);
    }

    /**
     * Only a slice of the inputs' spectra: the {@code count} spectra from position {@code first}
     * (0-based, counting every record of the inputs in order, failed reads included) are measured;
     * the ones before are read and passed over, reading stops after the slice. The rows keep their
     * position in the inputs as their sequence number. For engines that split a survey into
     * bounded tasks (each task one slice of one file). Not with {@link #withResume(boolean) resume}.
     *
     * @param count spectra in the slice, at least 1; -1 for all from {@code first} on
     */
    public MeasureRequest withSlice(long first, long count) {
        if (first < 0 || count == 0 || count < -1) {
            throw new IllegalArgumentException("slice: first " + first + " must be >= 0 and count " + count + " >= 1 (or -1: to the end)");
        }
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, cosmologyId, output, threads, resume, timeLimit,
                zMin, zMax, first, count, lines);
    }

    /**
     * Also find, measure and identify the lines of every spectrum measured ok, at its catalogue z
     * (off by default: then no line is measured). The catalogue gets a second table of lines.
     */
    public MeasureRequest withLines(boolean measureLines) {
        return new MeasureRequest(inputs, estimatorId, templatesId, profileId, frame, cosmologyId, output, threads, resume, timeLimit,
                zMin, zMax, sliceFirst, sliceCount, measureLines);
    }

    public List<Path> inputs() { return inputs; }
    public Optional<String> estimatorId() { return Optional.ofNullable(estimatorId); }
    public Optional<String> templatesId() { return Optional.ofNullable(templatesId); }
    public Optional<String> profileId() { return Optional.ofNullable(profileId); }
    public Optional<String> frame() { return Optional.ofNullable(frame); }
    public Optional<String> cosmologyId() { return Optional.ofNullable(cosmologyId); }
    public Optional<Path> output() { return Optional.ofNullable(output); }
    /** Worker threads; 0 means one per core. */
    public int threads() { return threads; }
    public boolean resume() { return resume; }
    public Duration timeLimit() { return timeLimit; }
    public double zMin() { return zMin; }
    public double zMax() { return zMax; }
    /** Position of the first spectrum measured (0 unless {@link #withSlice} was used). */
    public long sliceFirst() { return sliceFirst; }
    /** Spectra measured from {@link #sliceFirst()}; -1 for all to the end. */
    public long sliceCount() { return sliceCount; }
    /** True if the lines of every spectrum are measured too ({@link #withLines}). */
    public boolean lines() { return lines; }

    private static String blank(String s) {
        return s == null || s.isBlank() ? null : s.trim();
    }
}
