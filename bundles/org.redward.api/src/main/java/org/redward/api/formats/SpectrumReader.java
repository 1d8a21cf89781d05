package org.redward.api.formats;

import java.nio.file.Path;
import java.util.Optional;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * Reads spectra from files of one family of layouts. Registered as a service with the
 * properties {@value org.redward.api.registry.Provided#ID} and
 * {@value org.redward.api.registry.Provided#DESCRIPTION}.
 *
 * <p>Thread-safe: several files may be opened at once from different threads.
 */
@ConsumerType
public interface SpectrumReader {

    /**
     * How sure this reader is that it can read the file, 0 (cannot) to 100 (certain), judged
     * from the first bytes of the file. Must be cheap and must not throw.
     *
     * @param head up to the first 8640 bytes of the file (three FITS blocks), decompressed if gzip
     */
    int sniff(Path file, byte[] head);

    /**
     * How well an instrument profile fits the file, 0 (not at all) to 100 (certain), judged from
     * the file's headers (e.g. the profile's {@code match.*} settings against the primary header).
     * Called only for profiles meant for this reader. Must be cheap and must not throw.
     */
    default int matches(Path file, byte[] head, InstrumentProfile profile) {
        return 0;
    }

    /**
     * Opens the file for streaming.
     *
     * @param profile an instrument profile to apply (forced by the user or found by sniffing), if any
     * @throws SpectrumReadException if the file as a whole cannot be read (not this format,
     *     truncated, missing HDU or column...)
     */
    SpectrumSource open(Path file, Optional<InstrumentProfile> profile) throws SpectrumReadException;
}
