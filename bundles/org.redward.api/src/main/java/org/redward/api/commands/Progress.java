package org.redward.api.commands;

import org.osgi.annotation.versioning.ProviderType;

/** Progress of one long task. Thread-safe: workers may call {@link #advance} concurrently. */
@ProviderType
public interface Progress extends AutoCloseable {

    /** Marks {@code items} more work items done. */
    void advance(long items);

    /** Sets the total, when it becomes known. */
    void total(long total);

    /** Ends the display (prints the final line on a terminal). */
    @Override
    void close();
}
