package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code measure --engine spark} and {@code survey-package} as a user runs them: the survey job in
 * its own JVM ({@code local[2]}) with the product's bundles and a dropped-in estimator, and a
 * package for a real cluster. Row-by-row equality with the single-machine catalogue is checked by
 * the Spark module's own test.
 */
class SparkEngineIT {

    @TempDir
    Path temp;

    @Test
    void measuresOnSparkWithADroppedInEstimatorAndPackagesAJob() throws Exception {
        Product.Run gen = Product.run(temp, java.util.Map.of(), 600, "demo", "--generate-only", "--size", "120", "--out", "demo");
        assertEquals(0, gen.status(), gen.toString());
        Path survey;
        try (Stream<Path> s = Files.walk(temp.resolve("demo"))) {
            survey = s.filter(p -> p.getFileName().toString().endsWith(".fits")).findFirst().orElseThrow().getParent();
        }
        Path drop = Files.createDirectories(temp.resolve("drop"));
        Path jar = Path.of(System.getProperty("redward.example.jar"));
        Files.copy(jar, drop.resolve(jar.getFileName()));

        Product.Run run = Product.run(temp, java.util.Map.of(), 900, "measure", survey.toString(), "--engine", "spark",
                "--master", "local[2]", "--estimator", "example-brightest-line", "--bundles", drop.toString(), "--out", "spark-out");
        assertEquals(0, run.status(), run.toString());
        Path catalog = temp.resolve("spark-out").resolve("catalog.parquet");
        assertTrue(Files.isDirectory(catalog), run.toString());
        try (Stream<Path> s = Files.list(catalog)) {
            assertTrue(s.anyMatch(p -> p.getFileName().toString().endsWith(".parquet")), "Parquet parts in " + catalog);
        }
        assertTrue(run.out().contains("120 spectra"), "every spectrum measured on the executors: " + run);
        String provenance = Files.readString(temp.resolve("spark-out").resolve("provenance.json"));
        assertTrue(provenance.contains("org.redward.example.estimator"), "the drop-in bundle shipped with the job: " + provenance);

        Product.Run pack = Product.run(temp, java.util.Map.of(), 300, "survey-package", "--out", "job", "--bundles", drop.toString());
        assertEquals(0, pack.status(), pack.toString());
        String submit = Files.readString(temp.resolve("job").resolve("submit.sh"));
        assertTrue(submit.contains("spark-submit --master yarn --class org.redward.spark.SurveyJob"), submit);
        assertTrue(submit.contains("--archives bundles.zip#bundles"), submit);
        assertTrue(Files.isRegularFile(temp.resolve("job").resolve("bundles.zip")));
        assertTrue(Files.isRegularFile(temp.resolve("job").resolve("bundles").resolve(jar.getFileName())), "drop-ins travel with the job");
        assertTrue(Files.isRegularFile(temp.resolve("job").resolve("redward-spark-job.jar")));
    }
}
