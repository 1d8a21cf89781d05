package org.redward.redshift.kit;

import java.util.Map;

import org.redward.api.redshift.EstimationContext;
import org.redward.spectrum.ObjectClass;

/**
 * The redshift range searched for each class: the context's range intersected with what the
 * class allows. Defaults: galaxies 0.001 (cz = 300 km/s) to 1.6, quasars 0 to the context
 * maximum, stars |v| up to 1,200 km/s (|z| < 0.004: galactic stars move at a few hundred km/s at
 * most, common practice). The galaxy floor keeps a star's spectrum at rest from being taken for
 * a galaxy at z = 0 (a combination of galaxy templates can mimic a star); lower it with
 * {@code galaxy_z_min} for very nearby galaxies. Parameters {@code galaxy_z_min},
 * {@code galaxy_z_max}, {@code star_v_max_km_s} override the defaults.
 */
public final class SearchRanges {

    private SearchRanges() {
    }

    /** @return {zMin, zMax}; zMin >= zMax means the class is not searched */
    public static double[] of(ObjectClass c, EstimationContext ctx) {
        Map<String, String> p = ctx.parameters();
        double lo, hi;
        switch (c) {
            case STAR -> {
                double v = Params.number(p, "star_v_max_km_s", 1200.0);
                double z = v / 299_792.458;
                lo = -z;
                hi = z;
            }
            case QUASAR -> {
                lo = 0.0;
                hi = Double.POSITIVE_INFINITY;
            }
            default -> {
                lo = Params.number(p, "galaxy_z_min", 0.001);
                hi = Params.number(p, "galaxy_z_max", 1.6);
            }
        }
        return new double[] {Math.max(lo, ctx.zMin()), Math.min(hi, ctx.zMax())};
    }
}
