package org.redward.api.lines;

import java.util.List;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * A named, versioned list of spectral lines with vacuum rest wavelengths. Registered as a service
 * with the property {@value org.redward.api.registry.Provided#ID} equal to {@link #id()}.
 * Data-only line-list bundles become LineList services through the line-list extender (see the
 * manifest header {@value #MANIFEST_HEADER}); no Java is needed.
 *
 * <p>Implementations are immutable and thread-safe.
 */
@ConsumerType
public interface LineList {

    /**
     * Manifest header of a data-only line-list bundle: a comma-separated list of paths inside the
     * bundle, each a line-list file (one list per file).
     */
    String MANIFEST_HEADER = "Redward-LineLists";

    String id();

    String version();

    /** Where the list comes from and what it is for. */
    String description();

    /** SHA-256 (lower-case hex) over the list's data, so a result can name exactly what was used. */
    String checksum();

    /** The lines, sorted by increasing rest wavelength. */
    List<SpectralLine> lines();
}
