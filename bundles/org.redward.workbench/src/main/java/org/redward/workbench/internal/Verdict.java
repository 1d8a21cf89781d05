package org.redward.workbench.internal;

import java.util.Locale;

/** What the person decided about one spectrum. */
enum Verdict {
    /** The machine's best solution is right. */
    ACCEPTED,
    /** A runner-up solution is right. */
    ALTERNATIVE,
    /** z was set by clicking a feature and naming its line. */
    LINE,
    /** z was typed in. */
    TYPED,
    /** No redshift can be had from this spectrum. */
    NO_REDSHIFT;

    String key() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    static Verdict parse(String key) {
        return valueOf(key.toUpperCase(Locale.ROOT).replace('-', '_'));
    }
}
