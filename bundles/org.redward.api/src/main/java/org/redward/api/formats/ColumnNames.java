package org.redward.api.formats;

import java.util.List;
import java.util.Locale;

/**
 * The column names under which spectrum files commonly keep each quantity (common practice),
 * lower case, most specific first: shared by the readers so that every format recognises the
 * same names.
 */
public final class ColumnNames {

    public static final List<String> WAVELENGTH = List.of("wavelength", "wave", "lambda", "wavelen", "lam", "loglam",
            "log_lambda", "loglambda", "log_wave", "logwave", "frequency", "freq", "nu", "wavelength_vacuum_angstrom",
            "wavelength_air_angstrom");
    public static final List<String> FLUX = List.of("flux", "flam", "f_lambda", "flux_density", "fnu", "f_nu", "spec",
            "counts", "data", "intensity");
    public static final List<String> IVAR = List.of("ivar", "inverse_variance", "invvar", "ivar_flux", "flux_ivar", "inv_var", "weight_ivar");
    public static final List<String> SIGMA = List.of("error", "err", "sigma", "flux_err", "flux_error", "fluxerr", "noise",
            "uncertainty", "e_flux", "stddev", "std");
    public static final List<String> VARIANCE = List.of("variance", "var", "flux_var");
    public static final List<String> MASK = List.of("mask", "badpix", "bad_pixel", "pixel_mask", "bad");
    /** The sky spectrum subtracted from (or measured beside) the object, in the flux unit. */
    public static final List<String> SKY = List.of("sky", "sky_flux", "skyflux", "flux_sky");
    /** A column that numbers the spectra of a file holding several, one row per pixel. */
    public static final List<String> SPECTRUM_INDEX = List.of("spectrum", "spectrum_index", "spec_index");
    public static final List<String> ID = List.of("object_id", "obj_id", "objid", "targetid", "target_id", "id", "name", "object", "objname");

    private ColumnNames() {
    }

    /** True if the name says log10 of wavelength. */
    public static boolean isLogWavelength(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.startsWith("log") || n.contains("loglam");
    }

    /** True if the name says frequency. */
    public static boolean isFrequency(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.startsWith("freq") || n.equals("nu");
    }
}
