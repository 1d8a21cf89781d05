package org.redward.cosmology.internal;

import org.osgi.service.component.annotations.Component;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.CosmologySet;
import org.redward.api.registry.Provided;

/** The Einstein-de Sitter model (Omega_m = 1). */
@Component(property = {Provided.ID + "=" + NamedSets.EDS_ID,
        Provided.DESCRIPTION + "=Einstein-de Sitter: Omega_m = 1, no dark energy, H0 = 70 by convention"})
public final class EinsteinDeSitterSet implements CosmologySet {
    @Override
    public CosmologyParameters parameters() {
        return NamedSets.EDS;
    }
}
