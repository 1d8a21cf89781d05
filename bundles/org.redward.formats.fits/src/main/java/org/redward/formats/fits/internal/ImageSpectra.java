package org.redward.formats.fits.internal;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumAssembly;
import org.redward.api.formats.SpectrumAssembly.ErrorKind;
import org.redward.spectrum.Medium;
import org.redward.spectrum.Sampling;
import org.redward.spectrum.SpectralAxis;
import org.redward.spectrum.SpectralUnit;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;

import nom.tam.fits.Header;
import nom.tam.fits.ImageHDU;

/**
 * Spectra in FITS images, three ways:
 * <ul>
 * <li>a 1D image: one spectrum, axis from the header ({@link SpectralSolution});</li>
 * <li>a 2D image whose rows are spectra (multi-object): row r is spectrum r; inverse variance,
 * errors, variance and mask in further HDUs of the same shape (EXTNAME IVAR, ERROR, VARIANCE,
 * MASK, or as the profile says), the wavelength from keywords or from its own HDU
 * (EXTNAME WAVELENGTH; 1D for all rows or 2D per row; values below 10 are read as log10);</li>
 * <li>a 2D image whose rows are planes of one spectrum (profile setting {@code layout = image-planes}
 * with {@code flux.row}, {@code ivar.row} / {@code error.row}, {@code mask.row}, {@code sky.row}, 0-based).</li>
 * </ul>
 * Rows are read one at a time from disk.
 */
final class ImageSpectra implements Plan {

    private static final List<String> IVAR_HDUS = List.of("IVAR", "INVVAR", "INVERSE_VARIANCE", "WEIGHT_IVAR");
    private static final List<String> ERROR_HDUS = List.of("ERROR", "ERR", "SIGMA", "NOISE", "UNCERTAINTY", "STDDEV");
    private static final List<String> VARIANCE_HDUS = List.of("VARIANCE", "VAR");
    private static final List<String> MASK_HDUS = List.of("MASK", "BADPIX", "ANDMASK", "AND_MASK", "QUALITY");
    private static final List<String> WAVE_HDUS = List.of("WAVELENGTH", "WAVE", "LOGLAM", "LAMBDA");
    /** EXTNAMEs that are never spectra themselves. */
    static final List<String> COMPANIONS = List.of("IVAR", "INVVAR", "INVERSE_VARIANCE", "WEIGHT_IVAR", "ERROR", "ERR",
            "SIGMA", "NOISE", "UNCERTAINTY", "STDDEV", "VARIANCE", "VAR", "MASK", "BADPIX", "ANDMASK", "AND_MASK",
            "QUALITY", "WAVELENGTH", "WAVE", "LOGLAM", "LAMBDA", "SKY", "MODEL", "RESOLUTION", "FIBERMAP");

    private final FitsFileView view;
    private final int hdu;
    private final Settings settings;
    private final boolean planes;
    private final int width;
    private final int rows;
    private final int errorHdu;
    private final ErrorKind errorKind;
    private final int maskHdu;
    private final int waveHdu;
    private final String layout;
    /** The axis from keywords, made once for all rows (or why it cannot be made). */
    private SpectralAxis keywordAxis;
    private String keywordAxisError;
    private String keywordMediumSource;
    private SpectrumMetadata baseMetadata;

    private ImageSpectra(FitsFileView view, int hdu, Settings settings, boolean planes) {
        this.view = view;
        this.hdu = hdu;
        this.settings = settings;
        this.planes = planes;
        int[] axes = axes(view.hdus.get(hdu).getHeader());
        this.width = axes[0];
        this.rows = axes.length > 1 ? axes[1] : 1;
        if ((long) width > FitsFileView.MAX_PIXELS) {
            throw new IllegalArgumentException(view.name(hdu) + ": NAXIS1 = " + width + " pixels is more than " + FitsFileView.MAX_PIXELS);
        }
        int e = companion("ivar.hdu", IVAR_HDUS);
        ErrorKind k = ErrorKind.INVERSE_VARIANCE;
        if (e < 0) {
            e = companion("error.hdu", ERROR_HDUS);
            k = ErrorKind.SIGMA;
        }
        if (e < 0) {
            e = companion("variance.hdu", VARIANCE_HDUS);
            k = ErrorKind.VARIANCE;
        }
        this.errorHdu = planes ? -1 : e;
        this.errorKind = k;
        this.maskHdu = planes ? -1 : companion("mask.hdu", MASK_HDUS);
        this.waveHdu = planes ? -1 : companion("wavelength.hdu", WAVE_HDUS);
        String what = planes ? "FITS image, one spectrum in rows (flux, errors, mask)"
                : rows == 1 ? "FITS 1D image" : "FITS 2D image, one spectrum per row";
        this.layout = what + (errorHdu >= 0 ? ", errors in " + view.name(errorHdu) : "")
                + (maskHdu >= 0 ? ", mask in " + view.name(maskHdu) : "")
                + (waveHdu >= 0 ? ", wavelength in " + view.name(waveHdu) : "");
    }

