package org.redward.templates.standard.internal;

import java.util.ArrayList;
import java.util.List;

import org.redward.api.templates.Template;
import org.redward.spectrum.ObjectClass;

/**
 * The recipes of the standard template set. Every template is computed here from published
 * facts: rest vacuum wavelengths (NIST values as listed in the project's reference table;
 * others marked), typical line ratios and strengths, and continuum temperatures. No observed
 * spectrum is copied. Values marked "memory" were written from memory of the cited source and
 * are not verified against it; the test {@code StandardTemplatesTest} compares the results with
 * published empirical templates. TEMPLATES.md describes each recipe.
 *
 * <p>Stateless; {@link #all()} is deterministic (same output on every call and machine).
 */
final class Recipes {

    /** Sampling of the generated templates: 5e-5 in log10(lambda) (34.5 km/s). */
    static final double LOG10_STEP = 5e-5;

    // Rest vacuum wavelengths, Angstrom. NIST ASD values via the project's reference table
    // unless marked "memory" (NIST ASD values from memory).
    static final double LYA = 1215.67, CIV = 1549.06 /* doublet blend, memory */, MGII = 2798.75 /* blend, memory */;
    static final double OII_A = 3727.092, OII_B = 3729.875, CA_K = 3934.777, CA_H = 3969.591;
    static final double H_ETA = 3836.47, H_ZETA = 3890.17, H_EPS = 3971.20; // memory
    static final double H_DELTA = 4102.892, G_BAND = 4305.6, H_GAMMA = 4341.684, H_BETA = 4862.683;
    static final double OIII_A = 4960.295, OIII_B = 5008.240;
    static final double MGB_1 = 5168.761, MGB_2 = 5174.125, MGB_3 = 5185.048;
    static final double NA_D2 = 5891.583, NA_D1 = 5897.558;
    static final double NII_A = 6549.86, H_ALPHA = 6564.614, NII_B = 6585.27, SII_A = 6718.29, SII_B = 6732.67;
    // memory (NIST ASD, vacuum): [Ne III], [Ne V], He I, He II, [O I], [Ar III], [S III], Ca I, Ca II triplet, UV lines
    static final double NEIII = 3870.86, NEV = 3426.85, HEI = 5877.25, HEII = 4687.02, OI = 6302.05, ARIII = 7137.77;
    static final double SIII_A = 9071.1, SIII_B = 9533.2, CAI = 4227.92, MGI = 2852.96;
    static final double CAT_1 = 8500.36, CAT_2 = 8544.44, CAT_3 = 8664.52;
    static final double OVI = 1033.82, NV = 1240.14, SIIV = 1398.0, HEII_UV = 1640.42, CIII = 1908.73;
    // Lick-index band centres (Worthey et al. 1994; memory): Fe4383, Fe5270, Fe5335, CN 3883
    static final double FE4383 = 4384.0, FE5270 = 5271.0, FE5335 = 5336.0, CN = 3884.0;

    private Recipes() {
    }

    static List<Template> all() {
        List<Template> t = new ArrayList<>();
        Synth g = new Synth(900, 12000, LOG10_STEP);
        double[] passive = passive(g);
        double[] aStar = star(g, StarType.TYPES.get(1));
        t.add(template("galaxy-passive", ObjectClass.GALAXY, "passive", g, passive));
        t.add(template("galaxy-intermediate", ObjectClass.GALAXY, "intermediate", g, intermediate(g, passive, aStar)));
        t.add(template("galaxy-starforming", ObjectClass.GALAXY, "starforming", g, starForming(g, passive, aStar)));
        t.add(template("galaxy-nuclear-active", ObjectClass.GALAXY, "nuclear-active", g, nuclearActive(g, passive)));
        Synth q = new Synth(600, 12000, LOG10_STEP);
        double[] quasar = quasar(q);
        t.add(template("quasar-broadline", ObjectClass.QUASAR, "broadline", q, quasar));
        Synth s = new Synth(3000, 11000, LOG10_STEP);
        for (StarType type : StarType.TYPES) {
            t.add(template("star-" + type.name(), ObjectClass.STAR, type.name(), s, star(s, type)));
        }
        return t;
    }

    private static Template template(String id, ObjectClass c, String sub, Synth s, double[] f) {
        double[] ff = f.clone();
        s.normalise(ff);
        return Template.of(id, c, sub, s.lambda, ff);
    }

    /**
     * Old stellar population (elliptical-like): a 4,500 K Planck continuum; the 4000 A break with
     * D4000 = 1.9 (typical of ellipticals, Balogh et al. 1999, memory); UV fall-off below 2800 A;
     * absorption features with rest equivalent widths typical of early-type galaxies (Lick indices,
     * Trager et al. 1998 / Worthey et al. 1994, orders of magnitude from memory).
     */
    static double[] passive(Synth s) {
        double[] f = s.planck(4500);
        s.step(f, 4000, 1.9, 25);
        s.fallBelow(f, 2800, 2.5);
        oldPopulationLines(s, f);
        return f;
    }

