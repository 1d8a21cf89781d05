package org.redward.frames.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.osgi.service.component.annotations.Component;
import org.redward.api.frames.Frame;
import org.redward.api.frames.FrameCorrection;
import org.redward.api.frames.FrameCorrector;
import org.redward.api.frames.FrameRequest;
import org.redward.api.frames.FrameStep;
import org.redward.api.frames.SolarMotion;
import org.redward.api.registry.Provided;
import org.redward.spectrum.SpectrumMetadata;

/**
 * Frame corrections, multiplicative at every step (Wright &amp; Eastman 2014, PASP 126, 838).
 *
 * <ul>
 * <li>Topocentric to barycentric or heliocentric: the observer's velocity v (JSOFA, see
 * {@link SolarSystem}) projected on the catalogue direction n gives
 * {@code 1 + z_B = (1 + z_obs) gamma (1 + v.n/c)}: the special-relativistic Doppler factor with
 * the direction measured in the barycentric frame. Gravitational and light-travel terms (a few
 * m/s at most) are left out: good to about 0.01 km/s, not to the cm/s of precise radial-velocity
 * work.</li>
 * <li>Barycentric (or heliocentric) to CMB or Local Group: the Sun's velocity V relative to that
 * frame (a {@link SolarMotion}) projected on n as seen from the solar system gives
 * {@code 1 + z_new = (1 + z_h) / (gamma (1 - V.n/c))}. Heliocentric and barycentric input are
 * treated alike here (they differ by at most about 0.013 km/s, from memory). The Local Group
 * definitions are first-order formulas; at first order the factor is {@code 1 + V.n/c}.</li>
 * </ul>
 * Stateless and thread-safe.
 */
@Component(property = {Provided.ID + "=sofa-frames",
        Provided.DESCRIPTION + "=barycentric, heliocentric (JSOFA ephemeris), CMB (Planck 2018 dipole) and Local Group frame corrections"})
public final class FrameService implements FrameCorrector {

    private static final double C = SolarSystem.C_KM_S;

    @Override
    public FrameCorrection correct(double z, SpectrumMetadata m, FrameRequest req) {
        List<FrameStep> steps = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        Frame from = req.from();
        Frame to = req.to();
        if (from == Frame.CMB || from == Frame.LOCAL_GROUP) {
            throw new IllegalArgumentException("frame: redshifts given in the " + from.key()
                    + " frame cannot be corrected further; give topocentric, heliocentric or barycentric redshifts");
        }
        if (Double.isNaN(z)) {
            notes.add("z is NaN: nothing corrected");
            return new FrameCorrection(z, req, z, from, steps, notes);
        }
        if (from == to) {
            return new FrameCorrection(z, req, z, from, steps, notes);
        }
        if (to == Frame.TOPOCENTRIC) {
            throw new IllegalArgumentException("frame: correcting back to topocentric is not supported (from " + from.key() + ")");
        }
        double onePlusZ = 1.0 + z;
        Frame at = from;
        if (!m.hasSkyPosition()) {
            notes.add("no sky position (ra, dec): no frame correction possible; z stays " + at.key());
            return new FrameCorrection(z, req, z, at, steps, notes);
        }
        double ra = m.raDeg();
        double dec = m.decDeg();
        if (at == Frame.TOPOCENTRIC) {
            boolean helio = to == Frame.HELIOCENTRIC;
            if (!Double.isFinite(m.midExposureMjdUtc())) {
                notes.add("no exposure mid-point time: no " + (helio ? "heliocentric" : "barycentric")
                        + " correction (up to 30 km/s); z stays topocentric (give the time, or the frame the redshift is already in)");
                return new FrameCorrection(z, req, z, at, steps, notes);
            }
            SolarSystem.Velocity v = SolarSystem.observerVelocity(m.midExposureMjdUtc(), m.siteLongitudeDeg(),
                    m.siteLatitudeDeg(), m.siteHeightMetres(), helio);
            if (!v.note().isEmpty()) {
                notes.add(v.note());
            }
            double vn = SolarSystem.dot(v.kmPerS(), SolarSystem.direction(ra, dec));
            double beta2 = SolarSystem.dot(v.kmPerS(), v.kmPerS()) / (C * C);
            double factor = (1.0 + vn / C) / Math.sqrt(1.0 - beta2);
            Frame next = helio ? Frame.HELIOCENTRIC : Frame.BARYCENTRIC;
            steps.add(new FrameStep(at, next, vn, factor, v.method() + String.format(Locale.ROOT,
                    " at MJD %.6f UTC; (1+z) x gamma(1 + v.n/c)", m.midExposureMjdUtc())));
            onePlusZ *= factor;
            at = next;
        }
        if (to == Frame.HELIOCENTRIC || to == Frame.BARYCENTRIC) {
            if (at != to) {
                notes.add("heliocentric and barycentric redshifts differ by at most about 0.013 km/s; treated as the same");
                at = to;
            }
            return new FrameCorrection(z, req, onePlusZ - 1.0, at, steps, notes);
        }
        SolarMotion motion = to == Frame.CMB ? SolarMotion.CMB_PLANCK2018 : req.localGroup();
        double[] lb = SolarSystem.galactic(ra, dec);
        double vn = motion.projectedKmPerS(lb[0], lb[1]);
        double beta = motion.speedKmPerS() / C;
        double factor = Math.sqrt(1.0 - beta * beta) / (1.0 - vn / C);
        steps.add(new FrameStep(at, to, vn, factor, motion.citation() + String.format(Locale.ROOT,
                "; source at l=%.4f, b=%.4f; (1+z) / (gamma(1 - V.n/c))", lb[0], lb[1])));
        if (to == Frame.LOCAL_GROUP) {
            notes.add("Local Group frame after " + motion.key() + " (definitions differ by up to about 50 km/s)");
        }
        onePlusZ *= factor;
        return new FrameCorrection(z, req, onePlusZ - 1.0, to, steps, notes);
    }

    @Override
    public double solarSystemVelocityKmPerS(double mjdUtc, double raDeg, double decDeg, double siteLongitudeDeg,
            double siteLatitudeDeg, double siteHeightMetres, boolean heliocentric) {
        SolarSystem.Velocity v = SolarSystem.observerVelocity(mjdUtc, siteLongitudeDeg, siteLatitudeDeg, siteHeightMetres, heliocentric);
        return SolarSystem.dot(v.kmPerS(), SolarSystem.direction(raDeg, decDeg));
    }
}
