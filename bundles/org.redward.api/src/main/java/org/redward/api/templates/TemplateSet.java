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

    /** Service property (String): the set's {@link #version()}. */
    String VERSION = "redward.templates.version";
    /** Service property (String): the set's {@link #checksum()}. */
    String CHECKSUM = "redward.templates.checksum";
    /**
     * Manifest header of a data-only template bundle: a comma-separated list of descriptor paths
     * inside the bundle (Java properties files, see the contributor guide); the template
     * extender turns each into a TemplateSet service registered in that bundle's name.
     */
    String BUNDLE_HEADER = "Redward-Template-Set";

    String id();

    String version();

    /**
     * SHA-256 (lower-case hex) over the template data, so a catalogue can name exactly what was
     * used; computed by the rule of {@link TemplateSets#checksum(java.util.List)}.
     */
    String checksum();

    /** Where the templates come from and how they were made. */
    String description();

    List<Template> templates();
}
