package org.redward.api.lines;

import java.util.List;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Says which lines of a list the detected lines are, and at what redshift. Registered as a
 * service with the properties {@value org.redward.api.registry.Provided#ID} and
 * {@value org.redward.api.registry.Provided#DESCRIPTION}.
 *
 * <p>Contract: stateless and thread-safe; never throws for bad data (no lines gives an
 * identification without hypotheses and a warning).
 */
@ConsumerType
public interface LineIdentifier {

    /**
     * @param lines the detected lines (e.g. from a {@link LineFinder})
     * @param list the line list to identify them with
     * @param settings redshift range, tolerance, or a known redshift
     * @param spectrumMinAngstrom with {@code spectrumMaxAngstrom}: the observed range covered, used
     *     to name the strong lines a hypothesis predicts but that were not found (NaN to skip)
     */
    Identification identify(List<DetectedLine> lines, LineList list, IdentifySettings settings,
            double spectrumMinAngstrom, double spectrumMaxAngstrom);
}
