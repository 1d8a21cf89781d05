package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.json.JSONObject;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.testkit.SharedData;

import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;

/**
 * Survey runs as a user makes them, on the 12 real spectra of the shared reference data: the
 * catalogue in every format, and compare matching each estimator's own measure output.
 */
class SurveyIT {

    @TempDir
    Path temp;

    private static final String TIME_LIMIT = "900";

    @Test
    void measureWritesEveryCatalogueFormatWithTheContractKeysFirst() throws Exception {
        Path real = SharedData.realData();
        Path drop = dropInExample();
        Path fits = temp.resolve("real.fits");
        Product.Run r = Product.run("measure", real.toString(), "--estimator", "example-brightest-line", "--bundles", drop.toString(),
                "--out", fits.toString());
        assertEquals(0, r.status(), r.toString());
        assertFalse(Files.exists(temp.resolve("real.fits.journal")), "journal removed once the catalogue is in place");
        try (Fits f = new Fits(fits.toFile())) {
            BasicHDU<?>[] hdus = f.read();
            BinaryTableHDU t = (BinaryTableHDU) hdus[1];
            String[] first = {"source", "index", "id", "status", "error", "z", "z_err", "class", "grade", "estimator", "alternatives"};
            for (int i = 0; i < first.length; i++) {
                assertEquals(first[i], t.getColumnName(i), "column " + i);
            }
            assertTrue(t.getNRows() >= 12, "at least one row per file: " + t.getNRows());
            assertEquals("deg", t.getHeader().getStringValue("TUNIT" + (t.findColumn("ra_deg") + 1)));
        }
        for (String ext : new String[] {"csv", "ecsv", "vot"}) {
            Path out = temp.resolve("real." + ext);
            Product.Run w = Product.run("measure", real.toString(), "--estimator", "example-brightest-line", "--bundles", drop.toString(),
                    "--out", out.toString());
            assertEquals(0, w.status(), w.toString());
            assertTrue(Files.size(out) > 1000, ext);
        }
    }

    @Test
    void compareOnRealSpectraMatchesEachEstimatorsOwnMeasureOutput() throws Exception {
        Path real = SharedData.realData();
        Path drop = dropInExample();
        String[] ids = {"lines", "example-brightest-line"};
        Map<String, List<JSONObject>> measured = new HashMap<>();
        for (String id : ids) {
            Product.Run m = Product.run("measure", "--json", "--estimator", id, "--time-limit", TIME_LIMIT,
                    "--bundles", drop.toString(), real.toString());
            assertEquals(0, m.status(), m.toString());
            List<JSONObject> rows = new ArrayList<>();
            for (String line : m.out().split("\n")) {
                if (line.startsWith("{")) {
                    rows.add(new JSONObject(line));
                }
            }
            measured.put(id, rows);
        }
        Path dir = temp.resolve("cmp");
        Product.Run c = Product.run("compare", real.toString(), "--estimators", String.join(",", ids), "--time-limit", TIME_LIMIT,
                "--out", dir.toString(), "--bundles", drop.toString());
        assertEquals(0, c.status(), c.toString());
        for (String f : new String[] {"per-spectrum.csv", "summary.json", "report.md"}) {
            assertTrue(Files.isRegularFile(dir.resolve(f)), f);
        }
        List<String[]> table = Csv.read(dir.resolve("per-spectrum.csv"));
        String[] header = table.get(0);
        List<String> cols = List.of(header);
        assertEquals(measured.get(ids[0]).size(), table.size() - 1, "one row per spectrum");
        int agreeCol = cols.indexOf("agree_lines_vs_example-brightest-line");
        for (int i = 1; i < table.size(); i++) {
            String[] row = table.get(i);
            double[] z = new double[2];
            double[] e = new double[2];
            for (int k = 0; k < 2; k++) {
                JSONObject m = measured.get(ids[k]).get(i - 1);
                assertEquals(m.getString("status"), row[cols.indexOf("status_" + ids[k])], "row " + i + " " + ids[k]);
                String zc = row[cols.indexOf("z_" + ids[k])];
                if (m.isNull("z")) {
                    assertEquals("", zc);
                    z[k] = Double.NaN;
                } else {
                    z[k] = m.getDouble("z");
                    e[k] = m.isNull("z_err") ? Double.NaN : m.getDouble("z_err");
                    assertEquals(z[k], Double.parseDouble(zc), 0.0, "z of " + ids[k] + " as its own measure gave, row " + i);
                }
            }
            // agreement within the combined 3 sigma, recomputed from the measure outputs
            String expected = Double.isNaN(z[0]) || Double.isNaN(z[1]) || Double.isNaN(e[0]) || Double.isNaN(e[1]) ? ""
                    : Math.abs(z[1] - z[0]) <= 3 * Math.hypot(e[0], e[1]) ? "yes" : "no";
            assertEquals(expected, row[agreeCol], "agreement of row " + i);
        }
        JSONObject summary = new JSONObject(Files.readString(dir.resolve("summary.json")));
        assertEquals(table.size() - 1, summary.getInt("spectra"));
    }

    /** A drop-in folder holding the example estimator bundle. */
    private Path dropInExample() throws java.io.IOException {
        Path drop = Files.createDirectories(temp.resolve("drop"));
        Path jar = Path.of(System.getProperty("redward.example.jar"));
        Files.copy(jar, drop.resolve(jar.getFileName()));
        return drop;
    }

    /** A small CSV reader (RFC 4180 quotes) that skips '#' comment lines. */
    static final class Csv {
        static List<String[]> read(Path f) throws Exception {
            List<String[]> out = new ArrayList<>();
            for (String line : Files.readAllLines(f)) {
                if (line.startsWith("#") || line.isEmpty()) {
                    continue;
                }
                List<String> cells = new ArrayList<>();
                StringBuilder sb = new StringBuilder();
                boolean q = false;
                for (int i = 0; i < line.length(); i++) {
                    char ch = line.charAt(i);
                    if (q) {
                        if (ch == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                            sb.append('"');
                            i++;
                        } else if (ch == '"') {
                            q = false;
                        } else {
                            sb.append(ch);
                        }
                    } else if (ch == '"') {
                        q = true;
                    } else if (ch == ',') {
                        cells.add(sb.toString());
                        sb.setLength(0);
                    } else {
                        sb.append(ch);
                    }
                }
                cells.add(sb.toString());
                out.add(cells.toArray(new String[0]));
            }
            return out;
        }
    }
}
