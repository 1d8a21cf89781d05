package org.redward.templates.standard.internal;

import org.redward.spectrum.AirVacuum;

/**
 * Building blocks for synthetic rest-frame spectra on a log10-lambda grid (vacuum Angstrom):
 * continua (Planck function, power laws, breaks) and Gaussian lines defined by rest equivalent
 * width. All methods act in place on {@code flux} and are thread-safe on distinct arrays.
 */
final class Synth {

    /** h c / k in Angstrom Kelvin (CODATA; common practice). */
    static final double HC_OVER_K_ANGSTROM_K = 1.438777e8;
    static final double C_KM_S = 299_792.458;

    final double[] lambda;

    Synth(double minAngstrom, double maxAngstrom, double log10Step) {
        double a = Math.log10(minAngstrom);
        int n = (int) Math.ceil((Math.log10(maxAngstrom) - a) / log10Step) + 1;
        lambda = new double[n];
        for (int i = 0; i < n; i++) {
            lambda[i] = Math.pow(10.0, a + i * log10Step);
        }
    }

    double[] zeros() {
        return new double[lambda.length];
    }

    /** Planck B_lambda(T) up to a constant: lambda^-5 / (exp(hc/(lambda k T)) - 1), normalised to 1 at 5500 A. */
    double[] planck(double kelvin) {
        double[] f = zeros();
        double norm = planckAt(5500, kelvin);
        for (int i = 0; i < f.length; i++) {
            f[i] = planckAt(lambda[i], kelvin) / norm;
        }
        return f;
    }

    static double planckAt(double lam, double kelvin) {
        double x = HC_OVER_K_ANGSTROM_K / (lam * kelvin);
        return x > 700 ? 0.0 : Math.pow(lam / 5500.0, -5) / Math.expm1(x);
    }

    /** F_lambda proportional to lambda^slope, 1 at 5500 A. */
    double[] powerLaw(double slope) {
        double[] f = zeros();
        for (int i = 0; i < f.length; i++) {
            f[i] = Math.pow(lambda[i] / 5500.0, slope);
        }
        return f;
    }

    /** Multiplies by a smooth step: 1/ratio well below {@code at}, 1 well above (tanh of width). */
    void step(double[] f, double at, double ratio, double width) {
        for (int i = 0; i < f.length; i++) {
            double s = 0.5 * (1 + Math.tanh((lambda[i] - at) / width));
            f[i] *= 1.0 / ratio + (1.0 - 1.0 / ratio) * s;
        }
    }

    /** Below {@code at}, multiplies by (lambda/at)^power (a UV fall-off). */
    void fallBelow(double[] f, double at, double power) {
        for (int i = 0; i < f.length; i++) {
            if (lambda[i] < at) {
                f[i] *= Math.pow(lambda[i] / at, power);
            }
        }
    }

    /** Below {@code at}, multiplies by {@code factor} (smoothed over 5 A). */
    void scaleBelow(double[] f, double at, double factor) {
        for (int i = 0; i < f.length; i++) {
            double s = 0.5 * (1 + Math.tanh((lambda[i] - at) / 5.0));
            f[i] *= factor + (1 - factor) * s;
        }
    }

    /**
     * An absorption line of rest equivalent width {@code ewAngstrom} and Gaussian sigma: the flux
     * is multiplied by 1 - d exp(-x^2/2), d = EW / (sigma sqrt(2 pi)) capped at 0.95.
     */
    void absorb(double[] f, double centre, double ewAngstrom, double sigmaAngstrom) {
        if (ewAngstrom <= 0) {
            return;
        }
        double d = Math.min(0.95, ewAngstrom / (sigmaAngstrom * Math.sqrt(2 * Math.PI)));
        int[] r = range(centre, 6 * sigmaAngstrom);
        for (int i = r[0]; i < r[1]; i++) {
            double x = (lambda[i] - centre) / sigmaAngstrom;
            f[i] *= 1 - d * Math.exp(-0.5 * x * x);
        }
    }

    /**
     * An emission line of rest equivalent width {@code ewAngstrom} against {@code continuum}
     * (evaluated at the centre), Gaussian with sigma {@code sigmaKmPerS} (velocity).
     */
    void emit(double[] f, double[] continuum, double centre, double ewAngstrom, double sigmaKmPerS) {
        double sigma = centre * sigmaKmPerS / C_KM_S;
        double c = interpolate(continuum, centre);
        double peak = ewAngstrom * c / (sigma * Math.sqrt(2 * Math.PI));
        int[] r = range(centre, 6 * sigma);
        for (int i = r[0]; i < r[1]; i++) {
            double x = (lambda[i] - centre) / sigma;
            f[i] += peak * Math.exp(-0.5 * x * x);
        }
    }

    /**
     * A molecular band with its head at {@code headAirAngstrom} (converted to vacuum), shaded to
     * the red: the flux beyond the head is multiplied by 1 - depth exp(-(lambda - head)/scale).
     */
    void band(double[] f, double headAirAngstrom, double depth, double scaleAngstrom) {
        double head = AirVacuum.airToVacuumAngstrom(headAirAngstrom);
        for (int i = 0; i < f.length; i++) {
            double d = lambda[i] - head;
            if (d >= 0 && d < 8 * scaleAngstrom) {
                f[i] *= 1 - depth * Math.exp(-d / scaleAngstrom);
            }
        }
    }

    double interpolate(double[] f, double lam) {
        int i = java.util.Arrays.binarySearch(lambda, lam);
        if (i >= 0) {
            return f[i];
        }
        int j = -i - 1;
        if (j <= 0) {
            return f[0];
        }
        if (j >= lambda.length) {
            return f[lambda.length - 1];
        }
        double t = (lam - lambda[j - 1]) / (lambda[j] - lambda[j - 1]);
        return f[j - 1] + t * (f[j] - f[j - 1]);
    }

    /** Divides by the flux at 5500 A (or the nearest pixel). */
    void normalise(double[] f) {
        double v = interpolate(f, 5500);
        for (int i = 0; i < f.length; i++) {
            f[i] /= v;
        }
    }

    /** a * x + b * y, each first normalised at 5500 A. */
    double[] mix(double a, double[] x, double b, double[] y) {
        double[] xx = x.clone(), yy = y.clone();
        normalise(xx);
        normalise(yy);
        double[] f = zeros();
        for (int i = 0; i < f.length; i++) {
            f[i] = a * xx[i] + b * yy[i];
        }
        return f;
    }

    private int[] range(double centre, double half) {
        int lo = java.util.Arrays.binarySearch(lambda, centre - half);
        int hi = java.util.Arrays.binarySearch(lambda, centre + half);
        lo = lo < 0 ? -lo - 1 : lo;
        hi = hi < 0 ? -hi - 1 : hi;
        return new int[] {Math.max(0, lo), Math.min(lambda.length, hi + 1)};
    }
}
