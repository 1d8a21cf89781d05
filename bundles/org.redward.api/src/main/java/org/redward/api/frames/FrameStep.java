package org.redward.api.frames;

/**
 * One correction applied: {@code (1 + z_to) = (1 + z_from) * factor}.
 *
 * @param from                the frame before the step
 * @param to                  the frame after the step
 * @param projectedVelocityKmPerS the observer's velocity relative to the new frame, projected on the direction to the source (km/s; positive towards the source)
 * @param factor              the multiplicative factor on (1 + z)
 * @param method              how it was computed (ephemeris, apex, convention), for provenance
 */
public record FrameStep(Frame from, Frame to, double projectedVelocityKmPerS, double factor, String method) {
}
