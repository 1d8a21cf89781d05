package org.redward.redshift.chisq.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.redward.api.redshift.EstimationContext;
import org.redward.api.templates.Template;
import org.redward.redshift.kit.FftCorrelator;
import org.redward.redshift.kit.GriddedSpectrum;
import org.redward.redshift.kit.GriddedTemplate;
import org.redward.spectrum.ObjectClass;
import org.redward.templates.standard.internal.StandardTemplateSet;
import org.redward.testkit.SyntheticSpectra;

/**
 * Speed of the chi-square scan (prints figures). One thread, CPU time of the thread (the machine is shared); both sides measured in this run.
 * A 4,000-pixel spectrum (3,800-9,200 A, step 1e-4 in log10 lambda), the 4 galaxy templates of
 * the standard set plus 3 Legendre terms, trial redshifts every 1e-4 in log10(1+z) for
 * 0 < z < 1.5 (3,980 trials): the FFT scan against the direct weighted least-squares solution
 * at every trial redshift (normal equations, Cholesky).
 */
public final class ChiSquareBenchmark {

    /** Runs {@link #main} under {@code mvn -B verify -Pbenchmarks} (surefire runs only *Benchmark classes there). */
    @org.junit.jupiter.api.Test
    void benchmark() throws Exception {
        main(new String[0]);
    }

    public static void main(String[] args) {
        FftCorrelator.singleThreaded();
        List<GriddedTemplate> galaxies = new ArrayList<>();
        for (Template t : new StandardTemplateSet().templates()) {
            if (t.objectClass() == ObjectClass.GALAXY) {
                galaxies.add(GriddedTemplate.of(t, 1e-4));
            }
        }
        BasisGroup g = new BasisGroup(ObjectClass.GALAXY, "galaxy", galaxies, galaxies.size());
        List<GriddedSpectrum> spectra = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            spectra.add(GriddedSpectrum.of(SyntheticSpectra.absorptionGalaxy(0.1 + 0.05 * i, 10, i), 1e-4, null));
        }
        int polyTerms = 3;
        long shiftLo = 0, shiftHi = (long) Math.floor(Math.log10(2.5) / 1e-4);
        GriddedSpectrum s0 = spectra.get(0);
        long offset = s0.startIndex - g.startIndex;
        int n = FftCorrelator.lengthFor(s0.size(), g.length, (int) (shiftLo - offset), (int) (shiftHi - offset));
        BasisGroup.Prepared prep = g.prepare(n);
        double sink = 0;
        for (int rep = 0; rep < 3; rep++) {
            for (GriddedSpectrum s : spectra) {
                sink += scan(s, g, prep, polyTerms, shiftLo, shiftHi, n);
            }
        }
        int count = 0;
        long t0 = cpuNanos();
        for (int rep = 0; rep < 5; rep++) {
            for (GriddedSpectrum s : spectra) {
                sink += scan(s, g, prep, polyTerms, shiftLo, shiftHi, n);
                count++;
            }
        }
        double fftMs = (cpuNanos() - t0) / 1e6 / count;
        // direct: least squares at every trial redshift
        for (long k = shiftLo; k <= shiftLo + 200; k++) {
            sink += ChiSquareScan.solveDirect(s0, g, polyTerms, k)[4 + polyTerms];
        }
        t0 = cpuNanos();
        int reps = 2;
        double maxDiff = 0;
        ChiSquareScan.Curve curve = ChiSquareScan.scan(s0, new ChiSquareScan.SpectrumSide(s0, polyTerms, n), g, prep, shiftLo, shiftHi, 0.5);
        for (int rep = 0; rep < reps; rep++) {
            for (long k = shiftLo; k <= shiftHi; k++) {
                double c = ChiSquareScan.solveDirect(s0, g, polyTerms, k)[4 + polyTerms];
                sink += c;
                double f = curve.chi2()[(int) (k - shiftLo)];
                if (Double.isFinite(f) && Double.isFinite(c)) {
                    maxDiff = Math.max(maxDiff, Math.abs(f - c) / Math.max(1, Math.abs(c)));
                }
            }
        }
        double directMs = (cpuNanos() - t0) / 1e6 / reps;
        System.out.println(String.format(Locale.ROOT,
                "chisq scan, %d px, 4 templates + %d polynomial terms, %d trial z (0<z<1.5, 1e-4 in log10(1+z)), FFT length %d:",
                s0.size(), polyTerms, shiftHi - shiftLo + 1, n));
        System.out.println(String.format(Locale.ROOT,
                "BENCHMARK chisq scan: FFT %.2f ms per spectrum per core (goal <= 20); direct least squares %.0f ms; ratio %.0fx"
                        + " (goal >= 30); max relative chi2 difference %.1e; thread CPU time, load average %.2f",
                fftMs, directMs, directMs / fftMs, maxDiff,
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage()));

        ChiSquareEstimator est = new ChiSquareEstimator();
        EstimationContext ctx = EstimationContext.defaults().withTemplates(new StandardTemplateSet());
        List<org.redward.spectrum.Spectrum> raw = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            raw.add(SyntheticSpectra.absorptionGalaxy(0.1 + 0.05 * i, 10, i));
        }
        for (org.redward.spectrum.Spectrum s : raw) {
            sink += est.estimate(s, ctx).z();
        }
        t0 = cpuNanos();
        for (int rep = 0; rep < 3; rep++) {
            for (org.redward.spectrum.Spectrum s : raw) {
                sink += est.estimate(s, ctx).z();
            }
        }
        double estMs = (cpuNanos() - t0) / 1e6 / (3 * raw.size());
        System.out.println(String.format(Locale.ROOT,
                "BENCHMARK chisq estimate() with the whole standard set (galaxies, quasars to z=4, 11 stars): %.1f ms per spectrum per core", estMs));
        System.out.println("(checksum " + (sink != 0) + ")");
    }

    /** CPU time of this thread (ns): robust to other processes sharing the cores; wall time is not. */
    private static long cpuNanos() {
        return java.lang.management.ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }

    private static double scan(GriddedSpectrum s, BasisGroup g, BasisGroup.Prepared prep, int polyTerms, long lo, long hi, int n) {
        ChiSquareScan.SpectrumSide side = new ChiSquareScan.SpectrumSide(s, polyTerms, n);
        return ChiSquareScan.scan(s, side, g, prep, lo, hi, 0.5).chi2()[5];
    }
}
