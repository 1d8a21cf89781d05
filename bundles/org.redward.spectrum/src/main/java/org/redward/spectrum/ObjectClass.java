package org.redward.spectrum;

import java.util.Locale;

/** What kind of object a spectrum belongs to. */
public enum ObjectClass {
    GALAXY, QUASAR, STAR, UNKNOWN;

    /** Lower-case key used in machine-readable output: galaxy, quasar, star, unknown. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Parses a key (case-insensitive); unrecognised text gives UNKNOWN. */
    public static ObjectClass parse(String text) {
        if (text == null) {
            return UNKNOWN;
        }
        String t = text.trim().toUpperCase(Locale.ROOT);
        if (t.equals("QSO")) {
            return QUASAR;
        }
        for (ObjectClass c : values()) {
            if (c.name().equals(t)) {
                return c;
            }
        }
        return UNKNOWN;
    }
}
