package org.redward.mock.internal;

import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.templates.TemplateRegistry;

/**
 * The services a demo or benchmark run uses, as found when the command started; the optional
 * ones are null when no bundle provides them (the run then says which step is not available).
 */
record Services(ReaderRegistry readers, SpectrumInputs inputs, EstimatorRegistry estimators, TemplateRegistry templates) {
}
