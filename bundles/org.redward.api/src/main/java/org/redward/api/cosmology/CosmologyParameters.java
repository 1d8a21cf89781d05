package org.redward.api.cosmology;

import java.util.Objects;

/**
 * The parameters of a Friedmann-Lemaitre-Robertson-Walker cosmology: the Hubble constant, the
 * density parameters today of matter, dark energy (w0-wa, Chevallier & Polarski 2001; Linder
 * 2003) and radiation (photons from the CMB temperature, massless neutrinos from N_eff), and the
 * curvature that follows, {@code Omega_k = 1 - Omega_m - Omega_de - Omega_r}.
 *
 * <p>Radiation: {@code Omega_gamma = (4 sigma_SB T^4 / c^3) / rho_crit}, with
 * {@code rho_crit = 3 H0^2 / (8 pi G)}, CODATA 2018 G and the exact SI sigma_SB. Neutrinos: three
 * species sharing N_eff equally (common practice); a massless one adds
 * {@code (N_eff/3) (7/8) (4/11)^(4/3) Omega_gamma} (a^-4), a massive one that times
 * {@code f(y) = (1 + (A y)^p)^(1/p)}, {@code y = m a / (k T_nu0)}, {@code A = 180 zeta(3)/(7 pi^4)},
 * {@code p = 1.83}, {@code T_nu0 = (4/11)^(1/3) T_CMB} (the fitting formula of Komatsu et al.
 * 2011, ApJS 192, 18, eq. 26; from memory, checked through the Planck 2018 age). With
 * T_CMB = 0 there is no radiation at all (photons nor neutrinos).
 *
 * <p>Dark energy density relative to today at scale factor a (Linder 2003, PRL 90, 091301):
 * {@code a^(-3(1 + w0 + wa)) exp(-3 wa (1 - a))}; w0 = -1, wa = 0 is a cosmological constant.
 *
 * <p>Every instance is physical: {@link Builder#build()} refuses NaN, infinite or negative
 * densities, H0 &lt;= 0, and parameters with no big bang (E(z)^2 &lt;= 0 somewhere in the past),
 * with an {@link InvalidCosmologyException} naming the parameter. Immutable and thread-safe.
 */
public final class CosmologyParameters {

    /** Speed of light, km/s (exact, SI). */
    public static final double SPEED_OF_LIGHT_KM_PER_S = 299792.458;
    /** One megaparsec in km (IAU 2015 Resolution B2 parsec). */
    public static final double MPC_KM = 3.0856775814913673e19;
    /** One gigayear in seconds (Julian years). */
    public static final double GYR_S = 3.15576e16;
    /** Newtonian constant of gravitation, m^3 kg^-1 s^-2 (CODATA 2018). */
    public static final double GRAVITATIONAL_CONSTANT = 6.67430e-11;
    /** Stefan-Boltzmann constant, W m^-2 K^-4 (exact since the 2019 SI). */
    public static final double STEFAN_BOLTZMANN = 5.670374419e-8;
    /** (7/8)(4/11)^(4/3): energy density of one massless neutrino species per photon density. */
    public static final double NEUTRINO_PER_PHOTON = 7.0 / 8.0 * Math.pow(4.0 / 11.0, 4.0 / 3.0);
    /** Boltzmann constant, eV/K (exact since the 2019 SI). */
    public static final double BOLTZMANN_EV_PER_K = 8.617333262e-5;
    /** A of the massive-neutrino fitting formula, 180 zeta(3) / (7 pi^4). */
    private static final double NU_A = 180.0 * 1.2020569031595942 / (7.0 * Math.pow(Math.PI, 4));
    /** p of the massive-neutrino fitting formula. */
    private static final double NU_P = 1.83;

    private final String name;
    private final String citation;
    private final double h0;
    private final double omegaMatter;
    private final double omegaDarkEnergy;
    private final double w0;
    private final double wa;
    private final double cmbTemperatureK;
    private final double effectiveNeutrinoSpecies;
    private final double sigmaH0;
    private final double sigmaOmegaMatter;
    private final double[] neutrinoMassesEv;
    private final double[] neutrinoY0;
    private final double omegaPhotons;
    private final double omegaNeutrinos;
    private final double omegaCurvature;
    private final boolean flat;