    private static void oldPopulationLines(Synth s, double[] f) {
        s.absorb(f, MGII, 8, 6);
        s.absorb(f, MGI, 4, 4);
        s.absorb(f, CN, 4, 20);
        s.absorb(f, CA_K, 14, 7);
        s.absorb(f, CA_H, 12, 7);
        s.absorb(f, H_DELTA, 2, 6);
        s.absorb(f, CAI, 1.5, 4);
        s.absorb(f, G_BAND, 5, 10);
        s.absorb(f, H_GAMMA, 2, 6);
        s.absorb(f, FE4383, 4, 6);
        s.absorb(f, H_BETA, 2, 5);
        s.absorb(f, MGB_1, 1.5, 4);
        s.absorb(f, MGB_2, 1.8, 4);
        s.absorb(f, MGB_3, 1.8, 4);
        s.absorb(f, FE5270, 2.5, 5);
        s.absorb(f, FE5335, 2, 5);
        s.absorb(f, NA_D2, 2, 4);
        s.absorb(f, NA_D1, 2, 4);
        s.absorb(f, H_ALPHA, 1.5, 6);
        s.absorb(f, CAT_1, 1.2, 4);
        s.absorb(f, CAT_2, 3.0, 4);
        s.absorb(f, CAT_3, 2.5, 4);
    }

    /** Post-starburst-like: 60% A-type star light plus 40% old population at 5500 A. */
    static double[] intermediate(Synth s, double[] passive, double[] aStar) {
        return s.mix(0.6, aStar, 0.4, passive);
    }

    /**
     * Star-forming galaxy: a young continuum (40% 15,000 K Planck + 30% A-type star + 30% old
     * population at 5500 A) plus nebular emission lines. Ratios to H-beta: Balmer lines by case B
     * recombination at 10,000 K (H-alpha 2.86, H-gamma 0.47, H-delta 0.26; Osterbrock & Ferland
     * 2006, memory) with H-alpha raised to 3.5 for typical dust; forbidden lines at values typical
     * of star-forming galaxies ([O II] 3727+3729 = 3.0, [O III] 5008 = 1.2 with 4960 = 5008/2.98,
     * [N II] 6585 = 1.0 with 6550 = 6585/2.94, [S II] 0.5 and 0.35; memory). H-beta rest EW 25 A.
     * Lines have sigma 90 km/s.
     */
    static double[] starForming(Synth s, double[] passive, double[] aStar) {
        double[] young = s.planck(15000);
        double[] c = s.mix(0.4, young, 0.6, s.mix(0.5, aStar, 0.5, passive));
        double[] f = c.clone();
        double v = 90, hb = 25;
        double[][] lines = {
            {OII_A, 1.3}, {OII_B, 1.7}, {NEIII, 0.3}, {H_ZETA, 0.1}, {H_EPS, 0.16}, {H_DELTA, 0.26}, {H_GAMMA, 0.47},
            {H_BETA, 1.0}, {OIII_A, 1.2 / 2.98}, {OIII_B, 1.2}, {HEI, 0.1}, {OI, 0.05}, {NII_A, 1.0 / 2.94},
            {H_ALPHA, 3.5}, {NII_B, 1.0}, {SII_A, 0.5}, {SII_B, 0.35}, {ARIII, 0.1}, {SIII_A, 0.3}, {SIII_B, 0.7}};
        double chb = s.interpolate(c, H_BETA);
        for (double[] l : lines) {
            // EW relative to the local continuum from a flux ratio to H-beta
            double ew = hb * l[1] * chb / s.interpolate(c, l[0]);
            s.emit(f, c, l[0], ew, v);
        }
        s.emit(f, c, LYA, 20, 150);
        return f;
    }

    /**
     * Narrow-line active nucleus in an old host (Seyfert 2 / radio galaxy): 70% old population +
     * 30% lambda^-1 power law at 5500 A; high-ionisation line ratios to H-beta typical of Seyfert 2
     * nuclei ([O III] 5008 = 10, [N II] 6585 = 3, [O I] 6302 = 0.6, [Ne V] 3427 = 0.8, He II
     * 4687 = 0.25, [S II] 1.0 and 0.9; memory of Osterbrock & Ferland 2006). H-beta rest EW 8 A;
     * sigma 250 km/s.
     */
    static double[] nuclearActive(Synth s, double[] passive) {
        double[] c = s.mix(0.7, passive, 0.3, s.powerLaw(-1.0));
        double[] f = c.clone();
        double v = 250, hb = 8;
        double[][] lines = {
            {NEV, 0.8}, {OII_A, 1.5}, {OII_B, 1.5}, {NEIII, 1.2}, {H_DELTA, 0.26}, {H_GAMMA, 0.47}, {HEII, 0.25},
            {H_BETA, 1.0}, {OIII_A, 10 / 2.98}, {OIII_B, 10}, {OI, 0.6}, {NII_A, 3 / 2.94}, {H_ALPHA, 3.1},
            {NII_B, 3.0}, {SII_A, 1.0}, {SII_B, 0.9}};
        double chb = s.interpolate(c, H_BETA);
        for (double[] l : lines) {
            s.emit(f, c, l[0], hb * l[1] * chb / s.interpolate(c, l[0]), v);
        }
        return f;
    }

