package org.redward.survey.internal;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.UsageException;

/**
 * Runs a measurement on Apache Spark with the survey feature: the Spark job (which embeds Felix
 * and runs the same bundles as {@code measure}) in a separate JVM, {@code local[*]} by default.
 * Also packages a job for a real cluster. The survey feature lives outside the default product:
 * its folder is {@code <product>/survey} or the {@code redward.survey.home} setting, with
 * {@code job/} (the job and the API jars it shares with the bundles) and, for runs on this
 * machine, {@code spark/} (Spark and its dependencies; {@code SPARK_HOME/jars} also works).
 */
final class SparkEngine {

    /** The job's main class. */
    static final String MAIN = "org.redward.spark.SurveyJob";

    /** JVM options Spark 4 needs on Java 17 (the same list spark-submit adds). */
    static final List<String> JVM_OPTIONS = List.of("-XX:+IgnoreUnrecognizedVMOptions", "--add-modules=jdk.incubator.vector",
            "--add-opens=java.base/java.lang=ALL-UNNAMED", "--add-opens=java.base/java.lang.invoke=ALL-UNNAMED",
            "--add-opens=java.base/java.lang.reflect=ALL-UNNAMED", "--add-opens=java.base/java.io=ALL-UNNAMED",
            "--add-opens=java.base/java.net=ALL-UNNAMED", "--add-opens=java.base/java.nio=ALL-UNNAMED",
            "--add-opens=java.base/java.util=ALL-UNNAMED", "--add-opens=java.base/java.util.concurrent=ALL-UNNAMED",
            "--add-opens=java.base/java.util.concurrent.atomic=ALL-UNNAMED", "--add-opens=java.base/jdk.internal.ref=ALL-UNNAMED",
            "--add-opens=java.base/sun.nio.ch=ALL-UNNAMED", "--add-opens=java.base/sun.nio.cs=ALL-UNNAMED",
            "--add-opens=java.base/sun.security.action=ALL-UNNAMED", "--add-opens=java.base/sun.util.calendar=ALL-UNNAMED",
            "--add-opens=java.security.jgss/sun.security.krb5=ALL-UNNAMED", "-Dio.netty.tryReflectionSetAccessible=true",
            "--sun-misc-unsafe-memory-access=allow", "--enable-native-access=ALL-UNNAMED");

    private final CommandContext ctx;
    private final Path surveyHome;

    SparkEngine(CommandContext ctx, UnaryOperator<String> property) {
        this.ctx = ctx;
        Path inProduct = ctx.productHome().resolve("survey");
        String configured = property.apply("redward.survey.home");
        this.surveyHome = Files.isDirectory(inProduct.resolve("job")) || configured == null ? inProduct : Path.of(configured);
    }

    /** The job folder, or a usage error saying how to get the survey feature. */
    Path jobFolder() {
        Path job = surveyHome.resolve("job");
        if (!Files.isRegularFile(job.resolve("redward-spark-job.jar"))) {
            throw new UsageException("--engine spark: the survey feature is not installed (no " + job.resolve("redward-spark-job.jar")
                    + "); build it with: mvn -B package -DskipTests -pl features/survey -am");
        }
        return job;
    }

    /** Spark's jars on this machine: the survey feature's spark/ folder or SPARK_HOME/jars. */
    Path sparkJars() {
        Path own = surveyHome.resolve("spark");
        if (Files.isDirectory(own)) {
            return own;
        }
        String sparkHome = System.getenv("SPARK_HOME");
        if (sparkHome != null && Files.isDirectory(Path.of(sparkHome, "jars"))) {
            return Path.of(sparkHome, "jars");
        }
        throw new UsageException("--engine spark: Spark is not installed here (no " + own + ", no SPARK_HOME);"
                + " build the survey feature (mvn -B package -DskipTests -pl features/survey -am) or set SPARK_HOME");
    }