    private CosmologyParameters(Builder b) {
        this.name = b.name;
        this.citation = b.citation;
        this.h0 = b.h0;
        this.omegaMatter = b.omegaMatter;
        this.w0 = b.w0;
        this.wa = b.wa;
        this.cmbTemperatureK = b.cmbTemperatureK;
        this.effectiveNeutrinoSpecies = b.effectiveNeutrinoSpecies;
        this.sigmaH0 = b.sigmaH0;
        this.sigmaOmegaMatter = b.sigmaOmegaMatter;
        this.flat = b.flat;
        this.neutrinoMassesEv = b.neutrinoMassesEv.clone();
        double tNu = Math.cbrt(4.0 / 11.0) * b.cmbTemperatureK;
        this.neutrinoY0 = new double[neutrinoMassesEv.length];
        for (int i = 0; i < neutrinoY0.length; i++) {
            neutrinoY0[i] = tNu > 0 ? neutrinoMassesEv[i] / (BOLTZMANN_EV_PER_K * tNu) : 0;
        }
        this.omegaPhotons = photonDensity(b.h0, b.cmbTemperatureK);
        this.omegaNeutrinos = omegaPhotons * neutrinoFactor(1.0);
        double or = omegaPhotons + omegaNeutrinos;
        if (b.flat) {
            this.omegaDarkEnergy = 1.0 - b.omegaMatter - or;
            this.omegaCurvature = 0.0;
        } else {
            this.omegaDarkEnergy = b.omegaDarkEnergy;
            this.omegaCurvature = 1.0 - b.omegaMatter - b.omegaDarkEnergy - or;
        }
    }

    /**
     * Photon density parameter today for a CMB temperature {@code tK} (K) and H0 (km/s/Mpc):
     * {@code (4 sigma_SB / c^3) T^4 / (3 H0^2 / 8 pi G)}. Zero for tK = 0.
     */
    public static double photonDensity(double h0KmPerSPerMpc, double tK) {
        double cMs = SPEED_OF_LIGHT_KM_PER_S * 1000.0;
        double h0PerS = h0KmPerSPerMpc / MPC_KM;
        double rhoCrit = 3.0 * h0PerS * h0PerS / (8.0 * Math.PI * GRAVITATIONAL_CONSTANT);
        double rhoGamma = 4.0 * STEFAN_BOLTZMANN / (cMs * cMs * cMs) * Math.pow(tK, 4);
        return rhoGamma / rhoCrit;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** A builder holding these parameters (name and citation kept; change them when you change a value). */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.name = name;
        b.citation = citation;
        b.h0 = h0;
        b.omegaMatter = omegaMatter;
        b.omegaDarkEnergy = omegaDarkEnergy;
        b.w0 = w0;
        b.wa = wa;
        b.cmbTemperatureK = cmbTemperatureK;
        b.effectiveNeutrinoSpecies = effectiveNeutrinoSpecies;
        b.sigmaH0 = sigmaH0;
        b.sigmaOmegaMatter = sigmaOmegaMatter;
        b.neutrinoMassesEv = neutrinoMassesEv.clone();
        b.flat = flat;
        return b;
    }

    /** Short id, e.g. {@code planck2018}; {@code custom} for parameters given by hand. */
    public String name() { return name; }
    /** Where the values come from (paper, table), or a note for hand-made sets. */
    public String citation() { return citation; }
    /** Hubble constant H0, km/s/Mpc. */
    public double h0() { return h0; }
    /** Matter density parameter today (baryons and cold dark matter). */
    public double omegaMatter() { return omegaMatter; }
    /** Dark-energy density parameter today (Omega_Lambda when w0 = -1, wa = 0). */
    public double omegaDarkEnergy() { return omegaDarkEnergy; }
    /** Dark-energy equation of state today. */
    public double w0() { return w0; }
    /** Dark-energy equation of state slope: w(a) = w0 + wa (1 - a). */
    public double wa() { return wa; }
    /** CMB temperature today, K (0: no radiation). */
    public double cmbTemperatureK() { return cmbTemperatureK; }
    /** Effective number of (massless) neutrino species. */
    public double effectiveNeutrinoSpecies() { return effectiveNeutrinoSpecies; }
    /** Masses of the massive neutrino species, eV (a copy; empty: all three massless). */
    public double[] neutrinoMassesEv() { return neutrinoMassesEv.clone(); }
    /** True when some neutrino has a mass (and there is radiation). */
    public boolean massiveNeutrinos() { return omegaPhotons > 0 && neutrinoMassesEv.length > 0; }

    /**
     * Neutrino energy density over photon energy density at scale factor a:
     * {@code (N_eff/3) (7/8)(4/11)^(4/3) [n_massless + sum_i f(y_i a)]}.
     */
    public double neutrinoFactor(double a) {
        double perSpecies = NEUTRINO_PER_PHOTON * effectiveNeutrinoSpecies / 3.0;
        double sum = 3 - neutrinoY0.length;
        for (double y0 : neutrinoY0) {
            sum += y0 == 0 ? 1.0 : Math.pow(1.0 + Math.pow(NU_A * y0 * a, NU_P), 1.0 / NU_P);
        }
        return perSpecies * sum;
    }

