package org.redward.api.cosmology;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;

/**
 * Catalogue-scale results: one column per {@link Quantity} for an array of redshifts, as made by
 * {@link Cosmology#distances(double[])}. Rows whose redshift is NaN, negative or above
 * {@link Cosmology#MAX_REDSHIFT} hold NaN in every column (and {@link #valid(int)} is false)
 * rather than failing the whole catalogue. Immutable; the column accessors return copies, the
 * per-row accessors do not allocate. Thread-safe.
 */
public final class DistanceColumns {

    private final CosmologyParameters parameters;
    private final double[] z;
    private final EnumMap<Quantity, double[]> columns;

    private DistanceColumns(CosmologyParameters parameters, double[] z, Map<Quantity, double[]> columns) {
        this.parameters = Objects.requireNonNull(parameters);
        this.z = z;
        this.columns = new EnumMap<>(columns);
        for (Quantity q : Quantity.values()) {
            double[] c = this.columns.get(q);
            if (c == null || c.length != z.length) {
                throw new IllegalArgumentException("column " + q.key() + " missing or of the wrong length");
            }
        }
    }

    /**
     * Wraps columns without copying them: the caller hands them over and must not change them.
     */
    public static DistanceColumns wrap(CosmologyParameters parameters, double[] z, Map<Quantity, double[]> columns) {
        return new DistanceColumns(parameters, z, columns);
    }

    public CosmologyParameters parameters() { return parameters; }
    public int size() { return z.length; }
    public double z(int row) { return z[row]; }
    public double get(Quantity q, int row) { return columns.get(q)[row]; }
    /** False where the input redshift was unusable (all columns NaN). */
    public boolean valid(int row) { return !Double.isNaN(columns.get(Quantity.COMOVING_MPC)[row]); }
    /** True where the Hubble law is off by more than {@link Cosmology#HUBBLE_LAW_WARNING} against any exact distance. */
    public boolean hubbleLawWarning(int row) {
        return Math.abs(get(Quantity.HUBBLE_LAW_ERROR_VS_COMOVING, row)) > Cosmology.HUBBLE_LAW_WARNING
                || Math.abs(get(Quantity.HUBBLE_LAW_ERROR_VS_LUMINOSITY, row)) > Cosmology.HUBBLE_LAW_WARNING
                || Math.abs(get(Quantity.HUBBLE_LAW_ERROR_VS_ANGULAR_DIAMETER, row)) > Cosmology.HUBBLE_LAW_WARNING;
    }
    /** A copy of one column. */
    public double[] column(Quantity q) { return columns.get(q).clone(); }
    /** A copy of the input redshifts. */
    public double[] z() { return z.clone(); }
}
