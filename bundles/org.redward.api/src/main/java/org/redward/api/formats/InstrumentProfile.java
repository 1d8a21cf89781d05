package org.redward.api.formats;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Describes one instrument's or survey's file layout: where it keeps wavelength, flux, errors,
 * mask and metadata, in which units and medium, and which regions to mask. Usually made from a
 * data-only bundle by the profile extender (bundle {@code org.redward.profiles}, whose README
 * documents the descriptor keys). Immutable and thread-safe.
 */
@ConsumerType
public interface InstrumentProfile {

    /** Setting naming the reader the profile is meant for ({@code fits}, {@code text}). */
    String READER = "reader";

    String id();

    String description();

    /** The layout settings, as key/value text (keys documented by the readers that use them). */
    Map<String, String> settings();

    /** Observed-frame regions [from, to] in vacuum Angstrom to mask (e.g. strong sky lines). */
    List<double[]> maskedRegionsVacuumAngstrom();

    /** One setting, trimmed; empty if absent or blank. */
    default Optional<String> setting(String key) {
        String v = settings().get(key);
        return v == null || v.isBlank() ? Optional.empty() : Optional.of(v.trim());
    }

    /** The reader id this profile is meant for; empty means any reader. */
    default String reader() {
        return setting(READER).orElse("");
    }
}
