package org.redward.mock.internal;

import static org.redward.mock.internal.RestLines.*;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;
import java.util.random.RandomGenerator;

/**
 * Physical recipes for the spectra of the mock survey. They deliberately share nothing with the
 * default template set: continua are sums of Planck functions (galaxies, stars) or power laws
 * (quasars), lines are placed one by one with randomised strengths, ratios and widths, and dust
 * follows {@link Calzetti}.
 *
 * <p>Numbers that come from the literature (quoted from memory, approximate):
 * <ul>
 * <li>Case B Balmer ratios at 10^4 K: Halpha/Hbeta 2.86, Hgamma/Hbeta 0.468, Hdelta/Hbeta 0.259
 * (Osterbrock &amp; Ferland 2006, Table 4.4).</li>
 * <li>[O III] 5008/4960 = 2.98 and [N II] 6585/6550 = 2.94 (fixed by the transition
 * probabilities; Storey &amp; Zeippen 2000).</li>
 * <li>Quasar continuum slope alpha_nu about -0.44 and the rest equivalent widths of the broad
 * lines (Lyalpha ~ 90, C IV ~ 25, C III] ~ 20, Mg II ~ 30, Hbeta ~ 45, Halpha ~ 200 Angstrom), as
 * in composite quasar spectra (Vanden Berk et al. 2001, AJ 122, 549).</li>
 * <li>Effective Lyalpha-forest optical depth tau_eff = 0.0018 (1+z)^3.92 (Faucher-Giguere et al.
 * 2008, ApJ 681, 831).</li>
 * <li>Blueshift of C IV relative to systemic of a few hundred km/s (Richards et al. 2002,
 * AJ 124, 1).</li>
 * </ul>
 * Everything else (population mixes, EW ranges) is invented for the mock and common practice in
 * spirit. Stateless; thread-safe given one random generator per call.
 */
final class Recipes {

    private Recipes() {
    }

    /** A model and the physical parameters drawn for it (for the truth table). */
    record Built(Model model, Map<String, Double> parameters) {
    }

    // ---------------------------------------------------------------- continua

    /** Planck function B_lambda(T) up to a constant, lambda in Angstrom. */
    static double planck(double angstrom, double kelvin) {
        double x = 1.438776877e8 / (angstrom * kelvin); // h c / (lambda k T), lambda in Angstrom
        if (x > 700) {
            return 0.0;
        }
        return Math.pow(angstrom / 5500.0, -5) / Math.expm1(x);
    }

    /** A smooth step: 1 well blueward of {@code edge}, 0 well redward, width {@code width} Angstrom. */
    static double blueStep(double angstrom, double edge, double width) {
        return 1.0 / (1.0 + Math.exp((angstrom - edge) / width));
    }

    /**
     * A stellar-population-like continuum: old (4300 K), intermediate (6800 K) and young
     * (16000 K) Planck components normalised at 5500 Angstrom with weights wo, wi, wy; the old
     * and intermediate ones carry a 4000 Angstrom break, the young one a Balmer jump, the old one
     * ultraviolet line blanketing; all attenuated by the Calzetti law with stellar E(B-V).
     */
    static DoubleUnaryOperator populations(double wo, double wi, double wy, double breakDepth, double ebvStars) {
        double no = 1.0 / planck(5500, 4300);
        double ni = 1.0 / planck(5500, 6800);
        double ny = 1.0 / planck(5500, 16000);
        return lam -> {
            double b4000 = blueStep(lam, 4000.0, 35.0);
            double old = wo * no * planck(lam, 4300) * (1 - breakDepth * b4000) * (1 - 0.6 * blueStep(lam, 2900.0, 250.0));
            double mid = wi * ni * planck(lam, 6800) * (1 - 0.5 * breakDepth * b4000) * (1 - 0.25 * blueStep(lam, 3646.0, 25.0));
            double young = wy * ny * planck(lam, 16000) * (1 - 0.12 * blueStep(lam, 3646.0, 25.0));
            return (old + mid + young) * Calzetti.transmission(lam, ebvStars);
        };
    }

    static double uniform(RandomGenerator r, double a, double b) {
        return a + (b - a) * r.nextDouble();
    }

    static double logUniform(RandomGenerator r, double a, double b) {
        return Math.exp(uniform(r, Math.log(a), Math.log(b)));
    }

    static double lognormal(RandomGenerator r, double median, double dex) {
        return median * Math.pow(10.0, dex * r.nextGaussian());
    }

    // ---------------------------------------------------------------- galaxies

