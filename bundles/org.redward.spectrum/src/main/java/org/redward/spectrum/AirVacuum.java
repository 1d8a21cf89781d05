package org.redward.spectrum;

/**
 * Conversion between wavelengths in standard air and in vacuum.
 *
 * <p>Vacuum to air uses the IAU standard formula of Morton (2000, ApJS 130, 403, eq. 8), after
 * Birch &amp; Downs (1994): with {@code s = 1e4 / lambdaVac} (lambda in Angstrom),
 * <pre>n = 1 + 8.34254e-5 + 2.406147e-2 / (130 - s^2) + 1.5998e-4 / (38.9 - s^2),
 * lambdaAir = lambdaVac / n.</pre>
 * Air to vacuum inverts that relation exactly (to 1e-9 Angstrom) by fixed-point iteration,
 * started from the closed-form inverse of N. Piskunov (as published with the VALD database).
 *
 * <p>Domain: the formulas hold for lambda &gt;= 2000 Angstrom. Below 2000 Angstrom wavelengths are
 * conventionally quoted in vacuum (common practice), so both methods return their argument
 * unchanged there. NaN in gives NaN out. Thread-safe (stateless).
 */
public final class AirVacuum {

    /** Below this wavelength (Angstrom) no conversion is applied (common practice). */
    public static final double LOWER_LIMIT_ANGSTROM = 2000.0;

    private AirVacuum() {
    }

    /** Refractive index of standard air at the given vacuum wavelength (Morton 2000). */
    public static double refractiveIndexAtVacuumAngstrom(double vacuumAngstrom) {
        double s = 1.0e4 / vacuumAngstrom;
        double s2 = s * s;
        return 1.0 + 8.34254e-5 + 2.406147e-2 / (130.0 - s2) + 1.5998e-4 / (38.9 - s2);
    }

    /** Vacuum wavelength (Angstrom) to air wavelength (Angstrom), Morton (2000). */
    public static double vacuumToAirAngstrom(double vacuumAngstrom) {
        if (!(vacuumAngstrom >= LOWER_LIMIT_ANGSTROM)) {
            return vacuumAngstrom;
        }
        return vacuumAngstrom / refractiveIndexAtVacuumAngstrom(vacuumAngstrom);
    }

    /** Air wavelength (Angstrom) to vacuum wavelength (Angstrom): exact inverse of Morton (2000). */
    public static double airToVacuumAngstrom(double airAngstrom) {
        if (!(airAngstrom >= LOWER_LIMIT_ANGSTROM)) {
            return airAngstrom;
        }
        double s = 1.0e4 / airAngstrom;
        double s2 = s * s;
        double n = 1.0 + 8.336624212083e-5 + 2.408926869968e-2 / (130.1065924522 - s2)
                + 1.599740894897e-4 / (38.92568793293 - s2);
        double vac = airAngstrom * n;
        for (int i = 0; i < 4; i++) {
            vac = airAngstrom * refractiveIndexAtVacuumAngstrom(vac);
        }
        return vac;
    }
}
