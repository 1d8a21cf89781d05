package org.redward.api.lines;

import java.util.Locale;

/**
 * What a {@link LineIdentifier} may assume: the redshift range to search, the velocity tolerance
 * of a match for narrow lines, and optionally a known redshift (then lines are only labelled at
 * that z, not searched). Immutable.
 */
public final class IdentifySettings {

    private static final IdentifySettings DEFAULT = new IdentifySettings(-0.005, 7.0, 150.0, Double.NaN);

    private final double zMin;
    private final double zMax;
    private final double toleranceKmPerS;
    private final double fixedZ;

    private IdentifySettings(double zMin, double zMax, double tol, double fixedZ) {
        this.zMin = zMin;
        this.zMax = zMax;
        this.toleranceKmPerS = tol;
        this.fixedZ = fixedZ;
    }

    /** z from -0.005 to 7, 150 km/s tolerance for narrow lines, no fixed z. */
    public static IdentifySettings defaults() {
        return DEFAULT;
    }

    public double zMin() { return zMin; }
    public double zMax() { return zMax; }
    /** Velocity tolerance of a match for a narrow line, km/s (broad lines get more; see the identifier). */
    public double toleranceKmPerS() { return toleranceKmPerS; }
    /** The known redshift, or NaN to search. */
    public double fixedZ() { return fixedZ; }
    public boolean hasFixedZ() { return Double.isFinite(fixedZ); }

    /** @throws IllegalArgumentException if not min &lt; max or min &lt;= -1 */
    public IdentifySettings withRedshiftRange(double min, double max) {
        if (!(min < max) || !(min > -1)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "redshift range %g..%g is not a range above -1", min, max));
        }
        return new IdentifySettings(min, max, toleranceKmPerS, fixedZ);
    }

    /** @throws IllegalArgumentException if not positive */
    public IdentifySettings withToleranceKmPerS(double tol) {
        if (!(tol > 0)) {
            throw new IllegalArgumentException("match tolerance " + tol + " km/s is not a positive number");
        }
        return new IdentifySettings(zMin, zMax, tol, fixedZ);
    }

    /** A known redshift (NaN to search again). @throws IllegalArgumentException if z &lt;= -1 */
    public IdentifySettings withFixedZ(double z) {
        if (z <= -1) {
            throw new IllegalArgumentException("redshift " + z + " is not above -1");
        }
        return new IdentifySettings(zMin, zMax, toleranceKmPerS, z);
    }
}
