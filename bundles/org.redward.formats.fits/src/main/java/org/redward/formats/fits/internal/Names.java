package org.redward.formats.fits.internal;

import java.util.List;
import java.util.Locale;

/** The names under which files commonly keep each quantity (common practice), lower case. */
final class Names {

    static final List<String> WAVELENGTH = List.of("wavelength", "wave", "lambda", "wavelen", "lam", "loglam",
            "log_lambda", "loglambda", "log_wave", "logwave", "frequency", "freq", "nu", "wavelength_vacuum_angstrom",
            "wavelength_air_angstrom");
    static final List<String> FLUX = List.of("flux", "flam", "f_lambda", "flux_density", "fnu", "f_nu", "spec",
            "spectrum", "counts", "data", "intensity");
    static final List<String> IVAR = List.of("ivar", "inverse_variance", "invvar", "ivar_flux", "flux_ivar", "inv_var", "weight_ivar");
    static final List<String> SIGMA = List.of("error", "err", "sigma", "flux_err", "flux_error", "fluxerr", "noise",
            "uncertainty", "e_flux", "stddev", "std");
    static final List<String> VARIANCE = List.of("variance", "var", "flux_var");
    static final List<String> MASK = List.of("mask", "badpix", "bad_pixel", "pixel_mask", "bad");
    static final List<String> ID = List.of("object_id", "objid", "targetid", "target_id", "id", "name", "object", "objname");

    private Names() {
    }

    /** True if the name says log10 of wavelength. */
    static boolean isLogWavelength(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.startsWith("log") || n.contains("loglam");
    }

    /** True if the name says frequency. */
    static boolean isFrequency(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return n.startsWith("freq") || n.equals("nu");
    }
}
