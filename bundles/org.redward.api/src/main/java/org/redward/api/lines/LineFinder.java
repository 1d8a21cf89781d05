package org.redward.api.lines;

import org.osgi.annotation.versioning.ConsumerType;
import org.redward.spectrum.Spectrum;

/**
 * Finds and measures the emission and absorption lines of a spectrum. Registered as a service
 * with the properties {@value org.redward.api.registry.Provided#ID} and
 * {@value org.redward.api.registry.Provided#DESCRIPTION}.
 *
 * <p>Contract: stateless and thread-safe; never throws for bad data (a flat spectrum, pure noise,
 * everything masked, too few pixels): it returns an empty {@link LineSearch} with a statement
 * saying why.
 */
@ConsumerType
public interface LineFinder {

    LineSearch find(Spectrum spectrum, FinderSettings settings);
}
