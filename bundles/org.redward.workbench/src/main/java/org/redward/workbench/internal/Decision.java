package org.redward.workbench.internal;

import java.time.Instant;
import java.util.Objects;

/**
 * One decision of a person about one spectrum, as journalled.
 *
 * @param key the queue item's key ({@code file#index})
 * @param verdict what was decided
 * @param z the redshift settled on (NaN for {@link Verdict#NO_REDSHIFT})
 * @param estimator the estimator whose solution was taken (empty for a line or typed z)
 * @param line the line named by the person (empty unless {@link Verdict#LINE})
 * @param grade the person's own grade
 * @param note free text
 * @param who the person (operating-system user unless given)
 * @param when when it was decided (UTC)
 */
record Decision(String key, Verdict verdict, double z, String estimator, String line, PersonGrade grade, String note,
        String who, Instant when) {
    Decision {
        Objects.requireNonNull(key);
        Objects.requireNonNull(verdict);
        Objects.requireNonNull(grade);
        estimator = estimator == null ? "" : estimator;
        line = line == null ? "" : line;
        note = note == null ? "" : note;
        who = who == null ? "" : who;
        Objects.requireNonNull(when);
    }

    Decision withGrade(PersonGrade g) {
        return new Decision(key, verdict, z, estimator, line, g, note, who, when);
    }

    Decision withNote(String n) {
        return new Decision(key, verdict, z, estimator, line, grade, n, who, when);
    }
}