    static Built absorptionGalaxy(Grid g, double z, RandomGenerator r) {
        double sigma = uniform(r, 90, 300);
        double wi = uniform(r, 0.0, 0.35);
        double wy = uniform(r, 0.0, 0.04);
        double ebv = r.nextDouble() * 0.12;
        double breakDepth = uniform(r, 0.45, 0.65);
        double metals = uniform(r, 0.7, 1.3);
        Model m = new Model(g, z, populations(1.0, wi, wy, breakDepth, Calzetti.STELLAR_TO_GAS_EXCESS * ebv));
        double[][] metalLines = {
            {CA2_K, 9}, {CA2_H, 8}, {G_BAND, 5}, {MG_B1, 1.4}, {MG_B2, 1.6}, {MG_B3, 1.6}, {FE_5270, 2.2},
            {FE_5335, 1.8}, {NA_D2, 2.2}, {NA_D1, 1.8}, {CA2_8498, 1.0}, {CA2_8542, 3.0}, {CA2_8662, 2.4},
            {MG2_2796, 3.5}, {MG2_2804, 3.2}, {MG1_2853, 1.6}, {FE2_2600, 2.0}, {FE2_2587, 1.5},
            {FE2_2383, 1.5}, {FE2_2344, 1.1},
        };
        for (double[] l : metalLines) {
            m.absorption(l[0], l[1] * metals * uniform(r, 0.8, 1.2), sigma);
        }
        double balmer = 1.2 + 8.0 * wi;
        double[] balmerLines = {H_ALPHA, H_BETA, H_GAMMA, H_DELTA, H_EPSILON, H_ZETA, H_ETA};
        double[] balmerScale = {0.9, 1.0, 1.0, 1.0, 0.8, 0.7, 0.6};
        for (int i = 0; i < balmerLines.length; i++) {
            m.absorption(balmerLines[i], balmer * balmerScale[i] * uniform(r, 0.8, 1.2), Math.max(sigma, 250));
        }
        // a little residual nebular emission in some old galaxies
        if (r.nextDouble() < 0.3) {
            double ew = uniform(r, 0.3, 2.5);
            m.emissionEw(O2_3727, 0.45 * ew, 150, 0);
            m.emissionEw(O2_3730, 0.55 * ew, 150, 0);
            m.emissionEw(N2_6585, 0.6 * ew, 200, 0);
        }
        return new Built(m, params("sigma_v_km_s", sigma, "ebv_gas", ebv, "break_depth", breakDepth));
    }

    static Built emissionGalaxy(Grid g, double z, RandomGenerator r) {
        double sigmaGas = uniform(r, 25, 140);
        double sigmaStars = uniform(r, 50, 160);
        double ebv = Math.min(0.8, -0.15 * Math.log(1 - r.nextDouble()));
        double wo = uniform(r, 0.1, 0.8);
        double wi = uniform(r, 0.2, 0.7);
        double wy = uniform(r, 0.15, 1.2);
        double ebvStars = Calzetti.STELLAR_TO_GAS_EXCESS * ebv;
        Model m = new Model(g, z, populations(wo, wi, wy, 0.25 * wo / (wo + wi + wy) + 0.1, ebvStars));
        // stellar absorption underneath
        m.absorption(CA2_K, 4 * wo, sigmaStars);
        m.absorption(CA2_H, 3.5 * wo, sigmaStars);
        m.absorption(MG2_2796, 1.5, sigmaStars);
        m.absorption(MG2_2804, 1.3, sigmaStars);
        for (double l : new double[] {H_BETA, H_GAMMA, H_DELTA, H_EPSILON, H_ZETA}) {
            m.absorption(l, 2.0 + 3.0 * wi, 300);
        }
        // nebular lines: Hbeta sets the scale, others by ratio, dust relative to Hbeta
        double ewHb = lognormal(r, 12, 0.35);
        double fHb = ewHb * (1 + z) * m.continuumAtRest(H_BETA);
        double logO3 = uniform(r, -0.6, 0.9);                  // log [O III]5008 / Hbeta
        double logN2 = -0.45 - 0.55 * (logO3 + 0.6) + 0.12 * r.nextGaussian(); // anticorrelated, like the star-forming sequence
        double o2 = logUniform(r, 1.0, 4.0);                    // [O II] doublet / Hbeta (intrinsic)
        double o2Ratio = uniform(r, 0.6, 1.45);                 // 3730/3727, density-sensitive
        double s2 = uniform(r, 0.15, 0.45);                     // [S II] doublet / Halpha
        double s2Ratio = uniform(r, 0.45, 1.4);                 // 6718/6733
        double ne3 = uniform(r, 0.05, 0.4) * Math.pow(10, logO3) / 3;
        double[][] lines = {
            {H_ALPHA, 2.86}, {H_BETA, 1.0}, {H_GAMMA, 0.468}, {H_DELTA, 0.259}, {H_EPSILON, 0.16},
            {O3_5008, Math.pow(10, logO3)}, {O3_4960, Math.pow(10, logO3) / 2.98},
            {N2_6585, 2.86 * Math.pow(10, logN2)}, {N2_6550, 2.86 * Math.pow(10, logN2) / 2.94},
            {O2_3727, o2 / (1 + o2Ratio)}, {O2_3730, o2 * o2Ratio / (1 + o2Ratio)},
            {S2_6718, 2.86 * s2 * s2Ratio / (1 + s2Ratio)}, {S2_6733, 2.86 * s2 / (1 + s2Ratio)},
            {NE3_3870, ne3}, {HE1_5877, 0.1}, {O1_6302, uniform(r, 0.02, 0.1)},
        };
        double kHb = Calzetti.k(H_BETA);
        for (double[] l : lines) {
            double dust = Math.pow(10.0, -0.4 * ebv * (Calzetti.k(l[0]) - kHb));
            m.emissionFlux(l[0], fHb * l[1] * dust, sigmaGas, 0);
        }
        if (r.nextDouble() < 0.5) {
            m.emissionEw(MG2_2796, uniform(r, 0.5, 2), sigmaGas, 0);
            m.emissionEw(MG2_2804, uniform(r, 0.3, 1.5), sigmaGas, 0);
        }
        return new Built(m, params("sigma_v_km_s", sigmaGas, "ebv_gas", ebv, "ew_hbeta_angstrom", ewHb,
                "log_o3_hbeta", logO3, "log_n2_halpha", logN2));
    }

