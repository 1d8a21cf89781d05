package org.redward.catalog.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import javax.xml.XMLConstants;
import javax.xml.transform.stream.StreamSource;
import javax.xml.validation.Schema;
import javax.xml.validation.SchemaFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.Column;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.Header;
import uk.ac.starlink.table.ColumnInfo;
import uk.ac.starlink.table.StarTable;
import uk.ac.starlink.table.StarTableFactory;

/**
 * Catalogues written by each writer open again with general-purpose readers: FITS with
 * nom-tam-fits, VOTable and ECSV with STIL, CSV by hand; the VOTable validates against the IVOA
 * VOTable 1.4 XML schema (the copy shipped inside the STIL jar). Values are invented.
 */
class RoundTripTest {

    @TempDir
    Path dir;

    static final List<Column> COLUMNS = List.of(
            Column.ofString("source", "meta.file", "file"),
            Column.ofInt("index", "meta.number", "index in file"),
            Column.ofString("status", "meta.code.status", "ok or failed"),
            Column.ofDouble("z", "", "src.redshift", "redshift"),
            Column.ofDouble("ra_deg", "deg", "pos.eq.ra;meta.main", "right ascension"),
            Column.ofDouble("luminosity_distance_mpc", "Mpc", "pos.distance", "luminosity distance"),
            Column.ofLong("sequence", "meta.number", "position in run"),
            Column.ofBoolean("flag", "meta.code", "a flag"));

    static Catalog catalog(int rows) {
        Iterable<Object[]> it = () -> new java.util.Iterator<>() {
            int i;

            @Override
            public boolean hasNext() {
                return i < rows;
            }

            @Override
            public Object[] next() {
                int k = i++;
                boolean failed = k % 7 == 3;
                return new Object[] {"/data/invented-field/plate-" + k / 10 + ".fits", k % 10, failed ? "failed" : "ok",
                    failed ? Double.NaN : 0.01 * k, 150.0 + k * 1e-3, failed ? Double.NaN : 44.4 * k, (long) k, k % 2 == 0};
            }
        };
        Map<String, String> prov = new LinkedHashMap<>();
        prov.put("product.version", "0.1.0");
        prov.put("estimator", "invented-estimator");
        prov.put("bundle.org.redward.api", "0.1.0 sha256:abc");
        return Catalog.of("test catalogue", prov, List.of(new CatalogTable("redshifts", "rows", COLUMNS, rows, it)));
    }

    /** A second table of invented measured lines (keyed to the main table by sequence), as {@code measure --lines} writes. */
    static final List<Column> LINE_COLUMNS = List.of(
            Column.ofLong("sequence", "meta.number", "position of the spectrum in the run"),
            Column.ofString("line", "meta.id;spect.line", "identification"),
            Column.ofDouble("observed_wavelength_angstrom", "Angstrom", "em.wl.central", "observed centre"),
            Column.ofDouble("fwhm_km_s", "km/s", "spect.line.width", "FWHM"),
            Column.ofBoolean("blended", "meta.code", "fitted with neighbours"));

    static Catalog withLines(int rows) {
        Catalog main = catalog(rows);
        List<Object[]> lines = new ArrayList<>();
        for (int k = 0; k < rows; k++) {
            lines.add(new Object[] {(long) k, k % 2 == 0 ? "invented-line-a" : "", 4000.0 + k, k % 3 == 0 ? Double.NaN : 100.0 + k, k % 4 == 0});
            lines.add(new Object[] {(long) k, "invented-line-b", 5000.0 + k, 200.0, false});
        }
        return Catalog.of(main.title(), main.provenance(), List.of(main.tables().get(0),
                new CatalogTable("lines", "one row per line", LINE_COLUMNS, lines.size(), lines)));
    }

