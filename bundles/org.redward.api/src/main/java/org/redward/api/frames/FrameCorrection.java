package org.redward.api.frames;

import java.util.List;

/**
 * The outcome of a frame correction: the corrected redshift, the steps applied, and why the
 * target could not be reached when it was not (missing time, site or sky position), so that a
 * catalogue row can say so. When the target is not reached, {@link #z()} is the redshift in
 * {@link #reached()} (the last frame reached). Immutable.
 *
 * @param input   the redshift as given
 * @param request what was asked
 * @param z       the redshift in {@link #reached()}
 * @param reached the frame {@link #z()} is in
 * @param steps   the corrections applied, in order
 * @param notes   caveats and reasons (empty when all went as asked)
 */
public record FrameCorrection(double input, FrameRequest request, double z, Frame reached, List<FrameStep> steps,
        List<String> notes) {

    public FrameCorrection {
        steps = List.copyOf(steps);
        notes = List.copyOf(notes);
    }

    /** True when the requested frame was reached. */
    public boolean complete() {
        return reached == request.to();
    }
}
