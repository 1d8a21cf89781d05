package org.redward.survey.internal;

import java.util.List;

import org.redward.api.catalog.Column;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/**
 * Adds the derived columns of a row from its measured z: velocities in the chosen frame,
 * distances under the chosen cosmology, with their uncertainties and the warnings that go with
 * them (e.g. a Hubble-law distance at high z). Thread-safe.
 */
interface Enricher {

    /** The columns it fills, in catalogue order. */
    List<Column> columns();

    /** Fills the derived columns for a measured redshift. Must not throw for any finite z. */
    void enrich(Spectrum spectrum, double z, double zErr, MeasuredRow.Builder row);

    /** Adds nothing. */
    Enricher NONE = new Enricher() {
        @Override
        public List<Column> columns() {
            return List.of();
        }

        @Override
        public void enrich(Spectrum spectrum, double z, double zErr, MeasuredRow.Builder row) {
        }
    };
}