    /** Radiation-like density (photons and neutrinos) at scale factor a, times a^4, in units of the critical density today. */
    public double radiationTimesA4(double a) {
        return massiveNeutrinos() ? omegaPhotons * (1.0 + neutrinoFactor(a)) : omegaPhotons + omegaNeutrinos;
    }

    /** Photon density parameter today. */
    public double omegaPhotons() { return omegaPhotons; }
    /** Neutrino density parameter today (massless and massive). */
    public double omegaNeutrinos() { return omegaNeutrinos; }
    /** Photon plus neutrino density parameter today (massive neutrinos included). */
    public double omegaRadiation() { return omegaPhotons + omegaNeutrinos; }
    /** Curvature density parameter, 1 - Omega_m - Omega_de - Omega_r (exactly 0 for a flat set). */
    public double omegaCurvature() { return omegaCurvature; }
    /** True when the dark energy was set to make the universe flat. */
    public boolean flat() { return flat; }
    /** True for a cosmological constant (w0 = -1, wa = 0). */
    public boolean cosmologicalConstant() { return w0 == -1.0 && wa == 0.0; }
    /** One-sigma uncertainty of H0, km/s/Mpc (0 when unknown). */
    public double sigmaH0() { return sigmaH0; }
    /** One-sigma uncertainty of Omega_m (0 when unknown). */
    public double sigmaOmegaMatter() { return sigmaOmegaMatter; }

    /**
     * Dark-energy density at scale factor {@code a} relative to today,
     * {@code a^(-3(1+w0+wa)) exp(-3 wa (1-a))}; exactly 1 for a cosmological constant.
     */
    public double darkEnergyEvolution(double a) {
        if (cosmologicalConstant()) {
            return 1.0;
        }
        return Math.pow(a, -3.0 * (1.0 + w0 + wa)) * Math.exp(-3.0 * wa * (1.0 - a));
    }

