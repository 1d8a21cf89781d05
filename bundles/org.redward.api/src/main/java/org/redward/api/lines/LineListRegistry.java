package org.redward.api.lines;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of line lists (family {@code linelists}). */
@ProviderType
public interface LineListRegistry extends ProviderRegistry<LineList> {
    /** The family name of this registry. */
    String FAMILY = "linelists";
    /** The id of the list that ships with Redward. */
    String STANDARD = "standard";
}