    @Test
    void aSecondTableBecomesASecondFitsExtensionWithItsUnits() throws Exception {
        Path f = dir.resolve("lines.fits");
        new StilWriters.Fits().write(withLines(20), f);
        try (Fits fits = new Fits(f.toFile())) {
            BasicHDU<?>[] hdus = fits.read();
            assertEquals(4, hdus.length, "primary, catalogue, lines, provenance");
            BinaryTableHDU t = (BinaryTableHDU) hdus[2];
            Header h = t.getHeader();
            assertEquals("LINES", h.getStringValue("EXTNAME"));
            assertEquals(40, t.getNRows());
            int obs = t.findColumn("observed_wavelength_angstrom");
            assertEquals("Angstrom", h.getStringValue("TUNIT" + (obs + 1)));
            assertEquals("km/s", h.getStringValue("TUNIT" + (t.findColumn("fwhm_km_s") + 1)));
            assertEquals(5007.0, num(t.getElement(15, obs)), 0.0);
            assertEquals("invented-line-b", ((String) t.getElement(15, t.findColumn("line"))).trim());
            assertEquals(7L, ((Number) (t.getElement(14, t.findColumn("sequence")) instanceof long[] a ? a[0]
                    : t.getElement(14, t.findColumn("sequence")))).longValue());
            assertEquals("REDSHIFTS", ((BinaryTableHDU) hdus[1]).getHeader().getStringValue("EXTNAME").toUpperCase(java.util.Locale.ROOT));
        }
    }

    @Test
    void aSecondTableBecomesASecondVoTableTableThatValidatesAndRoundTrips() throws Exception {
        Path f = dir.resolve("lines.vot");
        new StilWriters.VoTable().write(withLines(30), f);
        validateVoTable(f);
        List<StarTable> tables = new ArrayList<>();
        var seq = new StarTableFactory().makeStarTables(uk.ac.starlink.util.DataSource.makeDataSource(f.toString()), "votable");
        for (StarTable t; (t = seq.nextTable()) != null;) {
            tables.add(t);
        }
        assertEquals(2, tables.size(), "catalogue and lines");
        checkStil(tables.get(0), 30);
        StarTable lines = tables.get(1);
        assertEquals("lines", lines.getName());
        assertEquals("Angstrom", lines.getColumnInfo(2).getUnitString());
        assertEquals("spect.line.width", lines.getColumnInfo(3).getUCD());
        List<Object[]> got = new ArrayList<>();
        try (var rs = lines.getRowSequence()) {
            while (rs.next()) {
                got.add(rs.getRow().clone());
            }
        }
        assertEquals(60, got.size());
        assertEquals(5003.0, ((Number) got.get(7)[2]).doubleValue(), 0.0);
        assertEquals(Boolean.TRUE, got.get(8)[4]);
    }

    @Test
    void fitsOpensWithNomTamFitsWithUnitsAndProvenance() throws Exception {
        Path f = dir.resolve("cat.fits");
        new StilWriters.Fits().write(catalog(50), f);
        try (Fits fits = new Fits(f.toFile())) {
            BasicHDU<?>[] hdus = fits.read();
            assertEquals(3, hdus.length, "primary, catalogue, provenance");
            BinaryTableHDU t = (BinaryTableHDU) hdus[1];
            Header h = t.getHeader();
            assertEquals(50, t.getNRows());
            int zcol = t.findColumn("z");
            int dcol = t.findColumn("luminosity_distance_mpc");
            assertEquals("Mpc", h.getStringValue("TUNIT" + (dcol + 1)));
            assertEquals("deg", h.getStringValue("TUNIT" + (t.findColumn("ra_deg") + 1)));
            assertEquals(0.05, num(t.getElement(5, zcol)), 0.0);
            assertTrue(Double.isNaN(num(t.getElement(3, zcol))), "missing z is NaN");
            assertEquals("/data/invented-field/plate-1.fits", ((String) t.getElement(12, t.findColumn("source"))).trim());
            BinaryTableHDU p = (BinaryTableHDU) hdus[2];
            List<String> keys = new ArrayList<>();
            for (int i = 0; i < p.getNRows(); i++) {
                keys.add(((String) p.getElement(i, 0)).trim() + "=" + ((String) p.getElement(i, 1)).trim());
            }
            assertTrue(keys.contains("estimator=invented-estimator"), keys.toString());
        }
    }

