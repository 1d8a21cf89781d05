package org.redward.formats.inputs.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.zip.GZIPInputStream;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.registry.Provided;

/**
 * Picks the reader (the forced one, else the highest sniff score) and the instrument profile
 * (the forced one, else the best match among the profiles meant for that reader) for a file.
 */
final class Chooser {

    /** Bytes of a file's start handed to {@link SpectrumReader#sniff}: three FITS blocks. */
    static final int HEAD_BYTES = 8640;
    /** A folder's file whose best sniff score is below this is not a spectrum: skipped silently. */
    static final int FOLDER_MIN_SCORE = org.redward.api.formats.SpectrumInputs.FOLDER_MIN_SCORE;

    /** The outcome: reader and profile, or why none. */
    record Choice(Provided<SpectrumReader> reader, Optional<InstrumentProfile> profile, int score, String problem) {
        boolean ok() {
            return problem == null;
        }
    }

    private Chooser() {
    }

    /** The first {@link #HEAD_BYTES} bytes, inflated if the file is gzip-compressed. */
    static byte[] head(Path file) throws IOException {
        try (InputStream raw = Files.newInputStream(file)) {
            byte[] two = raw.readNBytes(2);
            InputStream in = new java.io.SequenceInputStream(new java.io.ByteArrayInputStream(two), raw);
            if (two.length == 2 && (two[0] & 0xff) == 0x1f && (two[1] & 0xff) == 0x8b) {
                try {
                    in = new GZIPInputStream(in);
                    return in.readNBytes(HEAD_BYTES);
                } catch (IOException e) {
                    return two;
                }
            }
            return in.readNBytes(HEAD_BYTES);
        }
    }

    static Choice choose(Path file, byte[] head, ReadOptions options, List<Provided<SpectrumReader>> readers,
            List<Provided<InstrumentProfile>> profiles) {
        Optional<InstrumentProfile> forcedProfile = Optional.empty();
        if (options.profileId().isPresent()) {
            String id = options.profileId().get();
            forcedProfile = profiles.stream().filter(p -> p.id().equals(id)).map(Provided::service).findFirst();
            if (forcedProfile.isEmpty()) {
                return new Choice(null, Optional.empty(), 0, "no instrument profile '" + id + "' (available: "
                        + ids(profiles) + ")");
            }
        }
        String readerId = options.readerId().orElse(forcedProfile.map(InstrumentProfile::reader).filter(r -> !r.isEmpty()).orElse(null));
        Provided<SpectrumReader> best = null;
        int bestScore = 0;
        if (readerId != null) {
            for (Provided<SpectrumReader> r : readers) {
                if (r.id().equals(readerId)) {
                    best = r;
                    bestScore = 100;
                }
            }
            if (best == null) {
                return new Choice(null, Optional.empty(), 0, "no reader '" + readerId + "' (available: " + ids(readers) + ")");
            }
        } else {
            for (Provided<SpectrumReader> r : readers) {
                int s;
                try {
                    s = r.service().sniff(file, head);
                } catch (RuntimeException e) {
                    s = 0;
                }
                if (s > bestScore) {
                    best = r;
                    bestScore = s;
                }
            }
            if (best == null) {
                return new Choice(null, Optional.empty(), 0, "not a spectrum format any installed reader knows (readers: "
                        + ids(readers) + ")");
            }
        }
        if (forcedProfile.isPresent()) {
            return new Choice(best, forcedProfile, bestScore, null);
        }
        InstrumentProfile bestProfile = null;
        int bestMatch = 0;
        for (Provided<InstrumentProfile> p : profiles) {
            String pr = p.service().reader();
            if (!pr.isEmpty() && !pr.equals(best.id())) {
                continue;
            }
            int m;
            try {
                m = best.service().matches(file, head, p.service());
            } catch (RuntimeException e) {
                m = 0;
            }
            if (m > bestMatch) {
                bestMatch = m;
                bestProfile = p.service();
            }
        }
        return new Choice(best, Optional.ofNullable(bestProfile), bestScore, null);
    }

    private static String ids(List<? extends Provided<?>> list) {
        if (list.isEmpty()) {
            return "none";
        }
        StringBuilder sb = new StringBuilder();
        for (Provided<?> p : list) {
            sb.append(sb.length() == 0 ? "" : ", ").append(p.id());
        }
        return sb.toString();
    }
}
