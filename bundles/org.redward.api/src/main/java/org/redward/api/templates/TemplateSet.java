package org.redward.api.templates;

import java.util.List;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * A named, versioned set of rest-frame templates. Registered as a service with the property
 * {@value org.redward.api.registry.Provided#ID} equal to {@link #id()}. Data-only template
 * bundles become TemplateSet services through the template extender; no Java is needed.
 *
 * <p>Implementations are immutable and thread-safe.
 */
@ConsumerType
public interface TemplateSet {

    String id();

    String version();

    /** SHA-256 (lower-case hex) over the template data, so a catalogue can name exactly what was used. */
    String checksum();

    /** Where the templates come from and how they were made. */
    String description();

    List<Template> templates();
}
