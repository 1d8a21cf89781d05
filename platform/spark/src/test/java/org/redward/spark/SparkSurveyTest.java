package org.redward.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasuredRow;
import org.redward.api.survey.SurveyMeasurer;

/**
 * The survey job in Spark's {@code local[2]} mode gives the same catalogue as the single-machine
 * measurement through the same service, row for row (z equal to 1e-12: the code is the same),
 * with a task that fails on its first attempt and is retried by Spark without duplicating rows.
 * The files hold 100 spectra each and the tasks at most 30, so every file is cut into slices
 * (30, 30, 30, 10) whose rows must join up exactly.
 */
class SparkSurveyTest {

    static SparkSession spark;

    @TempDir
    static Path temp;

    @BeforeAll
    static void start() {
        spark = SparkSession.builder().appName("redward-test").master("local[2,3]")
                .config("spark.ui.enabled", "false").config("spark.sql.shuffle.partitions", "4").getOrCreate();
    }

    @AfterAll
    static void stop() {
        if (spark != null) {
            spark.stop();
        }
    }

    static Path bundles() {
        return Path.of(System.getProperty("redward.product", "../product/target/redward")).resolve("bundles").resolve("core");
    }

    @Test
    void sparkCatalogueEqualsSingleMachineCatalogue() throws Exception {
        Path inputs = TestSpectra.write(temp.resolve("spectra"));
        SurveyJob.Args args = SurveyJob.Args.parse(new String[] {"--bundles", bundles().toString(), "--out",
                temp.resolve("out").toString(), "--estimator", TestSpectra.ESTIMATOR, "--time-limit-s", "600",
                "--spectra-per-task", "30", inputs.toString()});
        System.setProperty("redward.spark.failFirstAttempt", "true");
        SurveyJob.Summary summary;
        try {
            summary = SurveyJob.run(spark, args);
        } finally {
            System.clearProperty("redward.spark.failFirstAttempt");
        }
        System.out.println(summary);

        SurveyMeasurer measurer = EmbeddedRedward.get(bundles()).service(SurveyMeasurer.class, null);
        List<MeasuredRow> local = new ArrayList<>();
        MeasureRequest request = args.request(List.of(inputs)).withThreads(2);
        measurer.measure(request, local::add);
        CatalogTable table = measurer.table(request, local, local.size());

        Dataset<Row> parquet = spark.read().parquet(summary.catalog().toString());
        List<Row> rows = parquet.collectAsList();
        assertEquals(local.size(), rows.size(), "same number of rows (the retried task added none)");
        Map<String, Row> byKey = new HashMap<>();
        for (Row r : rows) {
            Row before = byKey.put(r.getAs("source") + "#" + r.getAs("index"), r);
            assertTrue(before == null, "each spectrum once: " + r.getAs("source") + " " + r.getAs("index"));
        }
        int compared = 0;
        for (Object[] cells : table.rows()) {
            String key = cells[table.columnIndex("source")] + "#" + cells[table.columnIndex("index")];
            Row r = byKey.get(key);
            assertTrue(r != null, "row " + key + " missing from the Spark catalogue");
            for (int i = 0; i < table.columns().size(); i++) {
                String name = table.columns().get(i).name();
                if (SurveyJob.RUN_COLUMNS.contains(name)) {
                    continue;
                }
                Object expected = cells[i];
                Object actual = r.getAs(name);
                if (expected instanceof Double d && actual instanceof Double a) {
                    if (Double.isNaN(d)) {
                        assertTrue(Double.isNaN(a), key + " " + name);
                    } else {
                        assertEquals(d, a, 1e-12 * Math.max(1, Math.abs(d)), key + " " + name);
                    }
                } else {
                    assertEquals(expected, actual, key + " " + name);
                }
            }
            compared++;
        }
        assertEquals(local.size(), compared);
        String provenance = Files.readString(temp.resolve("out").resolve("provenance.json"));
        assertTrue(provenance.contains("\"sha256\""), provenance);
    }
}
