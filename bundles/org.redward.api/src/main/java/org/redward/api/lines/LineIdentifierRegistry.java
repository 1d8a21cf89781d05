package org.redward.api.lines;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of line identifiers (family {@code line-identifiers}). */
@ProviderType
public interface LineIdentifierRegistry extends ProviderRegistry<LineIdentifier> {
    /** The family name of this registry. */
    String FAMILY = "line-identifiers";
    /** The id of the identifier that ships with Redward (used when none is asked for). */
    String DEFAULT = "pair-vote";
}
