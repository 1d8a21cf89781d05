package org.redward.api.commands;

import java.util.List;

import org.osgi.annotation.versioning.ProviderType;

/**
 * Facts about the running product, for {@code plugins} and for provenance records: the product
 * version and every installed bundle with where it came from and its checksum.
 */
@ProviderType
public interface PlatformInfo {

    /** The product version (e.g. {@code 0.1.0}). */
    String productVersion();

    /** Every installed bundle, in installation order. */
    List<BundleRecord> bundles();

    /** One installed bundle. */
    final class BundleRecord {
        private final long id;
        private final String symbolicName;
        private final String version;
        private final String state;
        private final String origin;
        private final String sha256;

        public BundleRecord(long id, String symbolicName, String version, String state, String origin, String sha256) {
            this.id = id;
            this.symbolicName = symbolicName;
            this.version = version;
            this.state = state;
            this.origin = origin;
            this.sha256 = sha256;
        }

        public long id() { return id; }
        public String symbolicName() { return symbolicName; }
        public String version() { return version; }
        /** installed, resolved, starting, active, stopping or uninstalled. */
        public String state() { return state; }
        /** The folder the jar came from (the product's feature folder or a --bundles folder), or "system". */
        public String origin() { return origin; }
        /** SHA-256 of the jar, lower-case hex; empty for the system bundle. */
        public String sha256() { return sha256; }
    }
}
