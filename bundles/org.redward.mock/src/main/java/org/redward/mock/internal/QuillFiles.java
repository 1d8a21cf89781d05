package org.redward.mock.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.FitsException;
import nom.tam.fits.Header;
import nom.tam.util.FitsOutputStream;

/**
 * The Quill file layout (designed for the invented instrument): one file per exposure.
 *
 * <pre>
 * HDU 0  primary, no data. TELESCOP, INSTRUME, OBSERVAT, FIELD, EXPID, EXPTIME,
 *        MJD-OBS / DATE-OBS (start) and MJD-AVG / DATE-AVG (mid-exposure), UTC; TIMESYS,
 *        OBSGEO-L / -B / -H (site, WGS84), RADESYS, RA / DEC (pointing centre),
 *        SPECSYS = 'TOPOCENT', NFIBRE.
 * HDU 1  EXTNAME = 'FIBRES', binary table, one row per fibre:
 *        FIBRE  J       fibre number
 *        OBJ_ID 16A     object identifier ('' for none)
 *        RA, DEC  D     ICRS degrees of the fibre
 *        FLUX   4961E   1e-17 erg/s/cm2/Angstrom, sky subtracted
 *        IVAR   4961E   inverse variance of FLUX
 *        MASK   4961B   bits: 1 cosmic ray, 2 bad CCD column, 4 dead fibre (IVAR = 0 there)
 *        The wavelength axis of the array columns is given by the FITS vector-column WCS keywords
 *        (FITS Standard 4.0, sect. 8.4.2): 1CTYPn = 'AWAV' (air wavelength), 1CUNIn = 'Angstrom',
 *        1CRPXn, 1CRVLn, 1CDLTn: lambda_air(i) = 1CRVLn + (i + 1 - 1CRPXn) * 1CDLTn, i from 0;
 *        repeated as CTYPE1, CUNIT1, CRPIX1, CRVAL1, CDELT1 for readers that look for axis 1.
 * </pre>
 * Not thread-safe per file; different files may be written concurrently.
 */
public final class QuillFiles {

    public static final String EXTNAME = "FIBRES";

    private QuillFiles() {
    }

