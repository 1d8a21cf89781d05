package org.redward.survey.internal;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.survey.MeasureListener;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasureSummary;
import org.redward.api.survey.MeasuredRow;
import org.redward.example.estimator.internal.BrightestLineEstimator;
import org.redward.spectrum.Medium;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

/**
 * Speed and memory of the measuring pipeline on invented mock spectra (4,000 pixels, log-lambda,
 * one emission line on a noisy continuum), streamed from a generator (never held in memory),
 * journalled, and written to a catalogue that streams the journal back. Prints spectra per
 * second with 1 and 2 threads (the speed-up; goal at least 1.8 on 2 cores) and the peak heap
 * (goal under 1 GiB, flat in the number of spectra: the run is repeated with a tenth of the
 * spectra to show it). Asserts nothing about time.
 *
 * <p>Estimator: the example estimator bundle's algorithm (a running median and a peak search,
 * some milliseconds a spectrum), standing in for the default estimator until it is in the
 * reactor; set {@code -Dredward.benchmark.spectra=N} (default 100000).
 * Run with {@code mvn -B verify -Pbenchmarks -pl bundles/org.redward.survey -am}.
 */
class MeasureBenchmark {

    static final int PIXELS = 4000;

    @Test
    void measureThroughput() throws Exception {
        int n = Integer.getInteger("redward.benchmark.spectra", 100_000);
        Path dir = Files.createTempDirectory("redward-bench");
        run(dir, Math.max(100, n / 50), 2, "warm-up");
        Result one = run(dir, n, 1, "1 thread");
        Result two = run(dir, n, 2, "2 threads");
        Result small = run(dir, Math.max(100, n / 10), 2, "2 threads, a tenth");
        System.out.printf(Locale.ROOT, "BENCHMARK measure  speed-up 1 -> 2 threads: %.2f (goal >= 1.8; %d cores available)%n",
                two.rate / one.rate, Runtime.getRuntime().availableProcessors());
        System.out.printf(Locale.ROOT, "BENCHMARK measure  peak heap %d spectra: %.0f MiB; %d spectra: %.0f MiB (goal < 1024 MiB, flat)%n",
                n, two.peakMiB, Math.max(100, n / 10), small.peakMiB);
    }

    record Result(double rate, double peakMiB) {
    }

    private static Result run(Path dir, int n, int threads, String label) throws IOException, InterruptedException {
        System.gc();
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                p.resetPeakUsage();
            }
        }
        Path out = dir.resolve("bench-" + threads + "-" + n + ".cat");
        Files.deleteIfExists(out);
        BrightestLineEstimator est = new BrightestLineEstimator();
        Estimation estimation = new Estimation() {
            @Override
            public void measure(Spectrum s, MeasuredRow.Builder row) {
                RedshiftSolution sol = est.estimate(s, EstimationContext.defaults());
                EstimatorEstimation.copy(sol, row);
            }

            @Override
            public String id() {
                return "example-brightest-line";
            }

            @Override
            public String bundle() {
                return "org.redward.example.estimator";
            }
        };
        SurveyRun run = new SurveyRun(MeasureRequest.of(List.of()).withOutput(out).withThreads(threads), estimation,
                mock(dir, n), Optional.of(new CountingWriter()), List.of(), Map.of("benchmark", label));
        long t0 = System.nanoTime();
        MeasureSummary s = run.run(MeasureListener.none());
        double seconds = (System.nanoTime() - t0) * 1e-9;
        long peak = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                peak += p.getPeakUsage().getUsed();
            }
        }
        double rate = n / seconds;
        System.out.printf(Locale.ROOT, "BENCHMARK measure  %-20s %7d spectra in %7.1f s: %7.1f spectra/s  (ok %d, failed %d; peak heap <= %.0f MiB)%n",
                label, n, seconds, rate, s.ok(), s.failed(), peak / 1048576.0);
        Files.deleteIfExists(out);
        return new Result(rate, peak / 1048576.0);
    }

    /** Invented mock spectra, generated on the fly: z uniform in [0, 0.35], H-alpha on a noisy flat continuum. */
    static Feed.Source mock(Path dir, int n) {
        Path file = dir.resolve("mock-survey.fits");
        return new Feed.Source() {
            @Override
            public List<Path> expand(List<Path> inputs) {
                return List.of(file);
            }

            @Override
            public Feed open(List<Path> inputs) {
                return new Feed() {
                    int i;

                    @Override
                    public SpectrumRecord next() {
                        if (i >= n) {
                            return null;
                        }
                        int k = i++;
                        return SpectrumRecord.ok(file, k, "row " + k, spectrum(k));
                    }

                    @Override
                    public void close() {
                    }
                };
            }
        };
    }

    static Spectrum spectrum(int k) {
        Random r = new Random(k);
        double z = 0.35 * r.nextDouble();
        double[] flux = new double[PIXELS];
        double[] ivar = new double[PIXELS];
        boolean[] mask = new boolean[PIXELS];
        double log0 = Math.log10(3600);
        double step = 1e-4;
        double line = 6564.614 * (1 + z);
        for (int i = 0; i < PIXELS; i++) {
            double lam = Math.pow(10, log0 + i * step);
            double g = (lam - line) / (2.5 * (1 + z));
            flux[i] = 1.0 + 8.0 * Math.exp(-0.5 * g * g) + 0.1 * r.nextGaussian();
            ivar[i] = 100.0;
        }
        return Spectrum.of(SpectralAxis.logLinear(log0, step, PIXELS, Medium.VACUUM), flux, ivar, mask,
                "1e-17 erg/s/cm2/A", SpectrumMetadata.builder().objectId("MOCK-" + k).build());
    }

    /** Streams every row of the catalogue and counts them (the cost of writing without the disk). */
    static final class CountingWriter implements CatalogWriter {
        @Override
        public void write(Catalog catalog, Path file) throws IOException {
            long rows = 0;
            for (Object[] row : catalog.tables().get(0).rows()) {
                rows += row.length > 0 ? 1 : 0;
            }
            Files.writeString(file, Long.toString(rows));
        }
    }
}
