package org.redward.api.catalog;

import java.util.Objects;
import java.util.Set;

/**
 * One column of a catalogue table: name (snake_case, unit in the name where it has one), value
 * type, unit (a string of the IVOA VOUnits recommendation, e.g. {@code km/s}, {@code Mpc},
 * {@code deg}; empty if dimensionless), UCD (IVOA UCD1+ word list; empty where the vocabulary has
 * none) and a one-line description. Immutable.
 *
 * <p>Values of a row are boxed: {@link Double} (NaN for missing), {@link Long}, {@link Integer},
 * {@link Boolean} or {@link String} (never null in a row: empty for missing).
 */
public record Column(String name, Class<?> type, String unit, String ucd, String description) {

    private static final Set<Class<?>> TYPES = Set.of(Double.class, Long.class, Integer.class, Boolean.class, String.class);

    public Column {
        Objects.requireNonNull(name, "name");
        if (!TYPES.contains(type)) {
            throw new IllegalArgumentException("column " + name + ": unsupported type " + type);
        }
        unit = unit == null ? "" : unit;
        ucd = ucd == null ? "" : ucd;
        description = description == null ? "" : description;
    }

    public static Column ofDouble(String name, String unit, String ucd, String description) {
        return new Column(name, Double.class, unit, ucd, description);
    }

    public static Column ofLong(String name, String ucd, String description) {
        return new Column(name, Long.class, "", ucd, description);
    }

    public static Column ofInt(String name, String ucd, String description) {
        return new Column(name, Integer.class, "", ucd, description);
    }

    public static Column ofString(String name, String ucd, String description) {
        return new Column(name, String.class, "", ucd, description);
    }

    public static Column ofBoolean(String name, String ucd, String description) {
        return new Column(name, Boolean.class, "", ucd, description);
    }
}
