package org.redward.spectrum;

import java.util.Locale;

/**
 * A wavelength grid uniform in log10(lambda): pixel {@code i} is centred on
 * {@code 10^(log10StartAngstrom + i * log10Step)} Angstrom (vacuum). On such a grid a redshift is
 * a shift: log10(1+z) = k * log10Step for a shift of k pixels; one pixel is a velocity step of
 * about {@code c * ln(10) * log10Step} (69.03 km/s for a step of 1e-4).
 *
 * <p>Immutable and thread-safe.
 */
public final class LogLambdaGrid {

    private final double log10StartAngstrom;
    private final double log10Step;
    private final int pixels;

    private LogLambdaGrid(double start, double step, int pixels) {
        this.log10StartAngstrom = start;
        this.log10Step = step;
        this.pixels = pixels;
    }

    /**
     * @throws IllegalArgumentException if the step is not positive or there are no pixels
     */
    public static LogLambdaGrid of(double log10StartAngstrom, double log10Step, int pixels) {
        if (!(log10Step > 0) || !Double.isFinite(log10StartAngstrom) || pixels <= 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "invalid log-lambda grid: start %g, step %g, %d pixels", log10StartAngstrom, log10Step, pixels));
        }
        return new LogLambdaGrid(log10StartAngstrom, log10Step, pixels);
    }

    /** The smallest grid with this step, aligned on multiples of the step, covering [min, max] Angstrom. */
    public static LogLambdaGrid covering(double minAngstrom, double maxAngstrom, double log10Step) {
        double a = Math.ceil(Math.log10(minAngstrom) / log10Step);
        double b = Math.floor(Math.log10(maxAngstrom) / log10Step);
        return of(a * log10Step, log10Step, (int) (b - a) + 1);
    }

    public double log10StartAngstrom() { return log10StartAngstrom; }
    public double log10Step() { return log10Step; }
    public int size() { return pixels; }

    /** Centre of pixel i, vacuum Angstrom. */
    public double vacuumAngstrom(int i) {
        return Math.pow(10.0, log10StartAngstrom + i * log10Step);
    }

    /** All pixel centres, vacuum Angstrom. */
    public double[] vacuumAngstrom() {
        double[] w = new double[pixels];
        for (int i = 0; i < pixels; i++) {
            w[i] = vacuumAngstrom(i);
        }
        return w;
    }

    /** Velocity width of one pixel, km/s: c * (10^step - 1). */
    public double pixelVelocityKmPerS() {
        return 299_792.458 * (Math.pow(10.0, log10Step) - 1.0);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "LogLambdaGrid[start=%.6f, step=%.3g, %d px]", log10StartAngstrom, log10Step, pixels);
    }
}
