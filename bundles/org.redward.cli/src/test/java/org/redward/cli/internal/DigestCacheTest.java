package org.redward.cli.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DigestCacheTest {

    /** SHA-256("abc"): the one-block example of FIPS 180-2 (NIST), Appendix B.1. */
    static final String ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";

    @TempDir
    Path dir;

    @Test
    void digestOfFileMatchesTheStandardExample() throws Exception {
        Path f = Files.writeString(dir.resolve("abc.jar"), "abc", StandardCharsets.US_ASCII);
        assertEquals(ABC, ProductFacts.digest(f));
    }

    @Test
    void unchangedFileIsNotReadAgainInALaterRun() throws Exception {
        Path f = Files.writeString(dir.resolve("abc.jar"), "abc", StandardCharsets.US_ASCII);
        AtomicInteger reads = new AtomicInteger();
        Function<Path, String> counting = p -> {
            reads.incrementAndGet();
            return ProductFacts.digest(p);
        };
        DigestCache first = DigestCache.open(dir.resolve("cache"));
        assertEquals(ABC, first.digest(f, counting));
        first.save();
        DigestCache second = DigestCache.open(dir.resolve("cache"));
        assertEquals(ABC, second.digest(f, counting));
        assertEquals(1, reads.get());
    }

    @Test
    void changedFileIsReadAgain() throws Exception {
        Path f = Files.writeString(dir.resolve("x.jar"), "abc", StandardCharsets.US_ASCII);
        DigestCache first = DigestCache.open(dir.resolve("cache"));
        first.digest(f, ProductFacts::digest);
        first.save();
        // same size, new content and time: the digest must follow the content
        Files.writeString(f, "abd", StandardCharsets.US_ASCII);
        Files.setLastModifiedTime(f, FileTime.fromMillis(Files.getLastModifiedTime(f).toMillis() + 5_000));
        DigestCache second = DigestCache.open(dir.resolve("cache"));
        assertEquals(ProductFacts.digest(f), second.digest(f, ProductFacts::digest));
        assertEquals(false, second.digest(f, ProductFacts::digest).equals(ABC));
    }

    @Test
    void damagedOrUnwritableCacheOnlyCostsAReread() throws Exception {
        Path f = Files.writeString(dir.resolve("abc.jar"), "abc", StandardCharsets.US_ASCII);
        Path cache = Files.createDirectories(dir.resolve("cache"));
        Files.writeString(cache.resolve(DigestCache.FILE_NAME), "garbage\tline\n\u0000\u0001\n");
        assertEquals(ABC, DigestCache.open(cache).digest(f, ProductFacts::digest));
        Path notAFolder = Files.writeString(dir.resolve("plain-file"), "x");
        DigestCache unwritable = DigestCache.open(notAFolder);
        assertEquals(ABC, unwritable.digest(f, ProductFacts::digest));
        unwritable.save();
        assertEquals(ABC, DigestCache.open(null).digest(f, ProductFacts::digest));
    }
}
