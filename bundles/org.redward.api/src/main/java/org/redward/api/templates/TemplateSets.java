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

    /**
     * The contiguity rule every template follows: no wavelength step may exceed this many times
     * the median step (scaled by wavelength, so that log-sampled templates pass).
     */
    public static final double MAX_STEP_RATIO = 5.0;

    /**
     * Index {@code i} of the first gap, between {@code w[i]} and {@code w[i+1]}, by the
     * contiguity rule ({@link #MAX_STEP_RATIO}); -1 when there is none. The step at pixel i is
     * compared with {@code median_step * max(1, w[i] / w[middle])}.
     *
     * @param restVacuumAngstrom strictly increasing wavelengths (at least 2)
     */
    public static int firstGap(double[] restVacuumAngstrom) {
        double[] w = restVacuumAngstrom;
        double[] steps = new double[w.length - 1];
        for (int i = 1; i < w.length; i++) {
            steps[i - 1] = w[i] - w[i - 1];
        }
        double median = medianStep(w);
        for (int i = 0; i < steps.length; i++) {
            double local = median * Math.max(1.0, w[i] / w[steps.length / 2]);
            if (steps[i] > MAX_STEP_RATIO * local) {
                return i;
            }
        }
        return -1;
    }

    /** The median wavelength step (Angstrom) of strictly increasing wavelengths (at least 2). */
    public static double medianStep(double[] restVacuumAngstrom) {
        double[] steps = new double[restVacuumAngstrom.length - 1];
        for (int i = 1; i < restVacuumAngstrom.length; i++) {
            steps[i - 1] = restVacuumAngstrom[i] - restVacuumAngstrom[i - 1];
        }
        java.util.Arrays.sort(steps);
        return steps[steps.length / 2];
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
