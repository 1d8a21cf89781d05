package org.redward.formats.fits.internal;

import java.util.Locale;
import java.util.Optional;

import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralUnit;

/**
 * The spectral coordinate of every pixel of a FITS axis, from header keywords, and the medium
 * the wavelengths were measured in.
 *
 * <p>Supported (pixel p = i + 1 for 0-based index i; w = step * (p - CRPIXa); step is CDa_a, else
 * CDELTa times PCa_a; CRPIXa defaults to 0 as the FITS standard says):
 * <ul>
 * <li>FITS WCS Paper III (Greisen et al. 2006, A&amp;A 446, 747): {@code CTYPEa} = WAVE, AWAV,
 * FREQ (linear: x = CRVALa + w) and WAVE-LOG, AWAV-LOG, FREQ-LOG (logarithmic, Paper III eq. 5:
 * x = CRVALa * exp(w / CRVALa)); {@code CUNITa} defaults to m for wavelengths and Hz for
 * frequencies (Paper III);</li>
 * <li>the older linear keywords without a spectral CTYPE ({@code LINEAR} or none): x = CRVALa + w
 * in Angstrom unless CUNITa or {@code WAT1_001 units=} says otherwise (common practice); with
 * {@code DC-FLAG = 1} the axis is log10 of wavelength: x = 10^(CRVALa + w) (common practice);</li>
 * <li>the log-linear coefficient keywords of public survey files: x = 10^(COEFF0 + COEFF1 * i),
 * i 0-based, Angstrom.</li>
 * </ul>
 * The medium: {@code AWAV*} is air, {@code WAVE*}/{@code FREQ*} vacuum (Paper III); otherwise
 * the {@code VACUUM} (T/F) or {@code AIRORVAC} keyword; otherwise air is assumed, which is common
 * practice for ground-based spectra calibrated against arc lamps, and the assumption is reported.
 */
final class SpectralSolution {

    final double[] coordinates;
    final SpectralUnit unit;
    final Sampling sampling;
    final Medium medium;
    /** Where the medium came from, e.g. {@code keyword VACUUM} or {@code assumed}. */
    final String mediumSource;
    /** How the axis was understood, e.g. {@code WCS WAVE-LOG}. */
    final String description;

    private SpectralSolution(double[] c, SpectralUnit u, Sampling s, Medium m, String ms, String d) {
        coordinates = c;
        unit = u;
        sampling = s;
        medium = m;
        mediumSource = ms;
        description = d;
    }

