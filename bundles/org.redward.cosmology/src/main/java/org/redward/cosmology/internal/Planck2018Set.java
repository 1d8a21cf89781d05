package org.redward.cosmology.internal;

import org.osgi.service.component.annotations.Component;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.CosmologySet;
import org.redward.api.registry.Provided;

/** The Planck 2018 parameter set (early universe, H0 = 67.66). */
@Component(property = {Provided.ID + "=" + NamedSets.PLANCK2018_ID,
        Provided.DESCRIPTION + "=Planck 2018 (A&A 641, A6, Table 2, TT,TE,EE+lowE+lensing+BAO): H0 = 67.66, flat LCDM"})
public final class Planck2018Set implements CosmologySet {
    @Override
    public CosmologyParameters parameters() {
        return NamedSets.PLANCK2018;
    }
}
