package org.redward.api.templates;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * The one checksum rule of every template set, and a plain immutable {@link TemplateSet} for
 * providers that do not need their own class.
 *
 * <p><b>Checksum rule</b> ({@link #checksum(List)}): SHA-256 over, for each template in list
 * order, the UTF-8 bytes of {@code id}, a 0 byte, the class key, a 0 byte, the subclass, a 0
 * byte, the pixel count as a big-endian int, then every rest vacuum wavelength and every flux
 * value as big-endian IEEE-754 doubles ({@code Double.doubleToLongBits}, so -0.0 and 0.0
 * differ). The set's id, version and description are not part of it: the checksum names the
 * data, so two sets that hold the same numbers share it. Lower-case hexadecimal, 64 characters.
 * The conformance kit checks that every set's {@link TemplateSet#checksum()} follows this rule.
 *
 * <p>Stateless and thread-safe.
 */
public final class TemplateSets {

    private TemplateSets() {
    }

    /** SHA-256 of the templates by the rule above (lower-case hex). */
    public static String checksum(List<Template> templates) {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
        for (Template t : templates) {
            md.update(t.id().getBytes(StandardCharsets.UTF_8));
            md.update((byte) 0);
            md.update(t.objectClass().key().getBytes(StandardCharsets.UTF_8));
            md.update((byte) 0);
            md.update(t.subclass().getBytes(StandardCharsets.UTF_8));
            md.update((byte) 0);
            double[] w = t.restVacuumAngstrom();
            double[] f = t.flux();
            ByteBuffer b = ByteBuffer.allocate(4 + 16 * w.length);
            b.putInt(w.length);
            for (double v : w) {
                b.putLong(Double.doubleToLongBits(v));
            }
            for (double v : f) {
                b.putLong(Double.doubleToLongBits(v));
            }
            md.update(b.array());
        }
        StringBuilder sb = new StringBuilder(64);
        for (byte x : md.digest()) {
            sb.append(Character.forDigit((x >> 4) & 0xf, 16)).append(Character.forDigit(x & 0xf, 16));
        }
        return sb.toString();
    }

    /**
     * An immutable template set whose checksum follows the rule above.
     *
     * @throws IllegalArgumentException if the id is blank, the list is empty or two templates
     *     share an id
     */
    public static TemplateSet of(String id, String version, String description, List<Template> templates) {
        Objects.requireNonNull(id, "id");
        if (id.isBlank()) {
            throw new IllegalArgumentException("template set id is blank");
        }
        if (templates.isEmpty()) {
            throw new IllegalArgumentException("template set " + id + " has no templates");
        }
        Set<String> seen = new HashSet<>();
        for (Template t : templates) {
            if (!seen.add(t.id())) {
                throw new IllegalArgumentException("template set " + id + ": two templates named " + t.id());
            }
        }
        List<Template> copy = List.copyOf(templates);
        return new Plain(id, version == null ? "" : version, description == null ? "" : description, copy, checksum(copy));
    }

    private record Plain(String id, String version, String description, List<Template> templates, String checksum)
            implements TemplateSet {
        @Override
        public String toString() {
            return "TemplateSet[" + id + " " + version + ", " + templates.size() + " templates, sha256 "
                    + checksum.substring(0, 12) + "...]";
        }
    }
}
