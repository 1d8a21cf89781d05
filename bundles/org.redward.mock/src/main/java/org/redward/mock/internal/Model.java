package org.redward.mock.internal;

import java.util.function.DoubleUnaryOperator;

/**
 * A noise-free model spectrum on the Quill grid, built in the object's rest frame and seen at a
 * topocentric redshift: {@code flux = continuum * exp(-tau) + emission}, then multiplied by an
 * optional transmission (intergalactic absorption). Flux density per observed Angstrom in
 * arbitrary units (the observation scales it). Not thread-safe; one per object.
 */
final class Model {

    final Grid grid;
    final double z;
    final DoubleUnaryOperator restContinuum;
    final double[] continuum;
    final double[] tau;
    final double[] emission;
    final double[] transmission;

    /**
     * @param restContinuum continuum flux density per rest Angstrom as a function of rest vacuum
     *     wavelength (Angstrom)
     */
    Model(Grid grid, double z, DoubleUnaryOperator restContinuum) {
        this.grid = grid;
        this.z = z;
        this.restContinuum = restContinuum;
        int n = grid.n;
        continuum = new double[n];
        tau = new double[n];
        emission = new double[n];
        transmission = new double[n];
        for (int i = 0; i < n; i++) {
            continuum[i] = restContinuum.applyAsDouble(grid.vac[i] / (1 + z)) / (1 + z);
            transmission[i] = 1.0;
        }
    }

    /** Observed continuum flux density at a rest wavelength (Angstrom). */
    double continuumAtRest(double rest) {
        return restContinuum.applyAsDouble(rest) / (1 + z);
    }

    /**
     * An absorption line of rest equivalent width {@code ewRest} (Angstrom, positive =
     * absorption) and intrinsic velocity sigma, as optical depth (weak-line limit: the EW is
     * the integral of tau).
     */
    void absorption(double restVac, double ewRest, double sigmaKmS) {
        double centre = restVac * (1 + z);
        grid.addGaussian(tau, centre, grid.observedSigma(centre, sigmaKmS), ewRest * (1 + z));
    }

    /**
     * An emission line of rest equivalent width {@code ewRest} (Angstrom) against the continuum
     * at its own wavelength, optionally shifted by {@code shiftKmS} from the systemic redshift.
     */
    void emissionEw(double restVac, double ewRest, double sigmaKmS, double shiftKmS) {
        emissionFlux(restVac, ewRest * (1 + z) * continuumAtRest(restVac), sigmaKmS, shiftKmS);
    }

    /** An emission line of integrated observed flux {@code flux} (flux density times Angstrom). */
    void emissionFlux(double restVac, double flux, double sigmaKmS, double shiftKmS) {
        double centre = restVac * (1 + z) * (1 + shiftKmS / Grid.C_KM_S);
        grid.addGaussian(emission, centre, grid.observedSigma(centre, sigmaKmS), flux);
    }

    /** The model flux density per pixel. */
    double[] flux() {
        double[] f = new double[grid.n];
        for (int i = 0; i < f.length; i++) {
            f[i] = (continuum[i] * Math.exp(-tau[i]) + emission[i]) * transmission[i];
        }
        return f;
    }
}
