package org.redward.api.formats;

import java.util.List;
import java.util.Map;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Describes one instrument's or survey's file layout: where it keeps wavelength, flux, errors,
 * mask and metadata, in which units and medium, and which regions to mask. Usually made from a
 * data-only bundle by the profile extender. Immutable and thread-safe.
 */
@ConsumerType
public interface InstrumentProfile {

    String id();

    String description();

    /** The layout settings, as key/value text (keys documented by the readers that use them). */
    Map<String, String> settings();

    /** Observed-frame regions [from, to] in vacuum Angstrom to mask (e.g. strong sky lines). */
    List<double[]> maskedRegionsVacuumAngstrom();
}