    /** All bundles a run uses (the product's core feature and every --bundles folder), as one folder. */
    Path bundleFolder(Path into) throws IOException {
        Files.createDirectories(into);
        List<Path> folders = new ArrayList<>();
        folders.add(ctx.productHome().resolve("bundles").resolve("core"));
        folders.addAll(ctx.dropInFolders());
        for (Path folder : folders) {
            try (DirectoryStream<Path> ds = Files.newDirectoryStream(folder, "*.jar")) {
                for (Path jar : ds) {
                    Files.copy(jar, into.resolve(jar.getFileName()), StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
        return into;
    }

    /** Runs the job in a child JVM and returns its exit status; its output goes to the user's terminal. */
    int run(List<String> jobArguments, Path outFolder) throws IOException, InterruptedException {
        Path job = jobFolder();
        Path spark = sparkJars();
        Path bundles = bundleFolder(Files.createDirectories(outFolder).resolve("bundles-used"));
        List<String> cmd = new ArrayList<>();
        cmd.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        cmd.addAll(JVM_OPTIONS);
        cmd.add("-Dredward.home=" + ctx.productHome());
        int m = jobArguments.indexOf("--master");
        boolean localCluster = m >= 0 && m + 1 < jobArguments.size() && jobArguments.get(m + 1).startsWith("local-cluster");
        Path sparkHome = null;
        if (localCluster) {
            // local-cluster starts executor JVMs through a worker, which builds their class path from
            // SPARK_HOME/jars (plus the executors' extra class path: the job and API jars)
            sparkHome = localClusterHome(spark, outFolder);
            cmd.add("-Dspark.executor.extraClassPath=" + job.resolve("*"));
        }
        cmd.add("-cp");
        cmd.add(job.resolve("*") + java.io.File.pathSeparator + spark.resolve("*"));
        cmd.add(MAIN);
        cmd.add("--bundles");
        cmd.add(bundles.toString());
        cmd.add("--out");
        cmd.add(outFolder.toString());
        cmd.addAll(jobArguments);
        ctx.err().println("redward measure: running on Spark (" + String.join(" ", jobArguments.subList(0, Math.min(2, jobArguments.size())))
                + "...); the catalogue goes to " + outFolder.resolve("catalog.parquet"));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectOutput(ProcessBuilder.Redirect.INHERIT)
                .redirectError(ProcessBuilder.Redirect.INHERIT);
        if (sparkHome != null) {
            pb.environment().put("SPARK_HOME", sparkHome.toString());
            // Spark's command builder asks for the Scala version of a home that is not a source build
            pb.environment().putIfAbsent("SPARK_SCALA_VERSION", SCALA_VERSION);
        }
        return pb.start().waitFor();
    }

    /** The Scala version of the Spark that the survey feature ships (Spark 4: Scala 2.13). */
    static final String SCALA_VERSION = "2.13";

    /**
     * A Spark home for {@code local-cluster} masters: SPARK_HOME when it has a {@code jars/}
     * folder, else {@code <out>/spark-home} whose {@code jars} links to the survey feature's Spark.
     */
    static Path localClusterHome(Path sparkJars, Path outFolder) throws IOException {
        if (sparkJars.getFileName() != null && sparkJars.getFileName().toString().equals("jars")) {
            return sparkJars.getParent();
        }
        Path home = Files.createDirectories(outFolder.resolve("spark-home"));
        Path jars = home.resolve("jars");
        if (!Files.exists(jars)) {
            Files.createSymbolicLink(jars, sparkJars.toAbsolutePath());
        }
        return home;
    }

    /**
     * Writes everything a real cluster needs into {@code out}: the job and API jars, the bundles
     * (a folder and {@code bundles.zip}), and {@code submit.sh} with the exact spark-submit line.
     *
     * @return the spark-submit line
     */
    String packageFor(Path out, String master) throws IOException {
        Path job = jobFolder();
        Files.createDirectories(out);
        List<String> extra = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(job, "*.jar")) {
            for (Path jar : ds) {
                Files.copy(jar, out.resolve(jar.getFileName()), StandardCopyOption.REPLACE_EXISTING);
                if (!jar.getFileName().toString().equals("redward-spark-job.jar")) {
                    extra.add(jar.getFileName().toString());
                }
            }
        }
        extra.sort(null);
        Path bundles = bundleFolder(out.resolve("bundles"));
        try (OutputStream os = Files.newOutputStream(out.resolve("bundles.zip")); ZipOutputStream zip = new ZipOutputStream(os)) {
            try (DirectoryStream<Path> ds = Files.newDirectoryStream(bundles, "*.jar")) {
                for (Path jar : ds) {
                    zip.putNextEntry(new ZipEntry(jar.getFileName().toString()));
                    Files.copy(jar, zip);
                    zip.closeEntry();
                }
            }
        }
        String line = String.format(Locale.ROOT, "spark-submit --master %s --class %s --jars %s --archives bundles.zip#bundles"
                + " --conf spark.driver.extraJavaOptions=-Dredward.home=. redward-spark-job.jar --bundles bundles --out \"$OUT\" \"$@\"",
                master, MAIN, String.join(",", extra));
        String script = "#!/bin/sh\n# Submits the Redward survey job to a Spark cluster. Run it from this folder:\n"
                + "#   OUT=hdfs:///catalogues/run1 ./submit.sh [--estimator ID] [--frame cmb] INPUTS...\n"
                + "# INPUTS are files or folders of spectra on any file system the cluster's Hadoop layer reads.\n"
                + "# Executors receive the bundles as bundles.zip (unpacked as ./bundles); the driver uses ./bundles here.\n"
                + "set -e\ncd \"$(dirname \"$0\")\"\n: \"${OUT:?set OUT to the output folder}\"\n" + line + "\n";
        Path submit = out.resolve("submit.sh");
        Files.writeString(submit, script);
        submit.toFile().setExecutable(true);
        return line;
    }
}