    // ---------------------------------------------------------------- quasars

    static Built quasar(Grid g, double z, RandomGenerator r) {
        double alphaNu = -0.44 + 0.3 * r.nextGaussian();
        double bump = uniform(r, 0.1, 0.35);
        DoubleUnaryOperator cont = lam -> {
            double pl = Math.pow(lam / 1450.0, -(2.0 + alphaNu));
            double fe = bump * Math.pow(2600.0 / 1450.0, -(2.0 + alphaNu))
                    * Math.exp(-0.5 * Math.pow(Math.log(lam / 2650.0) / 0.1, 2));
            double feOpt = 0.3 * bump * Math.pow(4900.0 / 1450.0, -(2.0 + alphaNu))
                    * Math.exp(-0.5 * Math.pow(Math.log(lam / 4900.0) / 0.06, 2));
            return pl + fe + feOpt;
        };
        Model m = new Model(g, z, cont);
        double fwhm = logUniform(r, 1800, 9000);
        double sig = fwhm / 2.3548;
        double strength = lognormal(r, 1.0, 0.18);
        double c4Shift = -Math.abs(300 + 350 * r.nextGaussian());
        double[][] broad = { // rest lambda, EW, width factor, shift km/s
            {LY_ALPHA, 90, 1.0, 0}, {N5_1240, 12, 0.8, 0}, {SI4_1400, 8, 1.0, 0}, {C4_1549, 25, 1.0, c4Shift},
            {HE2_1640, 3, 1.0, 0}, {C3_1909, 20, 1.1, 0}, {MG2_2800, 32, 0.9, 0}, {H_GAMMA, 12, 1.0, 0},
            {H_BETA, 45, 1.0, 0}, {H_ALPHA, 200, 0.9, 0},
        };
        for (double[] l : broad) {
            double ew = l[1] * strength * lognormal(r, 1.0, 0.12);
            // core plus a broader wing: profiles of quasar broad lines are not single Gaussians
            m.emissionEw(l[0], 0.6 * ew, sig * l[2], l[3]);
            m.emissionEw(l[0], 0.4 * ew, 2.5 * sig * l[2], l[3]);
        }
        double narrowSigma = uniform(r, 150, 400);
        double o3 = logUniform(r, 2, 30);
        m.emissionEw(O3_5008, o3, narrowSigma, 0);
        m.emissionEw(O3_4960, o3 / 2.98, narrowSigma, 0);
        m.emissionEw(O2_3727, 0.1 * o3, narrowSigma, 0);
        m.emissionEw(O2_3730, 0.1 * o3, narrowSigma, 0);
        m.emissionEw(NE5_3427, 0.05 * o3, narrowSigma, 0);
        lymanAbsorption(g, m, z, r);
        return new Built(m, params("alpha_nu", alphaNu, "fwhm_broad_km_s", fwhm, "c4_shift_km_s", c4Shift,
                "ew_o3_angstrom", o3));
    }

