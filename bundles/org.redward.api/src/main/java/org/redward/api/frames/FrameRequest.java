package org.redward.api.frames;

import java.util.Objects;

/**
 * What to correct: the frame the redshift is given in, the frame wanted, and the Local Group
 * definition (used only when the target is {@link Frame#LOCAL_GROUP}).
 *
 * @param from            the frame of the input redshift (usually {@link Frame#TOPOCENTRIC})
 * @param to              the frame wanted
 * @param localGroup      the Local Group definition ({@link SolarMotion#DEFAULT_LOCAL_GROUP} if null)
 */
public record FrameRequest(Frame from, Frame to, SolarMotion localGroup) {

    /** Topocentric to barycentric: the standard correction of a measured redshift. */
    public static final FrameRequest BARYCENTRIC = new FrameRequest(Frame.TOPOCENTRIC, Frame.BARYCENTRIC, null);

    public FrameRequest {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        if (localGroup == null) {
            localGroup = SolarMotion.DEFAULT_LOCAL_GROUP;
        }
        if (localGroup == SolarMotion.CMB_PLANCK2018) {
            throw new IllegalArgumentException("the CMB dipole is not a Local Group definition");
        }
    }

    public static FrameRequest of(Frame from, Frame to) {
        return new FrameRequest(from, to, null);
    }
}
