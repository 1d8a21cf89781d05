package org.redward.formats.text.internal;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.osgi.service.component.annotations.Component;
import org.redward.api.formats.SpectrumWriter;
import org.redward.api.registry.Provided;
import org.redward.spectrum.Spectrum;

/**
 * Writes spectra to CSV, streaming: a row per pixel with columns spectrum, wavelength in vacuum
 * Angstrom, flux, inverse variance and mask (0/1); each spectrum's metadata in
 * {@code # [n] key: value} comment lines before its rows ({@link CommentMetadata}). Numbers are
 * written in Java's shortest round-trip form, so reading back with {@link TextReader} is exact.
 */
@Component(property = {Provided.ID + "=csv", Provided.DESCRIPTION + "=spectra to CSV, a row per pixel, metadata in comments",
        SpectrumWriter.EXTENSIONS + "=.csv"})
public final class CsvWriter implements SpectrumWriter {

    static final String[] HEADER = {"spectrum", "wavelength_vacuum_angstrom", "flux", "ivar", "mask"};

    @Override
    public List<String> extensions() {
        return List.of(".csv");
    }

    @Override
    public Sink open(Path file) throws IOException {
        BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
        CSVPrinter out = CSVFormat.DEFAULT.builder().setCommentMarker('#').setRecordSeparator('\n').get().print(w);
        out.printComment("spectra written by Redward: a row per pixel, wavelength in vacuum Angstrom, mask 1 = bad pixel");
        out.printRecord((Object[]) HEADER);
        return new Sink() {
            private int n;

            @Override
            public void write(Spectrum s) throws IOException {
                String key = Integer.toString(n++);
                for (String c : CommentMetadata.lines(key, s.metadata(), s.fluxUnit(), s.hasErrors())) {
                    out.printComment(c);
                }
                for (int i = 0; i < s.size(); i++) {
                    out.printRecord(key, Double.toString(s.axis().vacuumAngstrom(i)), Double.toString(s.flux(i)),
                            Double.toString(s.inverseVariance(i)), s.masked(i) ? "1" : "0");
                }
            }

            @Override
            public void close() throws IOException {
                out.close(true);
            }
        };
    }
}
