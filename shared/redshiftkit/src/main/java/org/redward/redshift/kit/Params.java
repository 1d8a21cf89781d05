package org.redward.redshift.kit;

import java.util.Map;

/** Reads numeric parameters from an estimation context's parameter map. */
public final class Params {

    private Params() {
    }

    /**
     * @throws IllegalArgumentException naming the parameter when its text is not a number
     */
    public static double number(Map<String, String> p, String key, double dflt) {
        String v = p.get(key);
        if (v == null || v.isBlank()) {
            return dflt;
        }
        try {
            return Double.parseDouble(v.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("parameter " + key + ": '" + v + "' is not a number");
        }
    }
}