    /**
     * Intergalactic H I absorption blueward of Lyalpha: a log-normal random field of optical depth
     * with mean tau_eff(z_abs) (Lyalpha and, blueward of Lybeta, Lybeta), and a Lyman-limit
     * absorber of random optical depth below 912 Angstrom rest.
     */
    static void lymanAbsorption(Grid g, Model m, double z, RandomGenerator r) {
        double lyaObs = LY_ALPHA * (1 + z);
        if (g.vac[0] >= lyaObs) {
            return;
        }
        int n = g.n;
        double[] field = new double[n];
        for (int i = 0; i < n; i++) {
            field[i] = r.nextGaussian();
        }
        // smooth over ~3 pixels and renormalise to unit variance
        double[] smooth = new double[n];
        double norm = 0;
        for (int k = -4; k <= 4; k++) {
            norm += Math.exp(-0.5 * k * k / 2.25);
        }
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int k = -4; k <= 4; k++) {
                int j = Math.min(n - 1, Math.max(0, i + k));
                s += field[j] * Math.exp(-0.5 * k * k / 2.25);
            }
            smooth[i] = s / norm;
        }
        double var = 0;
        for (double s : smooth) {
            var += s * s;
        }
        double sd = Math.sqrt(var / n);
        double sg = 1.1;
        double tauLl = -1.5 * Math.log(1 - r.nextDouble());
        for (int i = 0; i < n && g.vac[i] < lyaObs; i++) {
            double x = Math.exp(sg * smooth[i] / sd - 0.5 * sg * sg);
            double zAbs = g.vac[i] / LY_ALPHA - 1;
            double tau = 0.0018 * Math.pow(1 + zAbs, 3.92) * x;
            double rest = g.vac[i] / (1 + z);
            if (rest < LY_BETA) {
                double zb = g.vac[i] / LY_BETA - 1;
                tau += 0.2 * 0.0018 * Math.pow(1 + zb, 3.92) * x;
            }
            if (rest < LY_LIMIT) {
                tau += tauLl * Math.pow(rest / LY_LIMIT, 3);
            }
            m.transmission[i] *= Math.exp(-tau);
        }
    }

    // ---------------------------------------------------------------- stars

    static Built star(Grid g, double z, RandomGenerator r) {
        double teff = logUniform(r, 3200, 12000);
        double cool = Math.min(1, Math.max(0, (7500 - teff) / 3000));
        double metals = uniform(r, 0.4, 1.3);
        double hot = Math.min(1, Math.max(0, (teff - 7000) / 3000));
        DoubleUnaryOperator cont = lam -> planck(lam, teff) / planck(5500, teff)
                * (1 - 0.45 * cool * blueStep(lam, 4000, 120)) * (1 - 0.3 * cool * blueStep(lam, 3200, 200))
                * (1 - 0.45 * hot * blueStep(lam, 3646, 20)); // Balmer jump of A and late B stars
        Model m = new Model(g, z, cont);
        double vsini = uniform(r, 2, teff > 7000 ? 120 : 15);
        double balmer = 1.0 + 13.0 * Math.exp(-Math.pow((teff - 9500) / 2600, 2));
        double[] bl = {H_ALPHA, H_BETA, H_GAMMA, H_DELTA, H_EPSILON, H_ZETA, H_ETA};
        double[] bs = {0.8, 1.0, 1.0, 1.0, 0.9, 0.8, 0.7};
        double pressure = teff > 7000 ? 450 : 120; // hot stars: pressure-broadened Balmer wings (Gaussian proxy)
        for (int i = 0; i < bl.length; i++) {
            m.absorption(bl[i], balmer * bs[i], pressure);
        }
        double[][] metalLines = {
            {CA2_K, 1 + 11 * cool}, {CA2_H, 1 + 8 * cool}, {G_BAND, 5 * Math.exp(-Math.pow((teff - 5200) / 1200, 2))},
            {MG_B1, 0.3 + 2 * cool}, {MG_B2, 0.3 + 2.3 * cool}, {MG_B3, 0.3 + 2.3 * cool},
            {FE_5270, 0.2 + 2 * cool}, {FE_5335, 0.2 + 1.6 * cool}, {NA_D2, 0.3 + 3 * cool}, {NA_D1, 0.3 + 2.5 * cool},
            {CA2_8498, 0.5 + 1.2 * cool}, {CA2_8542, 1 + 3 * cool}, {CA2_8662, 0.8 + 2.5 * cool},
        };
        for (double[] l : metalLines) {
            m.absorption(l[0], l[1] * metals, vsini);
        }
        double tio = Math.min(0.85, Math.max(0, (4000 - teff) / 700));
        if (tio > 0) {
            for (int i = 0; i < g.n; i++) {
                double rest = g.vac[i] / (1 + z);
                for (double head : TIO_BAND_HEADS) {
                    if (rest > head) {
                        m.transmission[i] *= 1 - tio * 0.55 * Math.exp(-(rest - head) / 90.0) / (1 + Math.exp(-(rest - head) / 1.5));
                    }
                }
            }
        }
        return new Built(m, params("teff_k", teff, "metal_scale", metals, "vsini_km_s", vsini));
    }

    private static Map<String, Double> params(Object... kv) {
        Map<String, Double> p = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            p.put((String) kv[i], ((Number) kv[i + 1]).doubleValue());
        }
        return p;
    }
}
