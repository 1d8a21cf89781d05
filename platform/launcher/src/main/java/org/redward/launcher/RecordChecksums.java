package org.redward.launcher;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * Build-time step of the product assembly: writes {@code checksums.sha256} in the product folder,
 * one line {@code <sha256>  <path relative to the product>} per bundle jar, which
 * {@code redward plugins --verify} later checks.
 */
public final class RecordChecksums {

    private RecordChecksums() {
    }

    public static void main(String[] args) throws IOException, NoSuchAlgorithmException {
        Path home = Paths.get(args[0]).toAbsolutePath();
        List<Path> jars;
        try (Stream<Path> s = Files.walk(home.resolve("bundles"))) {
            jars = s.filter(p -> p.toString().endsWith(".jar")).sorted().collect(Collectors.toList());
        }
        StringBuilder sb = new StringBuilder("# SHA-256 of every bundle of this product, recorded at build time\n");
        for (Path jar : jars) {
            sb.append(sha256(jar)).append("  ").append(home.relativize(jar).toString().replace('\\', '/')).append('\n');
        }
        Files.writeString(home.resolve("checksums.sha256"), sb.toString());
    }

    static String sha256(Path file) throws IOException, NoSuchAlgorithmException {
        MessageDigest md = MessageDigest.getInstance("SHA-256");
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buf = new byte[1 << 16];
            int n;
            while ((n = in.read(buf)) > 0) {
                md.update(buf, 0, n);
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }
}
