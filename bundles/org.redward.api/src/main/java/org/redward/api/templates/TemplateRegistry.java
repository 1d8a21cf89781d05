package org.redward.api.templates;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of template sets (family {@code templates}). */
@ProviderType
public interface TemplateRegistry extends ProviderRegistry<TemplateSet> {
    /** The family name of this registry. */
    String FAMILY = "templates";
}
