package org.redward.cosmology.internal;

import org.osgi.service.component.annotations.Component;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.CosmologySet;
import org.redward.api.registry.Provided;

/** The local distance-ladder parameter set (H0 = 73.04, Riess et al. 2022). */
@Component(property = {Provided.ID + "=" + NamedSets.LADDER2022_ID,
        Provided.DESCRIPTION + "=local distance ladder (Riess et al. 2022): H0 = 73.04, Omega_m of planck2018, flat LCDM"})
public final class Ladder2022Set implements CosmologySet {
    @Override
    public CosmologyParameters parameters() {
        return NamedSets.LADDER2022;
    }
}
