package org.redward.cosmology.internal;

import java.util.Locale;
import java.util.SplittableRandom;

import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.DistanceColumns;

/**
 * Speed and accuracy of the cosmology calculator, printed (never asserted). Goals: at least
 * 1,000,000 comoving-distance evaluations per second on one core at 1e-8 relative accuracy
 * (accuracy measured against the closed forms of Einstein-de Sitter, de Sitter and Milne in the
 * same run), and a 1,000,000-row catalogue converted (every quantity) in under 2 seconds.
 *
 * <p>Run: {@code mvn -B verify -Pbenchmarks} (every benchmark), or this class's {@code main}.
 */
public final class CosmologyBenchmark {

    /** Run by {@code mvn -B verify -Pbenchmarks}. */
    @org.junit.jupiter.api.Test
    void run() {
        main(new String[0]);
    }

    /** Runs {@link #main} under {@code mvn -B verify -Pbenchmarks} (surefire runs only *Benchmark classes there). */
    @org.junit.jupiter.api.Test
    void benchmark() throws Exception {
        main(new String[0]);
    }

    public static void main(String[] args) {
        int n = 1_000_000;
        SplittableRandom rnd = new SplittableRandom(42);
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = i % 10 == 0 ? Math.pow(10, -9 + 8 * rnd.nextDouble()) : rnd.nextDouble() * 5.0;
        }
        double c = CosmologyParameters.SPEED_OF_LIGHT_KM_PER_S;
        Cosmology eds = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(1).flat().build());
        Cosmology desitter = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0).flat().build());
        Cosmology milne = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0).omegaDarkEnergy(0).build());
        double worst = 0;
        for (int i = 0; i < 200_000; i++) {
            double zi = z[i];
            double dh = c / 70;
            worst = Math.max(worst, Math.abs(eds.comovingDistanceMpc(zi) / (2 * dh * zi / (Math.sqrt(1 + zi) * (1 + Math.sqrt(1 + zi)))) - 1));
            worst = Math.max(worst, Math.abs(desitter.comovingDistanceMpc(zi) / (dh * zi) - 1));
            worst = Math.max(worst, Math.abs(milne.comovingDistanceMpc(zi) / (dh * Math.log1p(zi)) - 1));
        }
        System.out.printf(Locale.ROOT, "BENCHMARK cosmology: accuracy: max relative error of D_C against EdS, de Sitter and Milne closed forms, 1e-9 < z < 5 (1 in 10 drawn log-uniform below 0.1): %.2e%n", worst);

        Cosmology lcdm = new FlrwCosmology(CosmologyParameters.builder().h0(70).omegaMatter(0.3).flat().build());
        Cosmology planck = new FlrwCosmology(NamedSets.PLANCK2018);
        for (Cosmology cos : new Cosmology[] {lcdm, planck}) {
            String name = cos == lcdm ? "flat LCDM, no radiation" : "planck2018 (radiation, 0.06 eV neutrino)";
            double best = Double.MAX_VALUE;
            double sink = 0;
            for (int rep = 0; rep < 5; rep++) {
                long t0 = System.nanoTime();
                for (int i = 0; i < n; i++) {
                    sink += cos.comovingDistanceMpc(z[i]);
                }
                best = Math.min(best, (System.nanoTime() - t0) / 1e9);
            }
            System.out.printf(Locale.ROOT, "BENCHMARK cosmology: comoving distance, %s: %.2f million evaluations/s on one thread (best of 5; checksum %.6e)%n",
                    name, n / best / 1e6, sink);
        }
        for (Cosmology cos : new Cosmology[] {lcdm, planck}) {
            String name = cos == lcdm ? "flat LCDM, no radiation" : "planck2018 (radiation, 0.06 eV neutrino)";
            double best = Double.MAX_VALUE;
            long rows = 0;
            for (int rep = 0; rep < 3; rep++) {
                long t0 = System.nanoTime();
                DistanceColumns cols = cos.distances(z);
                best = Math.min(best, (System.nanoTime() - t0) / 1e9);
                rows = cols.size();
            }
            System.out.printf(Locale.ROOT, "BENCHMARK cosmology: catalogue of %,d rows, every quantity (%d columns), %s: %.3f s (best of 3)%n",
                    rows, org.redward.api.cosmology.Quantity.values().length, name, best);
        }
        long t0 = 0;
        for (int i = 0; i < 6000; i++) {
            if (i == 5000) {
                t0 = System.nanoTime();
            }
            new FlrwCosmology(CosmologyParameters.builder().h0(60 + i * 0.001).omegaMatter(0.3).flat().cmbTemperatureK(2.7255).build());
        }
        System.out.printf(Locale.ROOT, "BENCHMARK cosmology: building parameters and a cosmology (table of the integrals), warm: %.1f us each%n",
                (System.nanoTime() - t0) / 1e3 / 1000);
    }
}
