package org.redward.survey.internal;

import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Set;

import org.redward.api.catalog.Column;
import org.redward.api.survey.MeasuredLine;
import org.redward.api.survey.MeasuredRow;

/**
 * The columns of the catalogue's second table, {@value #TABLE}: one row per measured line, keyed
 * back to the main table by the spectrum's {@code sequence} and {@code id}. Units are IVOA VOUnits
 * strings; UCDs are IVOA UCD1+ words (from memory of the UCD1+ list: {@code spect.line},
 * {@code em.wl}, {@code em.wl.central}, {@code spect.dopplerVeloc}, {@code phot.flux},
 * {@code spect.line.eqWidth}, {@code spect.line.width}, {@code stat.snr}, {@code meta.code}).
 */
final class LineLayout {

    /** The table's name (FITS EXTNAME {@code LINES}, the VOTable TABLE name, the sibling file's infix). */
    static final String TABLE = "lines";
    static final String DESCRIPTION = "one row per measured line: observed centre, identification at the catalogue z,"
            + " flux, rest-frame equivalent width, FWHM, S/N";

    private final List<Column> columns;

    /**
     * @param fluxUnits the line-flux units of the run (as {@link MeasuredLine#fluxUnit()}): when the
     *     run has exactly one, the {@code flux} columns carry it; otherwise each row's
     *     {@code flux_unit} says it
     */
    LineLayout(Set<String> fluxUnits) {
        String unit = fluxUnits.size() == 1 ? fluxUnits.iterator().next() : "";
        String fluxNote = unit.isEmpty() ? " (unit in flux_unit: the spectrum's flux-density unit times Angstrom)" : "";
        columns = List.of(
                Column.ofLong("sequence", "meta.number", "0-based position of the spectrum in the run: the sequence column of the main table"),
                Column.ofString("id", "meta.id", "object id of the spectrum (as in the main table)"),
                Column.ofString("line", "meta.id;spect.line", "identification at the catalogue z (empty: unidentified)"),
                Column.ofDouble("rest_wavelength_angstrom", "Angstrom", "em.wl;spect.line",
                        "rest vacuum wavelength of the identification (empty: unidentified)"),
                Column.ofDouble("observed_wavelength_angstrom", "Angstrom", "em.wl.central", "observed vacuum centre of the Gaussian fit"),
                Column.ofDouble("observed_wavelength_err_angstrom", "Angstrom", "stat.error;em.wl.central", "1-sigma error of the observed centre"),
                Column.ofDouble("velocity_offset_km_s", "km/s", "spect.dopplerVeloc",
                        "velocity of the line relative to the catalogue z: c (z_line - z) / (1 + z)"),
                Column.ofDouble("flux", unit, "phot.flux;spect.line", "integrated line flux, negative for absorption" + fluxNote),
                Column.ofDouble("flux_err", unit, "stat.error;phot.flux", "1-sigma error of the flux"),
                Column.ofString("flux_unit", "meta.unit", "unit of flux and flux_err"),
                Column.ofDouble("ew_rest_angstrom", "Angstrom", "spect.line.eqWidth",
                        "rest-frame equivalent width (observed / (1 + z)): positive for emission, negative for absorption"),
                Column.ofDouble("ew_rest_err_angstrom", "Angstrom", "stat.error;spect.line.eqWidth",
                        "1-sigma error of the rest-frame equivalent width (continuum error not included)"),
                Column.ofDouble("fwhm_km_s", "km/s", "spect.line.width", "full width at half maximum, not corrected for the instrument's resolution"),
                Column.ofDouble("fwhm_err_km_s", "km/s", "stat.error;spect.line.width", "1-sigma error of the FWHM"),
                Column.ofDouble("snr", "", "stat.snr", "signal-to-noise ratio of the fitted flux"),
                Column.ofString("kind", "meta.code", "emission or absorption"),
                Column.ofBoolean("blended", "meta.code", "true if fitted together with neighbouring lines"));
    }

    List<Column> columns() {
        return columns;
    }

    static Object[] toCells(MeasuredRow r, MeasuredLine l) {
        return new Object[] {r.sequence(), r.id(), l.name(), l.restAngstrom(), l.observedAngstrom(), l.observedErrorAngstrom(),
            l.offsetKmPerS(), l.flux(), l.fluxError(), l.fluxUnit(), l.restEquivalentWidthAngstrom(),
            l.restEquivalentWidthErrorAngstrom(), l.fwhmKmPerS(), l.fwhmErrorKmPerS(), l.snr(), l.kind().key(), l.blended()};
    }

    /** The cells of every line of the rows, in row order (streams: one row's lines at a time). */
    Iterable<Object[]> cells(Iterable<MeasuredRow> rows) {
        return () -> new Iterator<>() {
            private final Iterator<MeasuredRow> it = rows.iterator();
            private MeasuredRow row;
            private int next;

            @Override
            public boolean hasNext() {
                while ((row == null || next >= row.lines().size()) && it.hasNext()) {
                    row = it.next();
                    next = 0;
                }
                return row != null && next < row.lines().size();
            }

            @Override
            public Object[] next() {
                if (!hasNext()) {
                    throw new NoSuchElementException();
                }
                return toCells(row, row.lines().get(next++));
            }
        };
    }
}
