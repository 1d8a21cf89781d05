package org.redward.testkit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.Medium;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.testkit.SyntheticSpectra.Kind;

/**
 * The conformance kit every redshift estimator runs (ours and third parties'): extend it, return
 * your estimator (and the template set it needs) and run it with JUnit 5. It checks
 *
 * <ul>
 * <li>known redshifts of synthetic spectra across classes ({@link SyntheticSpectra}: emission-
 * and absorption-line galaxies, a broad-line quasar, a hot star), within
 * {@link #toleranceKmPerS(Kind)}, and the class when {@link #classifies()};</li>
 * <li>bad input: no usable pixels, all NaN, a spectrum outside every template's coverage, pure
 * noise, a template set with gaps: a failed status with a reason or a low grade, never an
 * exception and never a confident wrong answer (reliability 0.8 or more);</li>
 * <li>determinism (same input, same output) and thread safety (4 threads give the serial
 * results);</li>
 * <li>provenance keys and a consistent alternatives list.</li>
 * </ul>
 */
public abstract class RedshiftEstimatorContractTest {

    /** The estimator under test (a new or shared instance). */
    protected abstract RedshiftEstimator estimator();

    /** The template set to give it, or null when it uses none. */
    protected abstract TemplateSet templates();

    /** Whether the estimator assigns classes (galaxy, quasar, star). */
    protected boolean classifies() {
        return true;
    }

    /** Tolerance of the known-redshift checks: 300 km/s, 1,000 for quasars, 100 for stars (the project's realdata tolerances). */
    protected double toleranceKmPerS(Kind kind) {
        return switch (kind) {
            case QUASAR -> 1000;
            case STAR -> 100;
            default -> 300;
        };
    }

    protected EstimationContext context() {
        TemplateSet t = templates();
        return t == null ? EstimationContext.defaults() : EstimationContext.defaults().withTemplates(t);
    }

    /** The known-redshift cases: kind, z, S/N per pixel. */
    protected static Stream<Arguments> knownRedshifts() {
        return Stream.of(
                Arguments.of(Kind.EMISSION_GALAXY, 0.05, 10.0),
                Arguments.of(Kind.EMISSION_GALAXY, 0.35, 10.0),
                Arguments.of(Kind.ABSORPTION_GALAXY, 0.08, 20.0),
                Arguments.of(Kind.ABSORPTION_GALAXY, 0.45, 20.0),
                Arguments.of(Kind.QUASAR, 1.2, 15.0),
                Arguments.of(Kind.QUASAR, 2.4, 15.0),
                Arguments.of(Kind.STAR, 0.0002, 30.0));
    }

    @ParameterizedTest(name = "{0} at z={1}")
    @MethodSource("knownRedshifts")
    void findsKnownRedshifts(Kind kind, double z, double snr) {
        RedshiftSolution s = estimator().estimate(SyntheticSpectra.of(kind, z, snr, 42), context());
        assertTrue(s.ok(), () -> kind + " at z=" + z + " failed: " + s.error());
        double dv = Math.abs(s.z() - z) / (1 + z) * 299_792.458;
        assertTrue(dv <= toleranceKmPerS(kind), () -> String.format(Locale.ROOT, "%s at z=%.4f: got z=%.5f (%.0f km/s off)", kind, z, s.z(), dv));
        if (classifies()) {
            ObjectClass expected = switch (kind) {
                case QUASAR -> ObjectClass.QUASAR;
                case STAR -> ObjectClass.STAR;
                default -> ObjectClass.GALAXY;
            };
            assertEquals(expected, s.objectClass(), () -> kind + " at z=" + z + ": class");
        }
        assertTrue(Double.isFinite(s.zError()) && s.zError() > 0, "a positive finite z error");
        assertFalse(s.alternatives().isEmpty(), "alternatives start with the adopted solution");
        assertEquals(s.z(), s.alternatives().get(0).z(), 1e-12, "first alternative is the adopted one");
        assertTrue(s.provenance().containsKey("estimator") && s.provenance().containsKey("estimator_bundle")
                && s.provenance().containsKey("estimator_version"), "provenance names the estimator: " + s.provenance());
        if (templates() != null) {
            assertEquals(templates().checksum(), s.provenance().get("template_set_checksum"), "provenance names the template set");
        }
    }

    @Test
    void noUsablePixelsFailsWithAReason() {
        Spectrum good = SyntheticSpectra.emissionGalaxy(0.1, 10, 1);
        boolean[] mask = new boolean[good.size()];
        Arrays.fill(mask, true);
        Spectrum s = Spectrum.of(good.axis(), good.flux(), good.inverseVariance(), mask, "", null);
        assertFailedOrLow(estimator().estimate(s, context()), "all pixels masked");
    }

