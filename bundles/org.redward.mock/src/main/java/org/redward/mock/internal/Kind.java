package org.redward.mock.internal;

import org.redward.spectrum.ObjectClass;

/** What a mock fibre holds. */
public enum Kind {
    /** A galaxy dominated by an old stellar population: absorption lines, 4000 Angstrom break. */
    GALAXY_ABSORPTION("galaxy_absorption", ObjectClass.GALAXY),
    /** A star-forming galaxy: nebular emission lines on a young continuum. */
    GALAXY_EMISSION("galaxy_emission", ObjectClass.GALAXY),
    /** A broad-line quasar. */
    QUASAR("quasar", ObjectClass.QUASAR),
    /** A star of the Galaxy. */
    STAR("star", ObjectClass.STAR),
    /** A fibre on blank sky: sky-subtracted noise only. */
    EMPTY("empty", ObjectClass.UNKNOWN),
    /** A broken fibre: no light (wholly or on part of the detector). */
    BROKEN("broken", ObjectClass.UNKNOWN);

    private final String key;
    private final ObjectClass objectClass;

    Kind(String key, ObjectClass c) {
        this.key = key;
        this.objectClass = c;
    }

    public String key() {
        return key;
    }

    public ObjectClass objectClass() {
        return objectClass;
    }

    /** True if the fibre holds an object with a redshift to measure. */
    public boolean hasRedshift() {
        return this != EMPTY && this != BROKEN;
    }

    public static Kind parse(String key) {
        for (Kind k : values()) {
            if (k.key.equals(key)) {
                return k;
            }
        }
        throw new IllegalArgumentException("unknown kind '" + key + "'");
    }
}