    static ImageSpectra of(FitsFileView view, int hdu, Settings s, boolean planes) {
        return new ImageSpectra(view, hdu, s, planes);
    }

    /**
     * {NAXIS1} for a 1D image, {NAXIS1, NAXIS2} for a 2D one (further axes must be 1), or an
     * empty array if there is no data or the shape is not one of these.
     */
    static int[] axes(Header h) {
        int naxis = h.getIntValue("NAXIS", 0);
        if (naxis < 1) {
            return new int[0];
        }
        int n1 = h.getIntValue("NAXIS1", 0);
        int n2 = naxis >= 2 ? h.getIntValue("NAXIS2", 0) : 1;
        for (int i = 3; i <= naxis; i++) {
            if (h.getIntValue("NAXIS" + i, 0) != 1) {
                return new int[0];
            }
        }
        if (n1 <= 0 || n2 <= 0) {
            return new int[0];
        }
        return naxis == 1 ? new int[] {n1} : new int[] {n1, n2};
    }

    /** True if the HDU is an image holding spectra (1D, or 2D rows), not a companion. */
    static boolean looksLikeSpectra(FitsFileView view, int i) {
        if (!(view.hdus.get(i) instanceof ImageHDU)) {
            return false;
        }
        Header h = view.hdus.get(i).getHeader();
        String ext = h.getStringValue("EXTNAME");
        if (ext != null && COMPANIONS.contains(ext.trim().toUpperCase(Locale.ROOT))) {
            return false;
        }
        int[] a = axes(h);
        return a.length >= 1 && a.length <= 2 && a[0] > 1;
    }

    private int companion(String setting, List<String> names) {
        Optional<String> forced = settings.get(setting);
        if (forced.isPresent()) {
            int i = view.find(forced.get());
            if (i < 0) {
                throw new IllegalArgumentException("HDU '" + forced.get() + "' (profile setting " + setting + ") is missing");
            }
            return i;
        }
        for (String n : names) {
            int i = view.find(n);
            if (i >= 0 && i != hdu && view.hdus.get(i) instanceof ImageHDU) {
                return i;
            }
        }
        return -1;
    }

    @Override
    public String layout() {
        return layout;
    }

    @Override
    public int count() {
        return planes ? 1 : rows;
    }

    @Override
    public SpectrumRecord read(int index) {
        String where = view.name(hdu) + (planes || rows == 1 ? "" : " row " + index);
        try {
            return SpectrumRecord.ok(view.file, index, where, readSpectrum(index, where));
        } catch (IllegalArgumentException e) {
            String m = e.getMessage();
            return SpectrumRecord.failed(view.file, index, where, view.file + ": " + (m.startsWith(where) ? m : where + ": " + m));
        } catch (Exception | OutOfMemoryError e) {
            return SpectrumRecord.failed(view.file, index, where, view.file + ": " + where + ": cannot be read ("
                    + FitsFileView.message(e) + ")");
        }
    }

    /** Row {@code r} (0-based) of image HDU {@code i} as physical values (BSCALE, BZERO, BLANK applied). */
    private double[] row(int i, int r, String what) throws Exception {
        ImageHDU im = (ImageHDU) view.hdus.get(i);
        Header h = im.getHeader();
        int[] a = axes(h);
        if (a.length == 0) {
            throw new IllegalArgumentException(view.name(i) + " (" + what + ") has no data");
        }
        int w = a[0];
        int nrows = a.length > 1 ? a[1] : 1;
        if (r >= nrows) {
            throw new IllegalArgumentException(view.name(i) + " (" + what + ") has " + nrows + " rows, row " + r + " is missing");
        }
        int naxis = h.getIntValue("NAXIS", 1);
        int[] corners = new int[naxis];
        int[] lengths = new int[naxis];
        java.util.Arrays.fill(lengths, 1);
        lengths[naxis - 1] = w;
        if (naxis >= 2) {
            corners[naxis - 2] = r;
        }
        Object raw = im.getData().getTiler().getTile(corners, lengths);
        Long blank = h.containsKey("BLANK") ? h.getLongValue("BLANK") : null;
        return Values.toDoubles(raw, h.getDoubleValue("BSCALE", 1.0), h.getDoubleValue("BZERO", 0.0), blank);
    }

