package org.redward.api.formats;

import java.time.Duration;
import java.util.Objects;
import java.util.Optional;

/**
 * How the reading facade ({@link SpectrumInputs}) should read: a forced instrument profile, a
 * forced reader, and the time bound per file. Immutable; build with {@link #defaults()} and the
 * {@code with...} methods.
 */
public final class ReadOptions {

    /** The default time a file may go without yielding its next record: 60 s. */
    public static final Duration DEFAULT_STALL_LIMIT = Duration.ofSeconds(60);

    private static final ReadOptions DEFAULTS = new ReadOptions(null, null, DEFAULT_STALL_LIMIT);

    private final String profileId;
    private final String readerId;
    private final Duration stallLimit;

    private ReadOptions(String profileId, String readerId, Duration stallLimit) {
        this.profileId = profileId;
        this.readerId = readerId;
        this.stallLimit = stallLimit;
    }

    /** No forced profile or reader; a stall limit of {@link #DEFAULT_STALL_LIMIT}. */
    public static ReadOptions defaults() {
        return DEFAULTS;
    }

    /** Forces this instrument profile (null: choose by sniffing). */
    public ReadOptions withProfile(String id) {
        return new ReadOptions(blankToNull(id), readerId, stallLimit);
    }

    /** Forces this reader (null: choose by sniffing). */
    public ReadOptions withReader(String id) {
        return new ReadOptions(profileId, blankToNull(id), stallLimit);
    }

    /**
     * The per-file time bound: the longest a file may take to open or to yield its next
     * spectrum. A file that exceeds it is abandoned and reported as failed; the batch goes on.
     */
    public ReadOptions withStallLimit(Duration limit) {
        Objects.requireNonNull(limit, "limit");
        if (limit.isNegative() || limit.isZero()) {
            throw new IllegalArgumentException("stall limit must be positive: " + limit);
        }
        return new ReadOptions(profileId, readerId, limit);
    }

    public Optional<String> profileId() { return Optional.ofNullable(profileId); }
    public Optional<String> readerId() { return Optional.ofNullable(readerId); }
    public Duration stallLimit() { return stallLimit; }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.trim();
    }

    @Override
    public String toString() {
        return "ReadOptions[profile=" + profileId + ", reader=" + readerId + ", stallLimit=" + stallLimit + "]";
    }
}