    static void write(Path file, int exposure, double mjd, long seed, SurveyGenerator.Fibre[] fibres) throws IOException {
        int n = fibres.length;
        int[] fibre = new int[n];
        String[] id = new String[n];
        double[] ra = new double[n];
        double[] dec = new double[n];
        float[][] flux = new float[n][];
        float[][] ivar = new float[n][];
        byte[][] mask = new byte[n][];
        for (int i = 0; i < n; i++) {
            TruthRow t = fibres[i].truth();
            fibre[i] = t.fibre();
            id[i] = t.kind() == Kind.BROKEN || t.kind() == Kind.EMPTY ? "SKY-" + t.objectId().substring(4) : t.objectId();
            ra[i] = t.raDeg();
            dec[i] = t.decDeg();
            flux[i] = fibres[i].data().flux;
            ivar[i] = fibres[i].data().ivar;
            mask[i] = fibres[i].data().mask;
        }
        try (Fits fits = new Fits()) {
            BasicHDU<?> primary = Fits.makeHDU((Object) null);
            Header h = primary.getHeader();
            h.addValue("TELESCOP", Scenario.TELESCOPE, "invented telescope (demo data)");
            h.addValue("INSTRUME", Scenario.INSTRUMENT, "invented fibre spectrograph (demo data)");
            h.addValue("OBSERVAT", Scenario.OBSERVATORY, "invented observatory");
            h.addValue("FIELD", Scenario.FIELD, "invented field");
            h.addValue("EXPID", exposure + 1, "exposure number");
            h.addValue("EXPTIME", Scenario.EXPOSURE_S, "[s] exposure time");
            h.addValue("TIMESYS", "UTC", "time scale of MJD-AVG and DATE-AVG");
            double start = mjd - Scenario.EXPOSURE_S / 2 / 86400.0;
            h.addValue("MJD-OBS", start, "[d] start of the exposure, Modified Julian Date");
            h.addValue("DATE-OBS", isoDate(start), "start of the exposure");
            h.addValue("MJD-AVG", mjd, "[d] mid-exposure Modified Julian Date");
            h.addValue("DATE-AVG", isoDate(mjd), "mid-exposure date and time");
            h.addValue("OBSGEO-L", Scenario.SITE_LONGITUDE_DEG, "[deg] site longitude, east positive (WGS84)");
            h.addValue("OBSGEO-B", Scenario.SITE_LATITUDE_DEG, "[deg] site geodetic latitude (WGS84)");
            h.addValue("OBSGEO-H", Scenario.SITE_HEIGHT_M, "[m] site height above the ellipsoid");
            h.addValue("RADESYS", "ICRS", "frame of RA and DEC");
            h.addValue("RA", Scenario.FIELD_RA_DEG, "[deg] pointing centre; each fibre's position is in FIBRES");
            h.addValue("DEC", Scenario.FIELD_DEC_DEG, "[deg] pointing centre; each fibre's position is in FIBRES");
            h.addValue("SPECSYS", "TOPOCENT", "wavelengths as observed, not frame-corrected");
            h.addValue("NFIBRE", n, "rows of the FIBRES table");
            h.addValue("ORIGIN", "Redward mock survey generator v" + SurveyGenerator.VERSION, "invented data");
            h.addValue("MOCKSEED", seed, "seed of the mock survey");
            fits.addHDU(primary);

            BinaryTable table = BinaryTable.fromColumnMajor(new Object[] {fibre, id, ra, dec, flux, ivar, mask});
            BinaryTableHDU hdu = new BinaryTableHDU(BinaryTableHDU.manufactureHeader(table), table);
            Header t = hdu.getHeader();
            t.addValue("EXTNAME", EXTNAME, "one row per fibre");
            String[] names = {"FIBRE", "OBJ_ID", "RA", "DEC", "FLUX", "IVAR", "MASK"};
            for (int c = 0; c < names.length; c++) {
                hdu.setColumnName(c, names[c], null);
            }
            t.addValue("TUNIT3", "deg", null);
            t.addValue("TUNIT4", "deg", null);
            t.addValue("TUNIT5", "1e-17 erg/(s cm2 Angstrom)", null);
            t.addValue("TUNIT6", "1e+34 (s cm2 Angstrom/erg)2", null);
            for (int c = 5; c <= 7; c++) {
                t.addValue("1CTYP" + c, "AWAV", "air wavelength");
                t.addValue("1CUNI" + c, "Angstrom", null);
                t.addValue("1CRPX" + c, 1.0, "reference pixel (1-based)");
                t.addValue("1CRVL" + c, Scenario.WAVELENGTH_START_AIR_ANGSTROM, "[Angstrom] air wavelength at 1CRPX");
                t.addValue("1CDLT" + c, Scenario.WAVELENGTH_STEP_ANGSTROM, "[Angstrom] step per pixel");
            }
            // the same axis as plain keywords, for readers that look for a spectral axis 1 in the header
            t.addValue("CTYPE1", "AWAV", "spectral axis of FLUX, IVAR, MASK (air wavelength)");
            t.addValue("CUNIT1", "Angstrom", null);
            t.addValue("CRPIX1", 1.0, null);
            t.addValue("CRVAL1", Scenario.WAVELENGTH_START_AIR_ANGSTROM, "[Angstrom]");
            t.addValue("CDELT1", Scenario.WAVELENGTH_STEP_ANGSTROM, "[Angstrom]");
            t.insertComment("MASK bits: 1 cosmic ray, 2 bad CCD column, 4 dead fibre; IVAR = 0 where flagged.");
            t.insertComment("Line-spread function: Gaussian, FWHM 3.3 Angstrom along the whole range.");
            fits.addHDU(hdu);
            Path tmp = file.resolveSibling(file.getFileName() + ".part");
            try (FitsOutputStream out = new FitsOutputStream(Files.newOutputStream(tmp))) {
                fits.write(out);
            }
            Files.move(tmp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        } catch (FitsException e) {
            throw new IOException(file + ": cannot write the Quill FITS file: " + e.getMessage(), e);
        }
    }

    static String isoDate(double mjd) {
        long millis = Math.round((mjd - 40587.0) * 86_400_000.0);
        return DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSS").withZone(ZoneOffset.UTC).format(Instant.ofEpochMilli(millis));
    }
}
