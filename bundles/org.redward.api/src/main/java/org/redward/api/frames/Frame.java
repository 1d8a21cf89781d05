package org.redward.api.frames;

/** The standards of rest a redshift may be given in. */
public enum Frame {
    /** As observed at the telescope: nothing corrected. */
    TOPOCENTRIC("topocentric"),
    /** Relative to the Sun's centre. */
    HELIOCENTRIC("heliocentric"),
    /** Relative to the solar-system barycentre (Wright &amp; Eastman 2014). */
    BARYCENTRIC("barycentric"),
    /** Relative to the cosmic microwave background (the solar-system dipole removed). */
    CMB("cmb"),
    /** Relative to the Local Group barycentre (one of {@link LocalGroupApex}). */
    LOCAL_GROUP("local-group");

    private final String key;

    Frame(String key) {
        this.key = key;
    }

    /** The name used on the command line and in output, e.g. {@code local-group}. */
    public String key() {
        return key;
    }

    /** The frame with this key (case-insensitive; {@code lg} and {@code local_group} accepted). */
    public static Frame parse(String s) {
        String k = s.trim().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
        if (k.equals("lg")) {
            return LOCAL_GROUP;
        }
        for (Frame f : values()) {
            if (f.key.equals(k)) {
                return f;
            }
        }
        throw new IllegalArgumentException("unknown frame '" + s + "' (known: topocentric, heliocentric, barycentric, cmb, local-group)");
    }
}
