package org.redward.templates.internal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.api.templates.TemplateSets;
import org.redward.spectrum.AirVacuum;
import org.redward.spectrum.ObjectClass;

/**
 * Turns a {@link Descriptor} and the files it names into a {@link TemplateSet}: reads each file
 * ({@link TemplateFiles}), converts units to Angstrom and air to vacuum (Morton 2000, through
 * {@link AirVacuum}), trims padding at both ends, applies the trusted range, checks the data
 * (increasing wavelengths, no gaps, no bad pixels unless interpolation is asked for, plausible
 * wavelength range), and computes the checksum by the rule of {@link TemplateSets}.
 *
 * <p>Any problem is a {@link TemplateDataException} whose message names the origin (bundle or
 * folder), the file and what is wrong. Stateless and thread-safe.
 */
public final class TemplateSetLoader {

    /** Fewest pixels a usable template keeps after trimming. */
    static final int MIN_PIXELS = 10;
    /** Plausible rest wavelengths (Angstrom) of an optical/UV/IR template; outside: wrong unit. */
    static final double MIN_PLAUSIBLE_ANGSTROM = 100.0;
    static final double MAX_PLAUSIBLE_ANGSTROM = 1.0e6;

    private static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");

    /** Reads a file inside the bundle (path relative to the bundle root); null when absent. */
    @FunctionalInterface
    public interface Resources {
        byte[] read(String path) throws IOException;
    }

    /** A loaded set with what was done to the data on the way (trimmed padding, interpolated pixels...). */
    public record Loaded(TemplateSet set, List<String> notes, String descriptorPath) {
    }

    private TemplateSetLoader() {
    }

    public static Loaded load(String origin, String descriptorPath, Resources resources) throws TemplateDataException {
        byte[] raw;
        try {
            raw = resources.read(descriptorPath);
        } catch (IOException e) {
            throw new TemplateDataException(origin + ": cannot read descriptor " + descriptorPath + " (" + e.getMessage() + ")", e);
        }
        if (raw == null) {
            throw new TemplateDataException(origin + ": descriptor " + descriptorPath + " named in the "
                    + TemplateSet.BUNDLE_HEADER + " header is not in the bundle");
        }
        try {
            return load(Descriptor.parse(descriptorPath, raw), resources);
        } catch (TemplateDataException e) {
            throw new TemplateDataException(origin + ": " + e.getMessage(), e);
        }
    }

    /**
     * Loads every set a data-only bundle jar declares, as the extender would once the bundle is
     * installed (for {@code templates pack} checks and for tests without a framework).
     */
    public static List<Loaded> loadJar(java.nio.file.Path jar) throws TemplateDataException, IOException {
        try (java.util.jar.JarFile jf = new java.util.jar.JarFile(jar.toFile())) {
            java.util.jar.Manifest mf = jf.getManifest();
            String header = mf == null ? null : mf.getMainAttributes().getValue(TemplateSet.BUNDLE_HEADER);
            if (header == null) {
                throw new TemplateDataException(jar + ": no " + TemplateSet.BUNDLE_HEADER + " header in the manifest");
            }
            List<Loaded> out = new ArrayList<>();
            for (String d : TemplateExtender.descriptorPaths(header)) {
                out.add(load(jar.getFileName().toString(), d, path -> {
                    java.util.jar.JarEntry e = jf.getJarEntry(path);
                    if (e == null) {
                        return null;
                    }
                    try (java.io.InputStream in = jf.getInputStream(e)) {
                        return in.readAllBytes();
                    }
                }));
            }
            return out;
        }
    }

    static Loaded load(Descriptor d, Resources resources) throws TemplateDataException {
        String id = d.required(Descriptor.ID);
        if (!ID.matcher(id).matches()) {
            throw new TemplateDataException("descriptor " + d.path() + ": id '" + id
                    + "' must be letters, digits, '.', '_' or '-' (starting with a letter or digit)");
        }
        String version = d.optional(Descriptor.VERSION, "1.0.0");
        List<String> notes = new ArrayList<>();
        List<Template> templates = new ArrayList<>();
        for (String name : d.templateNames()) {
            templates.add(loadOne(d, name, resources, notes));
        }
        if (templates.isEmpty()) {
            throw new TemplateDataException("descriptor " + d.path() + ": the list 'templates' is empty");
        }
        String description = d.optional(Descriptor.DESCRIPTION, "template set " + id);
        try {
            return new Loaded(TemplateSets.of(id, version, description, templates), List.copyOf(notes), d.path());
        } catch (IllegalArgumentException e) {
            throw new TemplateDataException("descriptor " + d.path() + ": " + e.getMessage());
        }
    }

