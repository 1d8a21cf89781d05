package org.redward.mock.internal;

import org.redward.api.catalog.CatalogWriterRegistry;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.frames.FrameCorrector;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.templates.TemplateRegistry;

/**
 * The services a demo or benchmark run uses, as found when the command started; the optional
 * ones are null when no bundle provides them (the run then says which step is not available).
 */
record Services(ReaderRegistry readers, SpectrumInputs inputs, EstimatorRegistry estimators, TemplateRegistry templates,
        FrameCorrector frames, CosmologyRegistry cosmologies, CosmologyCalculator calculator, CatalogWriterRegistry writers) {

    /** Only what reading and measuring need. */
    static Services forMeasuring(ReaderRegistry readers, SpectrumInputs inputs, EstimatorRegistry estimators, TemplateRegistry templates) {
        return new Services(readers, inputs, estimators, templates, null, null, null, null);
    }
}
