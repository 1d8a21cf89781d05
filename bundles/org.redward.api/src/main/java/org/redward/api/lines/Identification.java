package org.redward.api.lines;

import java.util.List;
import java.util.Optional;

/**
 * The identifier's answer: ranked redshift hypotheses (best first) for a set of detected lines,
 * and what a user must be told about them.
 *
 * <p>When the best hypothesis rests on a single line, the identity of that line is ambiguous:
 * {@link #singleLine()} is true and {@link #singleLineCandidates()} lists every line of the list
 * that could be it, each with the redshift it implies (best first by the line's weight). A
 * redshift from one line is never given as if it were certain.
 *
 * <p>Immutable and thread-safe.
 *
 * @param detected the detected lines that were identified (indices of matches refer to this list)
 * @param hypotheses ranked hypotheses, best first; empty if nothing could be explained
 * @param singleLineCandidates when the best hypothesis rests on one line: every candidate identity and its z
 * @param warnings statements a user must read (ambiguity, disagreeing lines, nothing found)
 * @param lineListId id of the list used
 * @param lineListVersion version of the list used
 */
public record Identification(List<DetectedLine> detected, List<RedshiftHypothesis> hypotheses,
        List<LineMatch> singleLineCandidates, List<String> warnings, String lineListId, String lineListVersion) {

    public Identification {
        detected = List.copyOf(detected);
        hypotheses = List.copyOf(hypotheses);
        singleLineCandidates = List.copyOf(singleLineCandidates);
        warnings = List.copyOf(warnings);
    }

    public Optional<RedshiftHypothesis> best() {
        return hypotheses.isEmpty() ? Optional.empty() : Optional.of(hypotheses.get(0));
    }

    /** True if the best hypothesis explains only one detected line. */
    public boolean singleLine() {
        return !hypotheses.isEmpty() && hypotheses.get(0).matchedCount() == 1;
    }
}
