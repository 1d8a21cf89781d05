package org.redward.spark;

import java.io.IOException;
import java.io.Serializable;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.hadoop.conf.Configuration;
import org.apache.hadoop.fs.FileStatus;
import org.apache.hadoop.fs.FileSystem;
import org.apache.spark.SparkFiles;
import org.apache.spark.TaskContext;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SaveMode;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataType;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.Column;
import org.redward.api.commands.Json;
import org.redward.api.commands.PlatformInfo;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasuredRow;
import org.redward.api.survey.SurveyMeasurer;

/**
 * The survey-scale measurement on Apache Spark. The driver lists the input files; each task
 * boots (once per executor JVM) the embedded platform from the same bundles that {@code measure}
 * uses, and measures its files through the {@link SurveyMeasurer} service exactly as
 * {@code measure} does, one spectrum at a time (streaming: a task holds one spectrum and the
 * rows of its files). The catalogue has the same columns as {@code measure}'s and is written as
 * Parquet ({@code catalog.parquet} in the output folder) through Spark's output committer, so a
 * retried task never duplicates rows; {@code provenance.json} beside it names every bundle with
 * its SHA-256, the job's parameters and the input files.
 *
 * <p>Arguments: {@code --bundles DIR --out DIR [--master URL] [--estimator ID] [--templates ID]
 * [--profile ID] [--frame F] [--cosmology ID] [--time-limit-s S] INPUTS...} (INPUTS: files or
 * folders, local paths or any URI the Hadoop file system layer reads).
 */
public final class SurveyJob {

    /** Catalogue columns that describe the run, not the spectrum; they differ between runs by nature. */
    public static final List<String> RUN_COLUMNS = List.of("sequence", "seconds");

    private SurveyJob() {
    }

    /** The parsed arguments; only strings, so that closures shipped to executors stay small. */
    static final class Args implements Serializable {
        private static final long serialVersionUID = 1L;
        String bundles;
        String out;
        String master;
        final Map<String, String> options = new LinkedHashMap<>();
        final List<String> inputs = new ArrayList<>();

        static Args parse(String[] argv) {
            Args a = new Args();
            for (int i = 0; i < argv.length; i++) {
                String s = argv[i];
                if (s.startsWith("--")) {
                    if (i + 1 >= argv.length) {
                        throw new IllegalArgumentException(s + " needs a value");
                    }
                    String v = argv[++i];
                    switch (s) {
                        case "--bundles": a.bundles = v; break;
                        case "--out": a.out = v; break;
                        case "--master": a.master = v; break;
                        case "--estimator": case "--templates": case "--profile": case "--frame": case "--cosmology":
                        case "--time-limit-s":
                            a.options.put(s.substring(2), v);
                            break;
                        default: throw new IllegalArgumentException("unknown option " + s);
                    }
                } else {
                    a.inputs.add(s);
                }
            }
            if (a.bundles == null || a.out == null || a.inputs.isEmpty()) {
                throw new IllegalArgumentException("usage: --bundles DIR --out DIR [options] INPUTS...");
            }
            return a;
        }

        MeasureRequest request(List<Path> inputs) {
            MeasureRequest r = MeasureRequest.of(inputs).withThreads(1);
            r = r.withEstimator(options.get("estimator")).withTemplates(options.get("templates"))
                    .withProfile(options.get("profile")).withFrame(options.get("frame"))
                    .withCosmology(options.get("cosmology"));
            if (options.containsKey("time-limit-s")) {
                r = r.withTimeLimit(Duration.ofMillis((long) (Double.parseDouble(options.get("time-limit-s")) * 1000)));
            }
            return r;
        }
    }

    public static void main(String[] argv) throws Exception {
        Args args;
        try {
            args = Args.parse(argv);
        } catch (IllegalArgumentException e) {
            System.err.println("redward survey job: " + e.getMessage());
            System.exit(2);
            return;
        }
        SparkSession.Builder b = SparkSession.builder().appName("redward-measure");
        if (args.master != null) {
            b = b.master(args.master);
        } else if (System.getProperty("spark.master") == null) {
            b = b.master("local[*]");
        }
        int status = 0;
        try (SparkSession spark = b.getOrCreate()) {
            Summary s = run(spark, args);
            System.out.println(s);
        } catch (RuntimeException | IOException e) {
            System.err.println("redward survey job: " + e.getMessage());
            status = 1;
        }
        System.out.flush();
        // the embedded framework's threads would keep the JVM alive; its shutdown hook stops it
        System.exit(status);
    }