    @Test
    void voTableValidatesAgainstTheIvoaSchemaAndRoundTripsWithStil() throws Exception {
        Path f = dir.resolve("cat.vot");
        new StilWriters.VoTable().write(catalog(30), f);
        validateVoTable(f);
        String xml = Files.readString(f);
        assertTrue(xml.contains("http://www.ivoa.net/xml/VOTable/v1.3"), "VOTable 1.4 uses the v1.3 namespace");
        StarTable t = new StarTableFactory().makeStarTable(f.toString(), "votable");
        checkStil(t, 30);
        assertEquals("invented-estimator", t.getParameterByName("estimator").getValue());
    }

    @Test
    void ecsvRoundTripsWithStil() throws Exception {
        Path f = dir.resolve("cat.ecsv");
        new StilWriters.Ecsv().write(catalog(30), f);
        StarTable t = new StarTableFactory().makeStarTable(f.toString(), "ecsv");
        checkStil(t, 30);
        assertTrue(Files.readString(f).contains("invented-estimator"), "provenance in the YAML header");
    }

    @Test
    void csvHasACommentedHeaderAndOneLinePerRow() throws Exception {
        Path f = dir.resolve("cat.csv");
        new CsvCatalogWriter().write(catalog(20), f);
        List<String> lines = Files.readAllLines(f);
        List<String> data = lines.stream().filter(l -> !l.startsWith("#")).toList();
        assertEquals(21, data.size());
        assertEquals("source,index,status,z,ra_deg,luminosity_distance_mpc,sequence,flag", data.get(0));
        assertEquals("/data/invented-field/plate-0.fits,3,failed,,150.003,,3,false", data.get(4));
        assertTrue(lines.contains("# estimator: invented-estimator"));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("# column luminosity_distance_mpc [Mpc]")));
    }

    /** Validates against the IVOA VOTable 1.4 XML schema (the copy shipped inside the STIL jar). */
    static void validateVoTable(Path f) throws Exception {
        SchemaFactory sf = SchemaFactory.newInstance(XMLConstants.W3C_XML_SCHEMA_NS_URI);
        Schema schema;
        try (InputStream xsd = StarTable.class.getClassLoader().getResourceAsStream("uk/ac/starlink/util/text/VOTable1.4.xsd")) {
            schema = sf.newSchema(new StreamSource(xsd));
        }
        schema.newValidator().validate(new StreamSource(f.toFile()));
    }

    private static void checkStil(StarTable t, int rows) throws Exception {
        Map<String, ColumnInfo> cols = new LinkedHashMap<>();
        for (int i = 0; i < t.getColumnCount(); i++) {
            cols.put(t.getColumnInfo(i).getName(), t.getColumnInfo(i));
        }
        assertEquals(List.of("source", "index", "status", "z", "ra_deg", "luminosity_distance_mpc", "sequence", "flag"),
                new ArrayList<>(cols.keySet()));
        assertEquals("Mpc", cols.get("luminosity_distance_mpc").getUnitString());
        assertEquals("pos.eq.ra;meta.main", cols.get("ra_deg").getUCD());
        List<Object[]> got = new ArrayList<>();
        try (var seq = t.getRowSequence()) {
            while (seq.next()) {
                got.add(seq.getRow().clone());
            }
        }
        assertEquals(rows, got.size());
        assertEquals(0.05, ((Number) got.get(5)[3]).doubleValue(), 0.0);
        assertTrue(got.get(3)[3] == null || Double.isNaN(((Number) got.get(3)[3]).doubleValue()), "missing z");
        assertEquals("failed", got.get(3)[2]);
        assertEquals(17L, ((Number) got.get(17)[6]).longValue());
    }

    /** nom-tam-fits gives a scalar column cell as an array of one. */
    private static double num(Object cell) {
        return cell instanceof double[] a ? a[0] : ((Number) cell).doubleValue();
    }
}