    /**
     * Reads the solution of axis {@code axis} (1-based) with {@code n} pixels.
     *
     * @throws IllegalArgumentException with a message naming the keyword at fault
     */
    static SpectralSolution fromKeywords(Keys k, int axis, int n, Settings s) {
        if (n <= 0) {
            throw new IllegalArgumentException("axis " + axis + " has no pixels (NAXIS" + axis + " = " + n + ")");
        }
        String a = Integer.toString(axis);
        String ctype = k.text("CTYPE" + a).orElse("").toUpperCase(Locale.ROOT).trim();
        Optional<String> coeffKeys = s.get("wavelength.keywords");
        boolean spectralCtype = ctype.startsWith("WAVE") || ctype.startsWith("AWAV") || ctype.startsWith("FREQ");
        if (coeffKeys.isPresent() || (!spectralCtype && k.has("COEFF0") && k.has("COEFF1") && axis == 1)) {
            String[] names = coeffKeys.orElse("COEFF0,COEFF1").split("\\s*,\\s*");
            if (names.length != 2) {
                throw new IllegalArgumentException("profile setting wavelength.keywords must name two keywords (log10 start, log10 step)");
            }
            double c0 = k.number(names[0]).orElseThrow(() -> new IllegalArgumentException("keyword " + names[0] + " is missing or not a number"));
            double c1 = k.number(names[1]).orElseThrow(() -> new IllegalArgumentException("keyword " + names[1] + " is missing or not a number"));
            if (!(c1 > 0)) {
                throw new IllegalArgumentException("keyword " + names[1] + " = " + c1 + " is not a positive log10 step");
            }
            double[] c = new double[n];
            for (int i = 0; i < n; i++) {
                c[i] = Math.pow(10.0, c0 + c1 * i);
            }
            Medium[] m = new Medium[1];
            String ms = medium(k, s, "", m);
            return new SpectralSolution(c, SpectralUnit.ANGSTROM, Sampling.LOG_LINEAR, m[0], ms,
                    "log-linear keywords " + names[0] + "/" + names[1]);
        }
        if (ctype.endsWith("-TAB")) {
            throw new IllegalArgumentException("CTYPE" + a + " = '" + ctype + "': tabulated (-TAB) spectral axes are not supported");
        }
        boolean iraf = !spectralCtype;
        if (iraf && !ctype.isEmpty() && !ctype.equals("LINEAR") && !ctype.equals("LAMBDA") && !ctype.equals("WAVELENGTH")
                && !ctype.equals("PIXEL")) {
            throw new IllegalArgumentException("CTYPE" + a + " = '" + ctype + "' is not a spectral axis Redward reads "
                    + "(WAVE, AWAV, FREQ, their -LOG forms, or LINEAR)");
        }
        String algorithm = ctype.length() > 4 ? ctype.substring(4).replace("-", "").trim() : "";
        if (spectralCtype && !algorithm.isEmpty() && !algorithm.equals("LOG")) {
            throw new IllegalArgumentException("CTYPE" + a + " = '" + ctype + "': only linear and -LOG spectral axes are supported");
        }
        double crval = k.number("CRVAL" + a).orElseThrow(() -> new IllegalArgumentException("keyword CRVAL" + a + " is missing"));
        Optional<Double> cd = k.number("CD" + a + "_" + a);
        Optional<Double> cdelt = k.number("CDELT" + a);
        if (cd.isEmpty() && cdelt.isEmpty()) {
            throw new IllegalArgumentException("neither CDELT" + a + " nor CD" + a + "_" + a + " is present");
        }
        double step = cd.orElseGet(() -> cdelt.get() * k.number("PC" + a + "_" + a, 1.0));
        if (!(step != 0) || !Double.isFinite(step)) {
            throw new IllegalArgumentException("the pixel step (CDELT" + a + "/CD" + a + "_" + a + ") is zero");
        }
        double crpix = k.number("CRPIX" + a, 0.0);
        boolean log10 = iraf && k.number("DC-FLAG", 0) == 1;
        boolean wcsLog = algorithm.equals("LOG");
        SpectralUnit unit = unit(k, a, ctype, iraf, log10);
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            double w = step * (i + 1 - crpix);
            c[i] = log10 ? Math.pow(10.0, crval + w) : wcsLog ? crval * Math.exp(w / crval) : crval + w;
        }
        if (step < 0) {
            throw new IllegalArgumentException("the spectral axis decreases (step " + step + "); reversed axes are not supported");
        }
        Medium[] m = new Medium[1];
        String ms = medium(k, s, ctype, m);
        Sampling sampling = log10 || wcsLog ? Sampling.LOG_LINEAR : Sampling.LINEAR;
        String d = spectralCtype ? "WCS " + ctype : log10 ? "linear WCS keywords on log10 wavelength (DC-FLAG = 1)" : "linear WCS keywords";
        return new SpectralSolution(c, unit, sampling, m[0], ms, d);
    }

    private static SpectralUnit unit(Keys k, String a, String ctype, boolean iraf, boolean log10) {
        Optional<String> cunit = k.text("CUNIT" + a);
        if (cunit.isPresent() && !log10) {
            return SpectralUnit.parse(cunit.get()).orElseThrow(() -> new IllegalArgumentException(
                    "unknown unit '" + cunit.get() + "' in CUNIT" + a));
        }
        if (!iraf) {
            return ctype.startsWith("FREQ") ? SpectralUnit.HERTZ : SpectralUnit.METRE;
        }
        String wat = k.text("WAT" + a + "_001").orElse("");
        java.util.regex.Matcher mu = java.util.regex.Pattern.compile("units=(\\S+)").matcher(wat);
        if (mu.find() && !log10) {
            String u = mu.group(1);
            return SpectralUnit.parse(u).orElseThrow(() -> new IllegalArgumentException(
                    "unknown unit '" + u + "' in WAT" + a + "_001"));
        }
        return SpectralUnit.ANGSTROM;
    }

    /** Decides the medium; returns where it came from. */
    static String medium(Keys k, Settings s, String ctype, Medium[] out) {
        Optional<String> forced = s.get("medium");
        if (forced.isPresent()) {
            String f = forced.get().toLowerCase(Locale.ROOT);
            if (!f.equals("air") && !f.equals("vacuum")) {
                throw new IllegalArgumentException("profile setting medium = '" + forced.get() + "' (expected air or vacuum)");
            }
            out[0] = f.equals("air") ? Medium.AIR : Medium.VACUUM;
            return "profile";
        }
        if (ctype.startsWith("AWAV")) {
            out[0] = Medium.AIR;
            return "CTYPE";
        }
        if (ctype.startsWith("WAVE") || ctype.startsWith("FREQ")) {
            out[0] = Medium.VACUUM;
            return "CTYPE";
        }
        Optional<Boolean> vac = k.logical("VACUUM");
        if (vac.isPresent()) {
            out[0] = vac.get() ? Medium.VACUUM : Medium.AIR;
            return "keyword VACUUM";
        }
        Optional<String> aov = k.text("AIRORVAC");
        if (aov.isPresent()) {
            String v = aov.get().toLowerCase(Locale.ROOT);
            if (v.startsWith("vac")) {
                out[0] = Medium.VACUUM;
                return "keyword AIRORVAC";
            }
            if (v.startsWith("air")) {
                out[0] = Medium.AIR;
                return "keyword AIRORVAC";
            }
        }
        out[0] = Medium.AIR;
        return "assumed (no keyword says; ground-based default)";
    }
}
