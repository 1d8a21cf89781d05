package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import javax.xml.XMLConstants;
import javax.xml.transform.stream.StreamSource;
import javax.xml.validation.SchemaFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.testkit.SharedData;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import uk.ac.starlink.table.StarTable;
import uk.ac.starlink.table.StarTableFactory;
import uk.ac.starlink.table.TableSequence;
import uk.ac.starlink.util.DataSource;

/**
 * {@code measure --lines} as a user runs it, on real emission-line galaxies of the shared
 * reference data: the lines table holds their strong lines where the published redshift puts
 * them; FITS has a LINES extension, the VOTable a second TABLE and validates, CSV a sibling file.
 */
class MeasureLinesIT {

    @TempDir
    Path temp;

    /** Star-forming and starburst galaxies of ../shared/realdata (SDSS spectra; see its README). */
    static final String[] GALAXIES = {"spec-0268-51633-0251.fits", "spec-1068-52614-0006.fits"};

    /**
     * Rest vacuum wavelengths, Angstrom, from the product's standard line list
     * (bundles/org.redward.lines/src/main/resources/linelists/standard.tsv: NIST ASD as tabulated).
     */
    static final Map<String, Double> REST = Map.of("H-alpha", 6564.614, "[O III] 5008", 5008.240);

    /** Observed centre within 2 Angstrom (about 90 km/s at H-alpha) of rest x (1 + published z). */
    static final double TOLERANCE_ANGSTROM = 2.0;

    @Test
    void strongLinesOfRealGalaxiesSitWhereThePublishedRedshiftPutsThem() throws Exception {
        Map<String, Double> zPublished = publishedZ();
        List<String> args = new ArrayList<>(List.of("measure"));
        for (String g : GALAXIES) {
            args.add(SharedData.realData().resolve(g).toString());
        }
        Path fits = temp.resolve("lines.fits");
        args.addAll(List.of("--lines", "--out", fits.toString()));
        Product.Run r = Product.run(args.toArray(new String[0]));
        assertEquals(0, r.status(), r.toString());
        assertTrue(r.err().contains("lines measured in 2 spectra"), r.err());
        try (Fits f = new Fits(fits.toFile())) {
            BasicHDU<?>[] hdus = f.read();
            assertEquals(4, hdus.length, "primary, REDSHIFTS, LINES, PROVENANCE");
            BinaryTableHDU main = (BinaryTableHDU) hdus[1];
            BinaryTableHDU lines = (BinaryTableHDU) hdus[2];
            assertEquals("LINES", lines.getHeader().getStringValue("EXTNAME"));
            int obs = lines.findColumn("observed_wavelength_angstrom");
            assertEquals("Angstrom", lines.getHeader().getStringValue("TUNIT" + (obs + 1)));
            assertEquals("km/s", lines.getHeader().getStringValue("TUNIT" + (lines.findColumn("fwhm_km_s") + 1)));
            Map<Long, String> fileBySequence = new HashMap<>();
            for (int i = 0; i < main.getNRows(); i++) {
                String source = ((String) main.getElement(i, main.findColumn("source"))).trim();
                fileBySequence.put(longCell(main.getElement(i, main.findColumn("sequence"))), Path.of(source).getFileName().toString());
            }
            Map<String, Integer> found = new HashMap<>();
            for (int i = 0; i < lines.getNRows(); i++) {
                String name = ((String) lines.getElement(i, lines.findColumn("line"))).trim();
                if (!REST.containsKey(name)) {
                    continue;
                }
                String file = fileBySequence.get(longCell(lines.getElement(i, lines.findColumn("sequence"))));
                double expected = REST.get(name) * (1 + zPublished.get(file));
                double observed = ((double[]) lines.getElement(i, obs))[0];
                assertEquals(expected, observed, TOLERANCE_ANGSTROM, file + " " + name);
                found.merge(file + " " + name, 1, Integer::sum);
            }
            for (String g : GALAXIES) {
                for (String name : REST.keySet()) {
                    assertEquals(1, found.getOrDefault(g + " " + name, 0), g + " " + name + " measured once: " + found);
                }
            }
        }
        Path vot = temp.resolve("lines.vot");
        args.set(args.size() - 1, vot.toString());
        assertEquals(0, Product.run(args.toArray(new String[0])).status());
        try (InputStream xsd = StarTable.class.getClassLoader().getResourceAsStream("uk/ac/starlink/util/text/VOTable1.4.xsd")) {
            SchemaFactory.newInstance(XMLConstants.W3C_XML_SCHEMA_NS_URI).newSchema(new StreamSource(xsd)).newValidator()
                    .validate(new StreamSource(vot.toFile()));
        }
        TableSequence seq = new StarTableFactory().makeStarTables(DataSource.makeDataSource(vot.toString()), "votable");
        List<StarTable> tables = new ArrayList<>();
        for (StarTable t; (t = seq.nextTable()) != null;) {
            tables.add(t);
        }
        assertEquals(2, tables.size());
        assertEquals("lines", tables.get(1).getName());
        Path csv = temp.resolve("lines.csv");
        args.set(args.size() - 1, csv.toString());
        Product.Run c = Product.run(args.toArray(new String[0]));
        assertEquals(0, c.status(), c.toString());
        Path sibling = temp.resolve("lines.lines.csv");
        assertTrue(c.err().contains("lines table: " + sibling), c.err());
        String text = Files.readString(sibling);
        assertTrue(text.contains("# column observed_wavelength_angstrom [Angstrom]"), text.substring(0, Math.min(2000, text.length())));
        assertTrue(text.contains("# lines.list: standard "), "provenance names the line list");
    }

    private static long longCell(Object cell) {
        return cell instanceof long[] a ? a[0] : ((Number) cell).longValue();
    }

    /** The published z per file from the reference table truth.tsv (column z_published; see the realdata README). */
    static Map<String, Double> publishedZ() throws Exception {
        Map<String, Double> out = new HashMap<>();
        try (BufferedReader in = Files.newBufferedReader(SharedData.realData().resolve("truth.tsv"))) {
            List<String> header = List.of(in.readLine().split("\t"));
            int file = header.indexOf("file");
            int z = header.indexOf("z_published");
            for (String line; (line = in.readLine()) != null;) {
                String[] f = line.split("\t");
                out.put(f[file], Double.parseDouble(f[z]));
            }
        }
        return out;
    }
}
