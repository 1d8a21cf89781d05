package org.redward.cosmology.internal;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.osgi.service.component.annotations.Component;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.registry.Provided;

/** The FLRW calculator service; keeps the last few cosmologies built (they are immutable). */
@Component(property = {Provided.ID + "=flrw",
        Provided.DESCRIPTION + "=FLRW distances and times (matter, dark energy w0-wa, curvature, radiation) by tabulated Gauss-Legendre quadrature"})
public final class Calculator implements CosmologyCalculator {

    private static final int CACHE = 64;
    private final Map<CosmologyParameters, Cosmology> cache = new ConcurrentHashMap<>();

    @Override
    public Cosmology of(CosmologyParameters parameters) {
        Cosmology c = cache.get(parameters);
        if (c == null) {
            c = new FlrwCosmology(parameters);
            if (cache.size() >= CACHE) {
                cache.clear();
            }
            cache.put(parameters, c);
        }
        return c;
    }
}