    /**
     * Broad-line quasar after the composite of Vanden Berk et al. (2001, AJ 122, 549): continuum
     * F_nu ~ nu^-0.44 (F_lambda ~ lambda^-1.56) below 5000 A and F_lambda ~ lambda^+0.45 above
     * (their two power laws; memory); emission lines by rest EW and Gaussian sigma in Angstrom,
     * orders of magnitude of their Table 2 (memory: Ly-alpha 93, C IV 24, C III] 21, Mg II 32,
     * H-beta 46, H-alpha 195, [O III] 5008 13 A); mean Ly-alpha forest transmission 0.7 below
     * 1216 A and 0.05 below the Lyman limit (common practice, rough).
     */
    static double[] quasar(Synth s) {
        double[] c = s.powerLaw(-1.56);
        double[] red = s.powerLaw(0.45);
        double k = s.interpolate(c, 5000) / s.interpolate(red, 5000);
        for (int i = 0; i < c.length; i++) {
            if (s.lambda[i] > 5000) {
                c[i] = red[i] * k;
            }
        }
        double[] f = c.clone();
        // {centre, rest EW (A), sigma (A)}
        double[][] lines = {
            {OVI, 10, 9}, {LYA, 93, 19}, {NV, 10, 8}, {SIIV, 8, 16}, {CIV, 24, 14}, {HEII_UV, 2, 12},
            {CIII, 21, 24}, {MGII, 32, 34}, {NEV, 1.4, 5}, {(OII_A + OII_B) / 2, 1.6, 4}, {NEIII, 1.5, 6},
            {H_DELTA, 5, 21}, {H_GAMMA, 12, 29}, {H_BETA, 46, 40}, {OIII_A, 13.2 / 2.98, 5}, {OIII_B, 13.2, 5},
            {HEI, 6, 30}, {H_ALPHA, 195, 47}};
        for (double[] l : lines) {
            double sigmaKmS = l[2] / l[0] * Synth.C_KM_S;
            s.emit(f, c, l[0], l[1], sigmaKmS);
        }
        s.scaleBelow(f, LYA - 10, 0.7);
        s.scaleBelow(f, 912, 0.05 / 0.7);
        return f;
    }

    /** A star of the given type: Planck continuum at its effective temperature with its features. */
    static double[] star(Synth s, StarType t) {
        double[] f = s.planck(t.teffKelvin());
        double[][] balmer = {{H_ALPHA, 1.0}, {H_BETA, 1.0}, {H_GAMMA, 0.9}, {H_DELTA, 0.9}, {H_EPS, 0.8}, {H_ZETA, 0.7}, {H_ETA, 0.6}};
        for (double[] b : balmer) {
            s.absorb(f, b[0], t.balmerEw() * b[1], t.balmerSigma());
        }
        s.absorb(f, CA_K, t.caKEw(), 5);
        s.absorb(f, CA_H, 0.85 * t.caKEw(), 5);
        s.absorb(f, G_BAND, t.gBandEw(), 8);
        s.absorb(f, CAI, t.caIEw(), 3);
        s.absorb(f, FE4383, 0.3 * t.gBandEw(), 4);
        s.absorb(f, FE5270, 0.25 * t.gBandEw(), 4);
        s.absorb(f, FE5335, 0.2 * t.gBandEw(), 4);
        s.absorb(f, MGB_1, t.mgbEw(), 2.5);
        s.absorb(f, MGB_2, t.mgbEw(), 2.5);
        s.absorb(f, MGB_3, t.mgbEw(), 2.5);
        s.absorb(f, NA_D2, t.naDEw(), 2.5);
        s.absorb(f, NA_D1, t.naDEw(), 2.5);
        s.absorb(f, CAT_1, 0.6 * t.caTripletEw(), 3);
        s.absorb(f, CAT_2, t.caTripletEw(), 3);
        s.absorb(f, CAT_3, 0.85 * t.caTripletEw(), 3);
        if (t.tioDepth() > 0) {
            // TiO band heads (air), shaded to the red; common practice for M-type spectra
            double[] heads = {4761, 4954, 5167, 5448, 5847, 6159, 6651, 7054, 7589, 8432};
            for (double h : heads) {
                s.band(f, h, t.tioDepth(), 90);
            }
        }
        return f;
    }
}