    private static Template loadOne(Descriptor d, String name, Resources resources, List<String> notes) throws TemplateDataException {
        String file = d.requiredOf(name, Descriptor.FILE);
        String path = file.startsWith("/") ? file.substring(1) : d.folder() + file;
        String where = "template '" + name + "' (file " + path + ")";
        ObjectClass cls = ObjectClass.parse(d.requiredOf(name, Descriptor.CLASS));
        if (cls == ObjectClass.UNKNOWN) {
            throw new TemplateDataException(where + ": class '" + d.requiredOf(name, Descriptor.CLASS)
                    + "' is not one of galaxy, quasar, star");
        }
        String medium = Descriptor.lower(d.requiredOf(name, Descriptor.MEDIUM));
        if (!medium.equals("air") && !medium.equals("vacuum")) {
            throw new TemplateDataException(where + ": medium '" + medium + "' must be air or vacuum");
        }
        byte[] data;
        try {
            data = resources.read(path);
        } catch (IOException e) {
            throw new TemplateDataException(where + ": cannot read (" + e.getMessage() + ")", e);
        }
        if (data == null) {
            throw new TemplateDataException(where + ": the file is not in the bundle");
        }
        TemplateFiles.Columns c;
        try {
            c = TemplateFiles.read(path, data, d.of(name, Descriptor.WAVELENGTH_COLUMN, null), d.of(name, Descriptor.FLUX_COLUMN, null));
        } catch (TemplateDataException e) {
            throw new TemplateDataException("template '" + name + "': " + e.getMessage(), e);
        }
        if (c.wavelength().length != c.flux().length) {
            throw new TemplateDataException(where + ": " + c.wavelength().length + " wavelengths but " + c.flux().length + " flux values");
        }
        String unit = Descriptor.lower(d.of(name, Descriptor.UNIT, "auto"));
        if (unit.equals("auto")) {
            unit = unitFromHint(c.unitHint());
        }
        double[] w = toAngstrom(where, c.wavelength(), unit);
        double[] f = c.flux();
        // trim padding (zeros or non-finite values) at both ends
        int lo = 0;
        int hi = f.length - 1;
        while (lo <= hi && (!(f[lo] != 0) || !Double.isFinite(f[lo]) || !Double.isFinite(w[lo]))) {
            lo++;
        }
        while (hi >= lo && (!(f[hi] != 0) || !Double.isFinite(f[hi]) || !Double.isFinite(w[hi]))) {
            hi--;
        }
        if (hi - lo + 1 < MIN_PIXELS) {
            throw new TemplateDataException(where + ": fewer than " + MIN_PIXELS + " pixels with flux (all zero or NaN?)");
        }
        if (lo > 0 || hi < f.length - 1) {
            notes.add(String.format(Locale.ROOT, "%s: trimmed %d padding pixels (zero or NaN) at the ends", where, lo + f.length - 1 - hi));
        }
        w = Arrays.copyOfRange(w, lo, hi + 1);
        f = Arrays.copyOfRange(f, lo, hi + 1);
        for (int i = 0; i < w.length; i++) {
            if (!Double.isFinite(w[i])) {
                throw new TemplateDataException(where + ": non-finite wavelength at pixel " + (lo + i));
            }
            if (i > 0 && !(w[i] > w[i - 1])) {
                throw new TemplateDataException(String.format(Locale.ROOT,
                        "%s: wavelengths not strictly increasing at pixel %d (%.4f after %.4f)", where, lo + i, w[i], w[i - 1]));
            }
        }
        if (medium.equals("air")) {
            for (int i = 0; i < w.length; i++) {
                w[i] = AirVacuum.airToVacuumAngstrom(w[i]);
            }
        }
        if (w[0] < MIN_PLAUSIBLE_ANGSTROM || w[w.length - 1] > MAX_PLAUSIBLE_ANGSTROM) {
            throw new TemplateDataException(String.format(Locale.ROOT,
                    "%s: wavelengths %.6g to %.6g Angstrom after conversion from '%s' are implausible for a template: is the unit right?",
                    where, w[0], w[w.length - 1], unit));
        }
        String trust = d.of(name, Descriptor.TRUST, null);
        if (trust != null) {
            double[] range = parseRange(where, trust);
            int a = 0;
            while (a < w.length && w[a] < range[0]) {
                a++;
            }
            int b = w.length - 1;
            while (b >= a && w[b] > range[1]) {
                b--;
            }
            if (b - a + 1 < MIN_PIXELS) {
                throw new TemplateDataException(where + ": fewer than " + MIN_PIXELS + " pixels inside the trusted range " + trust);
            }
            w = Arrays.copyOfRange(w, a, b + 1);
            f = Arrays.copyOfRange(f, a, b + 1);
        }
        checkGaps(where, w);
        boolean zeroBad = Boolean.parseBoolean(d.of(name, Descriptor.ZERO_IS_BAD, "false"));
        String badPolicy = Descriptor.lower(d.of(name, Descriptor.BAD_PIXELS, "reject"));
        if (!badPolicy.equals("reject") && !badPolicy.equals("interpolate")) {
            throw new TemplateDataException(where + ": bad-pixels '" + badPolicy + "' must be reject or interpolate");
        }
        int bad = 0;
        int firstBad = -1;
        boolean allZero = true;
        for (int i = 0; i < f.length; i++) {
            if (!Double.isFinite(f[i]) || (zeroBad && f[i] == 0)) {
                bad++;
                if (firstBad < 0) {
                    firstBad = i;
                }
            } else if (f[i] != 0) {
                allZero = false;
            }
        }
        if (allZero) {
            throw new TemplateDataException(where + ": the flux is zero everywhere");
        }
        if (!zeroBad) {
            int zeros = 0;
            for (double v : f) {
                zeros += v == 0 ? 1 : 0;
            }
            if (zeros > 0) {
                notes.add(where + ": " + zeros + " interior pixels have flux exactly 0 and are kept as data;"
                        + " if they are masked pixels, declare zero-is-bad (templates pack --zero-is-bad --bad-pixels interpolate)");
            }
        }
        if (bad > 0) {
            if (badPolicy.equals("reject")) {
                throw new TemplateDataException(String.format(Locale.ROOT,
                        "%s: %d bad pixels (NaN%s), the first at %.2f Angstrom; set bad-pixels = interpolate to bridge them",
                        where, bad, zeroBad ? " or zero" : "", w[firstBad]));
            }
            interpolate(f, w, zeroBad);
            notes.add(where + ": interpolated linearly across " + bad + " bad pixels");
        }
        String subclass = d.of(name, Descriptor.SUBCLASS, name);
        return Template.of(name, cls, subclass, w, f);
    }

