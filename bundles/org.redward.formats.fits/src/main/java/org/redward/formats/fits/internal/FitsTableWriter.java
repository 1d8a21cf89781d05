package org.redward.formats.fits.internal;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.osgi.service.component.annotations.Component;
import org.redward.api.formats.SpectrumWriter;
import org.redward.api.registry.Provided;
import org.redward.spectrum.Spectrum;

import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.FitsException;
import nom.tam.fits.Header;
import nom.tam.fits.NullDataHDU;
import nom.tam.util.FitsOutputStream;

/**
 * Writes spectra to a FITS file, one binary table HDU per spectrum, streaming (see
 * {@link OwnFormat} for the layout). Doubles throughout, so the round trip through
 * {@link FitsReader} is exact. Thread-safe; each sink is for one thread.
 */
@Component(property = {Provided.ID + "=fits-table", Provided.DESCRIPTION + "=spectra to FITS, one binary table HDU per spectrum",
        SpectrumWriter.EXTENSIONS + "=.fits,.fit,.fts"})
public final class FitsTableWriter implements SpectrumWriter {

    @Override
    public List<String> extensions() {
        return List.of(".fits", ".fit", ".fts");
    }

    @Override
    public Sink open(Path file) throws IOException {
        FitsOutputStream out = new FitsOutputStream(new BufferedOutputStream(Files.newOutputStream(file), 1 << 16));
        try {
            NullDataHDU primary = new NullDataHDU();
            primary.getHeader().addValue(Layouts.OWN_LAYOUT_KEY, Layouts.OWN_LAYOUT, "one spectrum per binary table HDU");
            primary.getHeader().addValue("VACUUM", true, "wavelengths are in vacuum");
            primary.write(out);
        } catch (FitsException e) {
            out.close();
            throw new IOException(file + ": cannot write the primary header: " + e.getMessage(), e);
        }
        return new Sink() {
            @Override
            public void write(Spectrum s) throws IOException {
                int n = s.size();
                boolean[] mask = s.mask();
                byte[] m = new byte[n];
                for (int i = 0; i < n; i++) {
                    m[i] = (byte) (mask[i] ? 1 : 0);
                }
                try {
                    BinaryTable t = BinaryTable.fromColumnMajor(new Object[] {s.axis().vacuumAngstrom(), s.flux(),
                            s.inverseVariance(), m});
                    BinaryTableHDU hdu = t.toHDU();
                    Header h = hdu.getHeader();
                    String[] names = {"WAVELENGTH", "FLUX", "IVAR", "MASK"};
                    for (int i = 0; i < names.length; i++) {
                        hdu.setColumnName(i, names[i], null);
                    }
                    h.addValue("TUNIT1", "Angstrom", "vacuum wavelength");
                    if (!s.fluxUnit().isEmpty()) {
                        h.addValue("TUNIT2", s.fluxUnit(), "flux unit");
                    }
                    h.addValue("EXTNAME", "SPECTRUM", "one spectrum");
                    h.addValue("VACUUM", true, "wavelengths are in vacuum");
                    OwnFormat.writeMetadata(h, s.metadata(), s.hasErrors());
                    hdu.write(out);
                } catch (FitsException e) {
                    throw new IOException(file + ": cannot write spectrum: " + e.getMessage(), e);
                }
            }

            @Override
            public void close() throws IOException {
                out.close();
            }
        };
    }
}
