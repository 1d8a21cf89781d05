package org.redward.cli.internal;

import java.io.IOException;
import java.io.InputStream;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Properties;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.redward.api.commands.PlatformInfo;

/**
 * Facts about the running product for {@code plugins} and provenance: the product version and
 * every installed bundle with its origin folder and the SHA-256 of its jar (kept between runs
 * by {@link DigestCache} while the jar's path, size and modification time are unchanged).
 */
@Component(service = PlatformInfo.class)
public final class ProductFacts implements PlatformInfo {

    /** Framework property naming the folder of the digest cache (default: see {@link DigestCache#defaultFolder}). */
    static final String CACHE_DIR = "redward.cache.dir";

    private BundleContext context;
    private String version;
    private DigestCache digests;

    @Activate
    void activate(BundleContext bc) {
        this.context = bc;
        this.digests = DigestCache.open(DigestCache.defaultFolder(bc.getProperty(CACHE_DIR)));
        String v = bc.getProperty("redward.version");
        this.version = v == null || v.equals("unknown") ? versionOf(Path.of(String.valueOf(bc.getProperty("redward.home")))) : v;
    }

    @Override
    public String productVersion() {
        return version;
    }

    @Override
    public List<BundleRecord> bundles() {
        List<BundleRecord> out = new ArrayList<>();
        for (Bundle b : context.getBundles()) {
            Path jar = jarOf(b);
            String origin = b.getBundleId() == 0 ? "system" : jar == null ? b.getLocation() : String.valueOf(jar.getParent());
            String sha = jar == null ? "" : digests.digest(jar, ProductFacts::digest);
            out.add(new BundleRecord(b.getBundleId(), String.valueOf(b.getSymbolicName()), b.getVersion().toString(),
                    stateName(b.getState()), origin, sha));
        }
        digests.save();
        return out;
    }

    /** The jar a bundle was installed from, if it was a file. */
    static Path jarOf(Bundle b) {
        String loc = b.getLocation();
        if (loc.startsWith("reference:")) {
            loc = loc.substring("reference:".length());
        }
        if (!loc.startsWith("file:")) {
            return null;
        }
        try {
            return Path.of(URI.create(loc));
        } catch (RuntimeException e) {
            return null;
        }
    }

    /** The SHA-256 of the file's bytes, read now (hex); empty if it cannot be read. */
    static String digest(Path file) {
        try (InputStream in = new DigestInputStream(Files.newInputStream(file), MessageDigest.getInstance("SHA-256"))) {
            byte[] buf = new byte[1 << 16];
            DigestInputStream d = (DigestInputStream) in;
            while (d.read(buf) >= 0) {
                // reading updates the digest
            }
            return HexFormat.of().formatHex(d.getMessageDigest().digest());
        } catch (IOException | NoSuchAlgorithmException e) {
            return "";
        }
    }

    static String stateName(int state) {
        switch (state) {
            case Bundle.INSTALLED: return "installed";
            case Bundle.RESOLVED: return "resolved";
            case Bundle.STARTING: return "starting";
            case Bundle.ACTIVE: return "active";
            case Bundle.STOPPING: return "stopping";
            default: return "uninstalled";
        }
    }

    /** The product version recorded in conf/redward.properties, or "unknown". */
    static String versionOf(Path home) {
        Path f = home.resolve("conf").resolve("redward.properties");
        Properties p = new Properties();
        if (Files.isRegularFile(f)) {
            try (InputStream in = Files.newInputStream(f)) {
                p.load(in);
            } catch (IOException e) {
                return "unknown";
            }
        }
        return p.getProperty("redward.version", "unknown").toLowerCase(Locale.ROOT);
    }
}