    static String unitFromHint(String hint) {
        String h = Descriptor.lower(hint == null ? "" : hint.trim());
        if (h.isEmpty() || h.startsWith("angstrom") || h.equals("a") || h.equals("aa") || h.equals("0.1 nm")) {
            return "angstrom";
        }
        if (h.equals("nm") || h.startsWith("nanomet")) {
            return "nm";
        }
        if (h.equals("um") || h.equals("micron") || h.equals("microns") || h.startsWith("microm")) {
            return "um";
        }
        if (h.startsWith("log")) {
            return "log10-angstrom";
        }
        return "angstrom";
    }

    private static double[] toAngstrom(String where, double[] w, String unit) throws TemplateDataException {
        double[] out = w.clone();
        switch (unit) {
            case "angstrom":
                return out;
            case "nm":
                for (int i = 0; i < out.length; i++) {
                    out[i] *= 10.0;
                }
                return out;
            case "um":
                for (int i = 0; i < out.length; i++) {
                    out[i] *= 1.0e4;
                }
                return out;
            case "log10-angstrom":
                for (int i = 0; i < out.length; i++) {
                    out[i] = Math.pow(10.0, out[i]);
                }
                return out;
            default:
                throw new TemplateDataException(where + ": unit '" + unit + "' must be angstrom, nm, um or log10-angstrom");
        }
    }

    private static double[] parseRange(String where, String text) throws TemplateDataException {
        String[] p = text.split("\\s*(-|\\.\\.|,|\\s)\\s*");
        try {
            if (p.length == 2) {
                double a = Double.parseDouble(p[0]);
                double b = Double.parseDouble(p[1]);
                if (a < b) {
                    return new double[] {a, b};
                }
            }
        } catch (NumberFormatException e) {
            // fall through to the message below
        }
        throw new TemplateDataException(where + ": trust '" + text + "' must be MIN-MAX in rest vacuum Angstrom");
    }

    private static void checkGaps(String where, double[] w) throws TemplateDataException {
        int i = TemplateSets.firstGap(w);
        if (i >= 0) {
            throw new TemplateDataException(String.format(Locale.ROOT,
                    "%s: gap in the wavelengths from %.2f to %.2f Angstrom (step %.3g, typical %.3g); a template must be contiguous",
                    where, w[i], w[i + 1], w[i + 1] - w[i], TemplateSets.medianStep(w)));
        }
    }

    /** Linear interpolation across bad pixels (NaN, or zero when zeroBad); bad runs at the ends take the nearest good value. */
    private static void interpolate(double[] f, double[] w, boolean zeroBad) {
        int n = f.length;
        int i = 0;
        while (i < n) {
            if (Double.isFinite(f[i]) && !(zeroBad && f[i] == 0)) {
                i++;
                continue;
            }
            int j = i;
            while (j < n && (!Double.isFinite(f[j]) || (zeroBad && f[j] == 0))) {
                j++;
            }
            int left = i - 1;
            int right = j;
            for (int k = i; k < j; k++) {
                if (left < 0) {
                    f[k] = f[right];
                } else if (right >= n) {
                    f[k] = f[left];
                } else {
                    double t = (w[k] - w[left]) / (w[right] - w[left]);
                    f[k] = f[left] + t * (f[right] - f[left]);
                }
            }
            i = j;
        }
    }
}
