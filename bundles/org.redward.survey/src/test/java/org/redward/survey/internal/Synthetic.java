package org.redward.survey.internal;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.api.formats.SpectrumRecord;
import org.redward.api.redshift.Alternative;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Medium;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/**
 * Test fixtures: small synthetic spectra (invented, for the pipeline's mechanics only) in
 * invented files, and a cheap deterministic estimator that reads the redshift back from where the
 * fixture planted it (a single emission spike on a flat continuum).
 */
final class Synthetic {

    static final double REST_ANGSTROM = 5000.0;

    private Synthetic() {
    }

    /** Spectrum number {@code n}: a spike at 5000 (1 + z) Angstrom, z = (n mod 997) / 1000. */
    static Spectrum spectrum(int n) {
        int pixels = 200;
        double z = (n % 997) / 1000.0;
        double[] flux = new double[pixels];
        double[] ivar = new double[pixels];
        boolean[] mask = new boolean[pixels];
        SpectralAxis axis = SpectralAxis.linear(4000, 30, pixels, SpectralUnit.ANGSTROM, Medium.VACUUM);
        int spike = (int) Math.round((REST_ANGSTROM * (1 + z) - 4000) / 30);
        for (int i = 0; i < pixels; i++) {
            flux[i] = 1.0;
            ivar[i] = 100.0;
        }
        if (spike >= 0 && spike < pixels) {
            flux[spike] = 10.0;
        }
        SpectrumMetadata md = SpectrumMetadata.builder().objectId(String.format(Locale.ROOT, "OBJ-%06d", n))
                .skyPosition(150.0 + n * 1e-4, 2.0 - n * 1e-4).build();
        return Spectrum.of(axis, flux, ivar, mask, "1e-17 erg/s/cm2/A", md);
    }

    /** A source of {@code files} invented files of {@code perFile} spectra each; every 50th spectrum is unreadable. */
    static Feed.Source source(List<Path> files, int perFile) {
        return source(files, perFile, Synthetic::spectrum);
    }

    /** As {@link #source(List, int)}, spectrum number k made by {@code make}. */
    static Feed.Source source(List<Path> files, int perFile, java.util.function.IntFunction<Spectrum> make) {
        return new Feed.Source() {
            @Override
            public List<Path> expand(List<Path> inputs) {
                return files;
            }

            @Override
            public Feed open(List<Path> inputs) {
                return new Feed() {
                    int n;

                    @Override
                    public SpectrumRecord next() {
                        if (n >= files.size() * perFile) {
                            return null;
                        }
                        int k = n++;
                        Path f = files.get(k / perFile);
                        int i = k % perFile;
                        if (k % 50 == 49) {
                            return SpectrumRecord.failed(f, i, "row " + i, f + ": row " + i + ": column FLUX holds no numbers");
                        }
                        return SpectrumRecord.ok(f, i, "row " + i, make.apply(k));
                    }

                    @Override
                    public void close() {
                    }
                };
            }
        };
    }

    static List<Path> files(Path dir, int count) {
        List<Path> out = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            out.add(dir.resolve(String.format(Locale.ROOT, "field-%03d.fits", i)));
        }
        return out;
    }

    /** Rest vacuum wavelengths (Angstrom) of the lines planted by {@link #lineSpectrum}: H-beta, [O III] 5008, H-alpha (as in the standard list). */
    static final double[] LINE_REST_ANGSTROM = {4862.683, 5008.240, 6564.614};

    /** The redshift planted in line spectrum number n. */
    static double lineZ(int n) {
        return 0.02 + (n % 97) * 0.002;
    }

    /**
     * Line spectrum number {@code n} (invented): a flat continuum of 1 with 0.05 noise-free errors on
     * a 2-Angstrom grid from 3800 to 9200 Angstrom, and Gaussian emission lines (sigma 3 Angstrom
     * observed) at {@link #LINE_REST_ANGSTROM} times 1 + {@link #lineZ}.
     */
    static Spectrum lineSpectrum(int n) {
        int pixels = 2700;
        double z = lineZ(n);
        SpectralAxis axis = SpectralAxis.linear(3800, 2, pixels, SpectralUnit.ANGSTROM, Medium.VACUUM);
        double[] flux = new double[pixels];
        double[] ivar = new double[pixels];
        double[] peak = {1.5, 4.0, 5.0};
        for (int i = 0; i < pixels; i++) {
            double w = 3800 + 2.0 * i;
            flux[i] = 1.0;
            for (int k = 0; k < LINE_REST_ANGSTROM.length; k++) {
                double d = (w - LINE_REST_ANGSTROM[k] * (1 + z)) / 3.0;
                flux[i] += peak[k] * Math.exp(-0.5 * d * d);
            }
            ivar[i] = 400.0;
        }
        SpectrumMetadata md = SpectrumMetadata.builder().objectId(String.format(Locale.ROOT, "LIN-%06d", n)).build();
        return Spectrum.of(axis, flux, ivar, new boolean[pixels], "1e-17 erg/s/cm2/Angstrom", md);
    }

    /** Gives the planted redshift of a line spectrum (read back from its id). */
    static final class PlantedEstimation implements Estimation {
        @Override
        public void measure(Spectrum s, MeasuredRow.Builder row) {
            int n = Integer.parseInt(s.metadata().objectId().orElseThrow().substring(4));
            row.z(lineZ(n), 1e-5).objectClass(ObjectClass.GALAXY.key(), "planted").grade("test", Double.NaN);
        }

        @Override
        public String id() {
            return "planted";
        }

        @Override
        public String bundle() {
            return "test.planted 1.0.0";
        }
    }

    /** The product's line step with the lines bundle's own finder, identifier and standard list (no framework). */
    static LineStep lineStep() {
        return new ServiceLineStep(
                org.redward.api.registry.Provided.of("matched-gauss", new org.redward.lines.internal.MatchedFilterFinder(),
                        "org.redward.lines", "test", "", java.util.Map.of()),
                org.redward.api.registry.Provided.of("pair-vote", new org.redward.lines.internal.PairVoteIdentifier(),
                        "org.redward.lines", "test", "", java.util.Map.of()),
                org.redward.lines.internal.LineListFile.standard(), id -> List.of());
    }

    /** Finds the spike and returns z = lambda / 5000 - 1. */
    static final class SpikeEstimation implements Estimation {
        @Override
        public void measure(Spectrum s, MeasuredRow.Builder row) {
            int best = 0;
            for (int i = 1; i < s.size(); i++) {
                if (s.flux(i) > s.flux(best)) {
                    best = i;
                }
            }
            double z = s.axis().vacuumAngstrom(best) / REST_ANGSTROM - 1;
            row.z(z, 30 / REST_ANGSTROM).objectClass(ObjectClass.GALAXY.key(), "spike").grade("test", Double.NaN)
                    .alternatives(List.of(new Alternative(z, 0.006, 9.0, 0, ObjectClass.GALAXY, "spike"),
                            new Alternative(z + 0.1, 0.006, 3.0, 6.0, ObjectClass.GALAXY, "spike")));
        }

        @Override
        public String id() {
            return "spike";
        }

        @Override
        public String bundle() {
            return "test.spike 1.0.0";
        }
    }
}