    @Test
    void allNaNFailsWithAReason() {
        Spectrum good = SyntheticSpectra.emissionGalaxy(0.1, 10, 1);
        double[] f = new double[good.size()];
        Arrays.fill(f, Double.NaN);
        Spectrum s = Spectrum.of(good.axis(), f, null, null, "", null);
        assertFailedOrLow(estimator().estimate(s, context()), "all-NaN flux");
    }

    @Test
    void outsideEveryTemplateIsNotConfident() {
        double[] w = SyntheticSpectra.grid(60000, 70000);
        double[] f = new double[w.length];
        Arrays.fill(f, 1);
        for (int i = 0; i < w.length; i += 50) {
            f[i] += 3;
        }
        Spectrum s = Spectrum.of(SpectralAxis.of(w, SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.LOG_LINEAR), f, null, null, "", null);
        assertFailedOrLow(estimator().estimate(s, context().withRedshiftRange(0, 0.5)), "spectrum at 6-7 microns, z < 0.5");
    }

    @Test
    void pureNoiseIsNotConfident() {
        double[] w = SyntheticSpectra.grid(3800, 9200);
        java.util.Random rnd = new java.util.Random(7);
        double[] f = new double[w.length];
        double[] iv = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            f[i] = 1 + 0.1 * rnd.nextGaussian();
            iv[i] = 100;
        }
        Spectrum s = Spectrum.of(SpectralAxis.of(w, SpectralUnit.ANGSTROM, Medium.VACUUM, Sampling.LOG_LINEAR), f, iv, null, "", null);
        RedshiftSolution sol = estimator().estimate(s, context());
        assertTrue(!sol.ok() || !(sol.reliability() >= 0.8), "pure noise must not get a confident redshift: " + sol);
    }

    @Test
    void templateSetWithGapsDoesNotThrow() {
        if (templates() == null) {
            return;
        }
        List<Template> gappy = new ArrayList<>();
        for (Template t : templates().templates()) {
            double[] w = t.restVacuumAngstrom();
            double[] f = t.flux();
            for (int i = 0; i < w.length; i++) {
                if (w[i] > 4500 && w[i] < 6000 || w[i] < 3000) {
                    f[i] = 0;
                }
            }
            gappy.add(Template.of(t.id(), t.objectClass(), t.subclass(), w, f));
        }
        TemplateSet set = new SimpleTemplateSet("gappy", gappy);
        RedshiftSolution s = estimator().estimate(SyntheticSpectra.emissionGalaxy(0.1, 10, 3), context().withTemplates(set));
        assertTrue(!s.ok() || Double.isFinite(s.z()), "a solution or a failure, never an exception: " + s);
        RedshiftSolution empty = estimator().estimate(SyntheticSpectra.emissionGalaxy(0.1, 10, 3),
                context().withTemplates(new SimpleTemplateSet("empty", List.of())));
        assertFailedOrLow(empty, "an empty template set");
    }

    @Test
    void deterministic() {
        Spectrum s = SyntheticSpectra.absorptionGalaxy(0.2, 8, 11);
        RedshiftSolution a = estimator().estimate(s, context());
        RedshiftSolution b = estimator().estimate(s, context());
        assertEquals(a.toString(), b.toString());
        assertEquals(a.alternatives(), b.alternatives());
        assertEquals(a.diagnostics(), b.diagnostics());
    }

    @Test
    void threadSafe() throws Exception {
        List<Spectrum> inputs = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            Kind k = Kind.values()[i % Kind.values().length];
            double z = k == Kind.STAR ? 0.0001 : k == Kind.QUASAR ? 1.5 + 0.1 * i : 0.05 + 0.03 * i;
            inputs.add(SyntheticSpectra.of(k, z, 12, 100 + i));
        }
        List<String> serial = new ArrayList<>();
        for (Spectrum s : inputs) {
            serial.add(estimator().estimate(s, context()).toString());
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<String>> futures = new ArrayList<>();
            for (int rep = 0; rep < 2; rep++) {
                for (Spectrum s : inputs) {
                    futures.add(pool.submit(() -> estimator().estimate(s, context()).toString()));
                }
            }
            for (int i = 0; i < futures.size(); i++) {
                assertEquals(serial.get(i % inputs.size()), futures.get(i).get(), "parallel result " + i);
            }
        } finally {
            pool.shutdownNow();
        }
    }

    private static void assertFailedOrLow(RedshiftSolution s, String what) {
        if (s.ok()) {
            assertTrue(!(s.reliability() >= 0.8), what + ": an OK solution must carry a low grade, got " + s);
        } else {
            assertFalse(s.error().isBlank(), what + ": a failed solution needs a reason");
        }
    }
}
