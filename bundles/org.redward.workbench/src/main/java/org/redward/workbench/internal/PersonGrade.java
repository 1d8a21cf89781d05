package org.redward.workbench.internal;

import java.util.Locale;

/**
 * The person's own confidence in the redshift they settled on, independent of any estimator's
 * grading: four words that say what a reader of the catalogue may do with the value.
 */
enum PersonGrade {
    /** Several lines agree; no doubt. */
    SECURE("secure"),
    /** Right almost surely; one feature weak. */
    LIKELY("likely"),
    /** A guess worth keeping but not using for science without checking. */
    TENTATIVE("tentative"),
    /** No usable redshift. */
    NONE("none");

    private final String key;

    PersonGrade(String key) {
        this.key = key;
    }

    String key() {
        return key;
    }

    static PersonGrade parse(String s) {
        for (PersonGrade g : values()) {
            if (g.key.equals(s.toLowerCase(Locale.ROOT))) {
                return g;
            }
        }
        throw new IllegalArgumentException("grade '" + s + "': use one of secure, likely, tentative, none");
    }
}