    private Spectrum readSpectrum(int index, String where) throws Exception {
        double[] flux;
        double[] err = null;
        double[] mask = null;
        ErrorKind kind = errorKind;
        String errName = "";
        String maskName = "";
        double[] sky = null;
        if (planes) {
            int fr = settings.integer("flux.row").orElse(0);
            flux = row(hdu, fr, "flux row " + fr);
            Optional<Integer> ir = settings.integer("ivar.row");
            Optional<Integer> er = settings.integer("error.row");
            if (ir.isPresent()) {
                err = row(hdu, ir.get(), "inverse variance row");
                kind = ErrorKind.INVERSE_VARIANCE;
                errName = "inverse variance row " + ir.get();
            } else if (er.isPresent()) {
                err = row(hdu, er.get(), "error row");
                kind = ErrorKind.SIGMA;
                errName = "error row " + er.get();
            }
            Optional<Integer> mr = settings.integer("mask.row");
            if (mr.isPresent()) {
                mask = row(hdu, mr.get(), "mask row");
                maskName = "mask row " + mr.get();
            }
            Optional<Integer> kr = settings.integer("sky.row");
            if (kr.isPresent()) {
                sky = row(hdu, kr.get(), "sky row");
                if (sky.length != flux.length) {
                    throw new IllegalArgumentException("sky row " + kr.get() + " has " + sky.length + " values but the flux has " + flux.length);
                }
            }
        } else {
            flux = row(hdu, index, "flux");
            if (errorHdu >= 0) {
                err = row(errorHdu, rowsOf(errorHdu) == 1 ? 0 : index, "errors");
                errName = view.name(errorHdu);
            }
            if (maskHdu >= 0) {
                mask = row(maskHdu, rowsOf(maskHdu) == 1 ? 0 : index, "mask");
                maskName = view.name(maskHdu);
            }
        }
        Keys keys = view.keys(hdu);
        SpectralAxis axis;
        String mediumSource;
        if (waveHdu >= 0) {
            double[] raw = row(waveHdu, rowsOf(waveHdu) == 1 ? 0 : index, "wavelength");
            if (raw.length != flux.length) {
                throw new IllegalArgumentException(view.name(waveHdu) + " has " + raw.length + " wavelengths but the flux has " + flux.length);
            }
            boolean log = raw.length > 0 && Math.abs(raw[raw.length - 1]) < 10;
            double[] coords = new double[raw.length];
            for (int i = 0; i < raw.length; i++) {
                coords[i] = log ? Math.pow(10.0, raw[i]) : raw[i];
            }
            Keys wk = view.keys(waveHdu);
            String bunit = wk.own().getStringValue("BUNIT");
            Optional<String> u = settings.get("wavelength.unit").or(() -> Optional.ofNullable(bunit).filter(x -> !x.isBlank()));
            SpectralUnit unit = u.isEmpty() || log ? SpectralUnit.ANGSTROM : SpectralUnit.parse(u.get()).orElseThrow(() ->
                    new IllegalArgumentException(view.name(waveHdu) + ": unknown wavelength unit '" + u.get() + "' (BUNIT)"));
            Medium[] m = new Medium[1];
            mediumSource = SpectralSolution.medium(wk, settings, "", m);
            axis = SpectrumAssembly.axis(coords, unit, m[0], log ? Sampling.LOG_LINEAR : Sampling.TABULATED);
        } else {
            if (keywordAxis == null && keywordAxisError == null) {
                try {
                    SpectralSolution sol = SpectralSolution.fromKeywords(keys, 1, flux.length, settings);
                    keywordAxis = SpectrumAssembly.axis(sol.coordinates, sol.unit, sol.medium, sol.sampling);
                    keywordMediumSource = sol.mediumSource;
                } catch (IllegalArgumentException e) {
                    keywordAxisError = view.name(hdu) + ": wavelength axis: " + e.getMessage().replaceFirst("^wavelength axis: ", "");
                }
            }
            if (keywordAxisError != null) {
                throw new IllegalArgumentException(keywordAxisError);
            }
            axis = keywordAxis;
            mediumSource = keywordMediumSource;
        }
        String fluxUnit = settings.get("flux.unit").orElse(keys.text("BUNIT").orElse(""));
        if (baseMetadata == null) {
            baseMetadata = MetadataKeywords.read(keys, settings);
        }
        SpectrumMetadata md = baseMetadata;
        SpectrumMetadata.Builder b = md.toBuilder().extra("redward.medium_source", mediumSource);
        if (!planes && rows > 1) {
            b.objectId(md.objectId().map(x -> x + "#").orElse("row ") + index);
        }
        return SpectrumAssembly.build(axis, flux, err, kind, mask, fluxUnit, b.build(),
                settings.profile().map(p -> p.maskedRegionsVacuumAngstrom()).orElse(List.of()),
                "the flux", errName, maskName).withSky(sky);
    }

    private int rowsOf(int i) {
        int[] a = axes(view.hdus.get(i).getHeader());
        return a.length > 1 ? a[1] : 1;
    }
}