    /** What a run did. */
    public record Summary(long files, long rows, long failed, double seconds, double bootSeconds, Path catalog) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT, "redward on Spark: %d spectra from %d files (%d failed) in %.1f s"
                    + " (platform boot on the driver %.2f s); catalogue %s", rows, files, failed, seconds, bootSeconds, catalog);
        }
    }

    /** Runs the job in an existing session. */
    public static Summary run(SparkSession spark, Args args) throws IOException {
        long t0 = System.nanoTime();
        Configuration hadoop = spark.sparkContext().hadoopConfiguration();
        EmbeddedRedward driver = EmbeddedRedward.get(localBundles(args.bundles));
        List<String> files = listInputs(args.inputs, hadoop, driver.service(ReaderRegistry.class, null));
        SurveyMeasurer measurer = driver.service(SurveyMeasurer.class, null);
        MeasureRequest probe = args.request(List.of());
        List<Column> columns = measurer.table(probe, List.of(), 0).columns();
        StructType schema = schema(columns);

        JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
        int slices = Math.max(1, Math.min(files.size(), jsc.defaultParallelism() * 4));
        JavaRDD<String> fileRdd = jsc.parallelize(files, slices);
        final Args shipped = args;
        JavaRDD<Row> rows = fileRdd.mapPartitions(it -> measurePartition(shipped, it));
        Dataset<Row> table = spark.createDataFrame(rows, schema);
        Path outDir = Paths.get(args.out);
        String catalog = outDir.resolve("catalog.parquet").toString();
        table.write().mode(SaveMode.Overwrite).parquet(catalog);

        Dataset<Row> written = spark.read().parquet(catalog);
        long n = written.count();
        long failed = written.filter("status = 'failed'").count();
        writeProvenance(outDir, driver, args, files, n);
        return new Summary(files.size(), n, failed, (System.nanoTime() - t0) / 1e9, driver.bootSeconds(), Paths.get(catalog));
    }

    /** Runs on an executor: measures the files of one partition through the bundles' services. */
    static Iterator<Row> measurePartition(Args args, Iterator<String> files) throws IOException {
        EmbeddedRedward platform = EmbeddedRedward.get(localBundles(args.bundles));
        SurveyMeasurer measurer = platform.service(SurveyMeasurer.class, null);
        if (Boolean.getBoolean("redward.spark.failFirstAttempt")) {
            TaskContext tc = TaskContext.get();
            if (tc != null && tc.attemptNumber() == 0 && tc.partitionId() == 0) {
                throw new IOException("injected failure of the first attempt of partition 0 (test)");
            }
        }
        List<Row> out = new ArrayList<>();
        while (files.hasNext()) {
            String file = files.next();
            Path local = localCopy(file);
            List<MeasuredRow> measured = new ArrayList<>();
            MeasureRequest request = args.request(List.of(local));
            measurer.measure(request, measured::add);
            CatalogTable t = measurer.table(request, measured, measured.size());
            int sourceColumn = t.columnIndex("source");
            for (Object[] cells : t.rows()) {
                if (sourceColumn >= 0 && !local.toString().equals(file)) {
                    cells[sourceColumn] = file;
                }
                out.add(RowFactory.create(cells));
            }
            if (!local.toString().equals(file)) {
                Files.deleteIfExists(local);
            }
        }
        return out.iterator();
    }

    /** The bundle folder on this machine: the shipped archive in the working folder, else the path given. */
    static Path localBundles(String given) {
        Path shipped = Paths.get("bundles");
        if (Files.isDirectory(shipped)) {
            return shipped.toAbsolutePath();
        }
        try {
            Path fromFiles = Paths.get(SparkFiles.get("bundles"));
            if (Files.isDirectory(fromFiles)) {
                return fromFiles;
            }
        } catch (RuntimeException e) {
            // no SparkContext files here
        }
        return Paths.get(given).toAbsolutePath();
    }

    /** A local file to read: the path itself, or a temporary copy of a remote (Hadoop) file. */
    static Path localCopy(String file) throws IOException {
        URI uri = URI.create(file.contains(":/") ? file : Paths.get(file).toUri().toString());
        if ("file".equals(uri.getScheme())) {
            return Paths.get(file.contains(":/") ? Paths.get(uri).toString() : file);
        }
        org.apache.hadoop.fs.Path p = new org.apache.hadoop.fs.Path(uri);
        FileSystem fs = p.getFileSystem(new Configuration());
        String name = p.getName();
        Path tmp = Files.createTempFile("redward-", "-" + name);
        fs.copyToLocalFile(false, p, new org.apache.hadoop.fs.Path(tmp.toUri()), true);
        return tmp;
    }

    /** Expands folders (one level, spectrum-like files) through the Hadoop file system layer. */
    static List<String> listInputs(List<String> inputs, Configuration conf, ReaderRegistry readers) throws IOException {
        List<String> out = new ArrayList<>();
        for (String in : inputs) {
            boolean remote = in.matches("^[a-zA-Z][a-zA-Z0-9+.-]*://.*") && !in.startsWith("file:");
            if (!remote) {
                Path p = Paths.get(in.startsWith("file:") ? URI.create(in).getPath() : in).toAbsolutePath().normalize();
                if (Files.isDirectory(p)) {
                    try (var s = Files.list(p)) {
                        s.filter(Files::isRegularFile).filter(f -> readable(f, readers)).sorted()
                                .forEach(f -> out.add(f.toString()));
                    }
                } else if (Files.isRegularFile(p)) {
                    out.add(p.toString());
                } else {
                    throw new IOException("input " + in + " does not exist");
                }
                continue;
            }
            org.apache.hadoop.fs.Path p = new org.apache.hadoop.fs.Path(in);
            FileSystem fs = p.getFileSystem(conf);
            FileStatus st = fs.getFileStatus(p);
            if (st.isDirectory()) {
                for (FileStatus f : fs.listStatus(p)) {
                    if (f.isFile() && looksLikeSpectrum(Paths.get(f.getPath().getName()))) {
                        out.add(f.getPath().toString());
                    }
                }
            } else {
                out.add(p.toString());
            }
        }
        return out;
    }

    /**
     * The reading facade's rule for a file found in a folder (so that a folder gives the same
     * rows as with {@code measure}): some reader must be at least
     * {@link SpectrumInputs#FOLDER_MIN_SCORE} sure of it.
     */
    static boolean readable(Path file, ReaderRegistry readers) {
        byte[] head;
        try (java.io.InputStream raw = new java.io.BufferedInputStream(Files.newInputStream(file))) {
            raw.mark(2);
            boolean gzip = raw.read() == 0x1f && raw.read() == 0x8b;
            raw.reset();
            java.io.InputStream in = gzip ? new java.util.zip.GZIPInputStream(raw) : raw;
            head = in.readNBytes(8640);
        } catch (IOException e) {
            return true;
        }
        for (var r : readers.providers()) {
            if (r.service().sniff(file, head) >= SpectrumInputs.FOLDER_MIN_SCORE) {
                return true;
            }
        }
        return false;
    }

    private static boolean looksLikeSpectrum(Path p) {
        String n = p.getFileName().toString().toLowerCase(Locale.ROOT);
        return n.endsWith(".fits") || n.endsWith(".fit") || n.endsWith(".fits.gz") || n.endsWith(".fts")
                || n.endsWith(".csv") || n.endsWith(".txt") || n.endsWith(".dat");
    }

    static StructType schema(List<Column> columns) {
        List<StructField> fields = new ArrayList<>();
        for (Column c : columns) {
            DataType t = c.type() == Double.class ? DataTypes.DoubleType
                    : c.type() == Long.class ? DataTypes.LongType
                    : c.type() == Integer.class ? DataTypes.IntegerType
                    : c.type() == Boolean.class ? DataTypes.BooleanType : DataTypes.StringType;
            fields.add(DataTypes.createStructField(c.name(), t, true));
        }
        return DataTypes.createStructType(fields);
    }

    private static void writeProvenance(Path outDir, EmbeddedRedward driver, Args args, List<String> files, long rows)
            throws IOException {
        PlatformInfo info = driver.service(PlatformInfo.class, null);
        List<Object> bundles = new ArrayList<>();
        for (PlatformInfo.BundleRecord r : info.bundles()) {
            bundles.add(Json.object().put("symbolic_name", r.symbolicName()).put("version", r.version()).put("sha256", r.sha256()));
        }
        Json j = Json.object().put("engine", "spark").put("product_version", info.productVersion())
                .put("parameters", args.options).put("rows", rows).put("inputs", files).put("bundles", bundles)
                .put("platform_boot_seconds_driver", driver.bootSeconds());
        Files.createDirectories(outDir);
        Files.writeString(outDir.resolve("provenance.json"), j + "\n", StandardCharsets.UTF_8);
    }
}
