package org.redward.spectrum;

import java.util.Arrays;
import java.util.Objects;

/**
 * One 1D spectrum: a {@link SpectralAxis} (vacuum Angstrom), flux per pixel, inverse variance per
 * pixel and a mask, with {@link SpectrumMetadata}.
 *
 * <p>Conventions: a pixel is usable when it is not masked, its flux is finite and its inverse
 * variance is finite and positive. Readers mark NaN/Inf flux and non-positive or NaN inverse
 * variance as masked rather than failing the whole spectrum. When a file has no error array the
 * inverse variance is 1 everywhere and {@link #hasErrors()} is false.
 *
 * <p>A spectrum may carry the sky spectrum that was subtracted from it (or measured beside it), when
 * the file has one: same pixels, same unit as the flux, NaN where unknown. It is for display and
 * diagnosis only; no estimator needs it. {@link #hasSky()} is false when the file gave none.
 *
 * <p>Immutable and thread-safe; accessors return copies of arrays.
 */
public final class Spectrum {

    private final SpectralAxis axis;
    private final double[] flux;
    private final double[] inverseVariance;
    private final boolean[] mask;
    private final String fluxUnit;
    private final boolean hasErrors;
    private final SpectrumMetadata metadata;
    /** The sky per pixel (flux unit, NaN unknown), or null when the file has none. */
    private final double[] sky;

    private Spectrum(SpectralAxis axis, double[] flux, double[] ivar, boolean[] mask, String fluxUnit,
            boolean hasErrors, SpectrumMetadata metadata) {
        this(axis, flux, ivar, mask, fluxUnit, hasErrors, metadata, null);
    }

    private Spectrum(SpectralAxis axis, double[] flux, double[] ivar, boolean[] mask, String fluxUnit,
            boolean hasErrors, SpectrumMetadata metadata, double[] sky) {
        this.sky = sky;
        this.axis = axis;
        this.flux = flux;
        this.inverseVariance = ivar;
        this.mask = mask;
        this.fluxUnit = fluxUnit;
        this.hasErrors = hasErrors;
        this.metadata = metadata;
    }

    /**
     * A spectrum from arrays (copied). {@code inverseVariance} may be null (no errors known: all 1,
     * {@link #hasErrors()} false); {@code mask} may be null (nothing masked; true = bad pixel).
     * Pixels with non-finite flux or non-finite/non-positive inverse variance are masked.
     *
     * @throws IllegalArgumentException if the array lengths differ from the axis size
     */
    public static Spectrum of(SpectralAxis axis, double[] flux, double[] inverseVariance, boolean[] mask,
            String fluxUnit, SpectrumMetadata metadata) {
        Objects.requireNonNull(axis, "axis");
        Objects.requireNonNull(flux, "flux");
        int n = axis.size();
        if (flux.length != n) {
            throw new IllegalArgumentException("flux has " + flux.length + " values but the axis has " + n + " pixels");
        }
        if (inverseVariance != null && inverseVariance.length != n) {
            throw new IllegalArgumentException("inverse variance has " + inverseVariance.length + " values but the axis has " + n + " pixels");
        }
        if (mask != null && mask.length != n) {
            throw new IllegalArgumentException("mask has " + mask.length + " values but the axis has " + n + " pixels");
        }
        double[] f = flux.clone();
        double[] iv = inverseVariance == null ? filled(n, 1.0) : inverseVariance.clone();
        boolean[] m = mask == null ? new boolean[n] : mask.clone();
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(f[i]) || !Double.isFinite(iv[i]) || iv[i] <= 0) {
                m[i] = true;
            }
            if (m[i]) {
                iv[i] = 0.0;
                if (!Double.isFinite(f[i])) {
                    f[i] = 0.0;
                }
            }
        }
        return new Spectrum(axis, f, iv, m, fluxUnit == null ? "" : fluxUnit, inverseVariance != null,
                metadata == null ? SpectrumMetadata.EMPTY : metadata);
    }

    private static double[] filled(int n, double v) {
        double[] a = new double[n];
        Arrays.fill(a, v);
        return a;
    }

    public SpectralAxis axis() { return axis; }
    public int size() { return flux.length; }
    public double flux(int i) { return flux[i]; }
    public double inverseVariance(int i) { return inverseVariance[i]; }
    public boolean masked(int i) { return mask[i]; }
    /** A copy of the flux (masked non-finite values are 0). */
    public double[] flux() { return flux.clone(); }
    /** A copy of the inverse variance (0 where masked). */
    public double[] inverseVariance() { return inverseVariance.clone(); }
    /** A copy of the mask (true = bad pixel). */
    public boolean[] mask() { return mask.clone(); }
    /** Flux unit as read (free text, e.g. {@code 1e-17 erg/s/cm2/Angstrom}); empty if unknown. */
    public String fluxUnit() { return fluxUnit; }
    /** True if the file gave errors; false if the inverse variance is a placeholder of 1. */
    public boolean hasErrors() { return hasErrors; }
    public SpectrumMetadata metadata() { return metadata; }

    /** Number of usable pixels. */
    public int usablePixels() {
        int k = 0;
        for (boolean b : mask) {
            if (!b) {
                k++;
            }
        }
        return k;
    }

    /** Fraction of pixels masked, 0..1. */
    public double maskedFraction() {
        return 1.0 - (double) usablePixels() / size();
    }

    /** A copy with other metadata (the sky, if any, is kept). */
    public Spectrum withMetadata(SpectrumMetadata m) {
        return new Spectrum(axis, flux, inverseVariance, mask, fluxUnit, hasErrors, Objects.requireNonNull(m), sky);
    }

    /**
     * A copy that carries a sky spectrum (copied): one value per pixel in the flux unit; NaN or
     * infinite values become NaN (unknown). {@code null} gives a copy without sky.
     *
     * @throws IllegalArgumentException if the length differs from the number of pixels
     */
    public Spectrum withSky(double[] skyFlux) {
        if (skyFlux == null) {
            return sky == null ? this : new Spectrum(axis, flux, inverseVariance, mask, fluxUnit, hasErrors, metadata, null);
        }
        if (skyFlux.length != flux.length) {
            throw new IllegalArgumentException("sky has " + skyFlux.length + " values but the axis has " + flux.length + " pixels");
        }
        double[] k = skyFlux.clone();
        for (int i = 0; i < k.length; i++) {
            if (!Double.isFinite(k[i])) {
                k[i] = Double.NaN;
            }
        }
        return new Spectrum(axis, flux, inverseVariance, mask, fluxUnit, hasErrors, metadata, k);
    }

    /** True if the file gave a sky spectrum. */
    public boolean hasSky() {
        return sky != null;
    }

    /** A copy of the sky spectrum (flux unit, NaN unknown), or null when the file has none. */
    public double[] sky() {
        return sky == null ? null : sky.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Spectrum s && axis.equals(s.axis) && Arrays.equals(flux, s.flux)
                && Arrays.equals(inverseVariance, s.inverseVariance) && Arrays.equals(mask, s.mask)
                && fluxUnit.equals(s.fluxUnit) && hasErrors == s.hasErrors && metadata.equals(s.metadata)
                && Arrays.equals(sky, s.sky);
    }

    @Override
    public int hashCode() {
        return axis.hashCode() * 31 + Arrays.hashCode(flux);
    }

    @Override
    public String toString() {
        return "Spectrum[" + axis + ", unit=" + fluxUnit + ", " + metadata.objectId().orElse("?") + "]";
    }
}