    /**
     * {@code E(z)^2 = (H(z)/H0)^2 = Omega_r (1+z)^4 + Omega_m (1+z)^3 + Omega_k (1+z)^2 + Omega_de f(z)}
     * (Hogg 1999 eq. 14 extended with radiation and w0-wa dark energy; the radiation term is
     * {@link #radiationTimesA4(double)} (1+z)^4 when neutrinos have mass).
     */
    public double efunc2(double z) {
        double x = 1.0 + z;
        double x2 = x * x;
        return radiationTimesA4(1.0 / x) * x2 * x2 + omegaMatter * x2 * x + omegaCurvature * x2
                + omegaDarkEnergy * darkEnergyEvolution(1.0 / x);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof CosmologyParameters p)) {
            return false;
        }
        return name.equals(p.name) && Double.compare(h0, p.h0) == 0 && Double.compare(omegaMatter, p.omegaMatter) == 0
                && Double.compare(omegaDarkEnergy, p.omegaDarkEnergy) == 0 && Double.compare(w0, p.w0) == 0
                && Double.compare(wa, p.wa) == 0 && Double.compare(cmbTemperatureK, p.cmbTemperatureK) == 0
                && Double.compare(effectiveNeutrinoSpecies, p.effectiveNeutrinoSpecies) == 0
                && java.util.Arrays.equals(neutrinoMassesEv, p.neutrinoMassesEv)
                && Double.compare(sigmaH0, p.sigmaH0) == 0 && Double.compare(sigmaOmegaMatter, p.sigmaOmegaMatter) == 0
                && flat == p.flat;
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, h0, omegaMatter, omegaDarkEnergy, w0, wa, cmbTemperatureK, effectiveNeutrinoSpecies, flat);
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT,
                "%s: H0=%.4g Om=%.6g Ode=%.6g Ok=%.3g Or=%.3g w0=%.4g wa=%.4g Tcmb=%.5g Neff=%.4g m_nu=%s", name, h0,
                omegaMatter, omegaDarkEnergy, omegaCurvature, omegaRadiation(), w0, wa, cmbTemperatureK,
                effectiveNeutrinoSpecies, java.util.Arrays.toString(neutrinoMassesEv));
    }

    /**
     * Builder; not thread-safe. Defaults: name {@code custom}, H0 70, Omega_m 0.3, flat with a
     * cosmological constant, no radiation (T_CMB = 0, N_eff = 3.046 used only when T_CMB &gt; 0),
     * no parameter uncertainties.
     */
    public static final class Builder {
        private String name = "custom";
        private String citation = "parameters given by the user";
        private double h0 = 70.0;
        private double omegaMatter = 0.3;
        private double omegaDarkEnergy = 0.7;
        private double w0 = -1.0;
        private double wa = 0.0;
        private double cmbTemperatureK = 0.0;
        private double effectiveNeutrinoSpecies = 3.046;
        private double sigmaH0;
        private double sigmaOmegaMatter;
        private double[] neutrinoMassesEv = new double[0];
        private boolean flat = true;

        private Builder() {
        }

        public Builder name(String v) { name = Objects.requireNonNull(v); return this; }
        public Builder citation(String v) { citation = Objects.requireNonNull(v); return this; }
        /** H0 in km/s/Mpc. */
        public Builder h0(double v) { h0 = v; return this; }
        public Builder omegaMatter(double v) { omegaMatter = v; return this; }
        /** Sets Omega_de and makes the set non-flat (curvature follows from the densities). */
        public Builder omegaDarkEnergy(double v) { omegaDarkEnergy = v; flat = false; return this; }
        /** Flat: Omega_de = 1 - Omega_m - Omega_r, set at {@link #build()}. */
        public Builder flat() { flat = true; return this; }
        public Builder w0(double v) { w0 = v; return this; }
        public Builder wa(double v) { wa = v; return this; }
        public Builder cmbTemperatureK(double v) { cmbTemperatureK = v; return this; }
        public Builder effectiveNeutrinoSpecies(double v) { effectiveNeutrinoSpecies = v; return this; }
        public Builder sigmaH0(double v) { sigmaH0 = v; return this; }
        /** Masses of up to three massive neutrino species, eV (the others massless). */
        public Builder neutrinoMassesEv(double... v) { neutrinoMassesEv = v.clone(); return this; }
        public Builder sigmaOmegaMatter(double v) { sigmaOmegaMatter = v; return this; }

        /**
         * @throws InvalidCosmologyException naming the parameter at fault
         */
        public CosmologyParameters build() {
            positiveFinite("h0", h0);
            nonNegative("omega_m", omegaMatter);
            nonNegative("t_cmb", cmbTemperatureK);
            nonNegative("n_eff", effectiveNeutrinoSpecies);
            nonNegative("sigma_h0", sigmaH0);
            nonNegative("sigma_omega_m", sigmaOmegaMatter);
            finite("w0", w0);
            if (neutrinoMassesEv.length > 3) {
                throw new InvalidCosmologyException("m_nu", "m_nu: at most three neutrino masses, got " + neutrinoMassesEv.length);
            }
            for (double m : neutrinoMassesEv) {
                nonNegative("m_nu", m);
            }
            finite("wa", wa);
            if (!flat) {
                nonNegative("omega_lambda", omegaDarkEnergy);
            }
            CosmologyParameters p = new CosmologyParameters(this);
            if (flat && p.omegaDarkEnergy < 0) {
                throw new InvalidCosmologyException("omega_m", "a flat universe with omega_m = " + omegaMatter
                        + " and omega_r = " + p.omegaRadiation() + " needs a negative dark-energy density ("
                        + p.omegaDarkEnergy + "); use omega_m <= 1 or give omega_lambda for a closed universe");
            }
            checkBigBang(p);
            return p;
        }

        private static void checkBigBang(CosmologyParameters p) {
            // E^2 a^4 = Or + Om a + Ok a^2 + Ode f(a) a^4 must stay positive for 0 < a <= 1.
            for (int i = 1; i <= 4000; i++) {
                double a = i / 4000.0;
                double a2 = a * a;
                double v = p.radiationTimesA4(a) + p.omegaMatter * a + p.omegaCurvature * a2
                        + p.omegaDarkEnergy * p.darkEnergyEvolution(a) * a2 * a2;
                if (!(v > 0)) {
                    throw new InvalidCosmologyException("omega_lambda", String.format(java.util.Locale.ROOT,
                            "no big bang: with omega_m = %s and omega_lambda = %s, H(z)^2 <= 0 at z = %.4g "
                                    + "(the universe would have bounced); lower omega_lambda or raise omega_m",
                            p.omegaMatter, p.omegaDarkEnergy, 1.0 / a - 1.0));
                }
            }
        }

        private static void finite(String what, double v) {
            if (!Double.isFinite(v)) {
                throw new InvalidCosmologyException(what, what + " must be a finite number, got " + v);
            }
        }

        private static void positiveFinite(String what, double v) {
            if (!(Double.isFinite(v) && v > 0)) {
                throw new InvalidCosmologyException(what, what + " must be a positive finite number, got " + v);
            }
        }

        private static void nonNegative(String what, double v) {
            if (!(Double.isFinite(v) && v >= 0)) {
                throw new InvalidCosmologyException(what, what + " must be >= 0 (a density or temperature cannot be negative), got " + v);
            }
        }
    }
}
