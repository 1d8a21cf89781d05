package org.redward.api.frames;

/**
 * The three conventions that turn a redshift into a velocity (FITS Standard 4.0 section 8.4;
 * Greisen et al. 2006, A&amp;A 446, 747): optical {@code v = cz}, radio {@code v = cz/(1+z)}, and
 * relativistic {@code v = c((1+z)^2 - 1)/((1+z)^2 + 1)} (line-of-sight special relativity).
 * Only the relativistic one is a physical speed; none is a cosmological recession velocity
 * beyond z of a few hundredths. Stateless and thread-safe; NaN in, NaN out.
 */
public enum VelocityConvention {
    /** v = c z (FITS VOPT / ZOPT). */
    OPTICAL {
        @Override
        public double velocityKmPerS(double z) {
            return Redshifts.SPEED_OF_LIGHT_KM_PER_S * z;
        }

        @Override
        public double redshift(double velocityKmPerS) {
            return velocityKmPerS / Redshifts.SPEED_OF_LIGHT_KM_PER_S;
        }
    },
    /** v = c z/(1+z) = c(nu0 - nu)/nu0 (FITS VRAD). */
    RADIO {
        @Override
        public double velocityKmPerS(double z) {
            return Redshifts.SPEED_OF_LIGHT_KM_PER_S * z / (1.0 + z);
        }

        @Override
        public double redshift(double velocityKmPerS) {
            double b = velocityKmPerS / Redshifts.SPEED_OF_LIGHT_KM_PER_S;
            return b / (1.0 - b);
        }
    },
    /** 1 + z = sqrt((1 + beta)/(1 - beta)) (FITS VELO, relativistic Doppler along the line of sight). */
    RELATIVISTIC {
        @Override
        public double velocityKmPerS(double z) {
            double s = (1.0 + z) * (1.0 + z);
            return Redshifts.SPEED_OF_LIGHT_KM_PER_S * (s - 1.0) / (s + 1.0);
        }

        @Override
        public double redshift(double velocityKmPerS) {
            double b = velocityKmPerS / Redshifts.SPEED_OF_LIGHT_KM_PER_S;
            return Math.sqrt((1.0 + b) / (1.0 - b)) - 1.0;
        }
    };

    /** The velocity (km/s) that this convention gives for redshift z. */
    public abstract double velocityKmPerS(double z);

    /** The redshift for a velocity (km/s) in this convention; NaN outside its domain. */
    public abstract double redshift(double velocityKmPerS);
}
