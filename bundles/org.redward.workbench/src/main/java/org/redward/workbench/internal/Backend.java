package org.redward.workbench.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.redward.charts.RestLine;
import org.redward.spectrum.Spectrum;

/**
 * What the workbench needs from the platform: reading spectra, estimators, lines, velocities and
 * distances, bundles. The command gives an implementation over the OSGi services; tests give their
 * own. Implementations are thread-safe: reading and estimating run off the UI thread.
 */
interface Backend {

    /**
     * One spectrum ready to draw; {@code skyFlux} is null when the file has none; {@code found}
     * holds the lines the finder measured (empty when none is installed).
     */
    record Loaded(Spectrum spectrum, double[] skyFlux, String layout, List<org.redward.charts.FoundLine> found) {
        public Loaded {
            found = List.copyOf(found);
        }
    }

    /**
     * The queue items a path stands for: every spectrum of a file (without reading its pixels
     * where that can be avoided), every file of a folder. Never throws for one bad file: an item
     * whose problem names the file is returned instead.
     */
    List<QueueItem> list(Path path);

    /**
     * Reads one spectrum.
     *
     * @throws IOException with a one-line message naming the file (and HDU or column) at fault
     */
    Loaded load(QueueItem item) throws IOException;

    /** Ids of the estimators available now, sorted. */
    List<String> estimators();

    /** Runs one estimator (must not throw: failures come back as a failed answer). */
    MachineAnswer estimate(String estimatorId, Spectrum spectrum);

    /** Rest-frame lines to draw and to name by click (vacuum Angstrom). */
    List<RestLine> lines();

    /** Lines found in the spectrum (empty when no line finder is installed). */
    List<org.redward.charts.FoundLine> findLines(Spectrum spectrum);

    /** Text rows for the velocities-and-distances panel at this z, each {label, value, caution}. */
    List<String[]> velocitiesAndDistances(double z);

    /** Text rows for the bundles panel: {id, symbolic name, version, state}. */
    List<String[]> bundles();

    /** Text rows of the services: {family, id, bundle}. */
    List<String[]> services();

    /**
     * Installs and starts a bundle jar.
     *
     * @return a one-line message of what happened
     * @throws IOException with a one-line reason when it could not be installed or started
     */
    String install(Path jar) throws IOException;

    /** Who is deciding (the operating-system user unless given). */
    String user();
}
