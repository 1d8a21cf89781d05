package org.redward.api.cosmology;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Every {@link Quantity} at one redshift under one cosmology, with the warnings a reader must
 * see (e.g. where the Hubble law is off by more than {@link Cosmology#HUBBLE_LAW_WARNING}).
 * Immutable and thread-safe.
 */
public final class Distances {

    private final double z;
    private final CosmologyParameters parameters;
    private final EnumMap<Quantity, Double> values;
    private final List<String> warnings;

    private Distances(double z, CosmologyParameters parameters, Map<Quantity, Double> values, List<String> warnings) {
        this.z = z;
        this.parameters = Objects.requireNonNull(parameters);
        this.values = new EnumMap<>(values);
        this.warnings = List.copyOf(warnings);
        for (Quantity q : Quantity.values()) {
            if (!this.values.containsKey(q)) {
                throw new IllegalArgumentException("missing quantity " + q.key());
            }
        }
    }

    /** @param values one value per {@link Quantity} (all must be present) */
    public static Distances of(double z, CosmologyParameters parameters, Map<Quantity, Double> values, List<String> warnings) {
        return new Distances(z, parameters, values, warnings);
    }

    /** The redshift these values are for. */
    public double z() { return z; }
    /** The cosmology they were computed under. */
    public CosmologyParameters parameters() { return parameters; }
    /** One quantity. */
    public double get(Quantity q) { return values.get(q); }
    /** Every quantity, in {@link Quantity} order (a copy). */
    public Map<Quantity, Double> values() { return new EnumMap<>(values); }
    /** Human-readable warnings (empty when nothing may mislead). */
    public List<String> warnings() { return warnings; }

    public double comovingMpc() { return get(Quantity.COMOVING_MPC); }
    public double transverseComovingMpc() { return get(Quantity.TRANSVERSE_COMOVING_MPC); }
    public double angularDiameterMpc() { return get(Quantity.ANGULAR_DIAMETER_MPC); }
    public double luminosityMpc() { return get(Quantity.LUMINOSITY_MPC); }
    public double distanceModulusMag() { return get(Quantity.DISTANCE_MODULUS_MAG); }
    public double lookbackGyr() { return get(Quantity.LOOKBACK_GYR); }
    public double ageGyr() { return get(Quantity.AGE_GYR); }
    public double hubbleLawMpc() { return get(Quantity.HUBBLE_LAW_MPC); }

    @Override
    public String toString() {
        return "Distances[z=" + z + ", " + parameters.name() + ", " + values + "]";
    }
}
