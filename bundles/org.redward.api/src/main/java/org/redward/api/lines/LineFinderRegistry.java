package org.redward.api.lines;

import org.osgi.annotation.versioning.ProviderType;
import org.redward.api.registry.ProviderRegistry;

/** The broker of line finders (family {@code line-finders}). */
@ProviderType
public interface LineFinderRegistry extends ProviderRegistry<LineFinder> {
    /** The family name of this registry. */
    String FAMILY = "line-finders";
    /** The id of the finder that ships with Redward (used when none is asked for). */
    String DEFAULT = "matched-gauss";
}
