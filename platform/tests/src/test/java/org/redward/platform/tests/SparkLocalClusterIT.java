package org.redward.platform.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code measure --engine spark} with Spark's {@code local-cluster} master: a master and two
 * workers inside the job's JVM, and two separate executor JVMs, each booting its own embedded
 * framework from the product's bundles. 100 mock spectra in tasks of at most 50, so that both
 * executors get work. Takes about a minute on a quiet two-core machine, several under load.
 */
class SparkLocalClusterIT {

    @TempDir
    Path temp;

    @Test
    void separateExecutorJvmsMeasureWithTheSameBundles() throws Exception {
        Product.Run gen = Product.run(temp, Map.of(), 600, "demo", "--generate-only", "--size", "100", "--out", "demo");
        assertEquals(0, gen.status(), gen.toString());
        Path survey;
        try (Stream<Path> s = Files.walk(temp.resolve("demo"))) {
            survey = s.filter(p -> p.getFileName().toString().endsWith(".fits")).findFirst().orElseThrow().getParent();
        }
        long t0 = System.nanoTime();
        Product.Run run = Product.run(temp, Map.of(), 1200, "measure", survey.toString(), "--engine", "spark",
                "--master", "local-cluster[2,1,1024]", "--spectra-per-task", "50", "--out", "cluster-out");
        System.out.printf("local-cluster run: %.0f s%n", (System.nanoTime() - t0) / 1e9);
        assertEquals(0, run.status(), run.toString());
        assertTrue(run.out().contains("redward on Spark: 100 spectra"), run.toString());
        Matcher boots = Pattern.compile("executor (\\d+) \\(pid (\\d+)\\)").matcher(run.out());
        java.util.Set<String> pids = new java.util.HashSet<>();
        while (boots.find()) {
            pids.add(boots.group(2));
        }
        assertEquals(2, pids.size(), "two executor JVMs, each with its own framework: " + run.out());
        assertTrue(Files.isDirectory(temp.resolve("cluster-out").resolve("catalog.parquet")));
    }
}
