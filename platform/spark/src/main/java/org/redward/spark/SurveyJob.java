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
import org.apache.spark.util.CollectionAccumulator;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.Column;
import org.redward.api.commands.Json;
import org.redward.api.commands.PlatformInfo;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasuredRow;
import org.redward.api.survey.SurveyMeasurer;

/**
 * The survey-scale measurement on Apache Spark. The driver lists the input files and cuts them
 * into slices of at most {@code --spectra-per-task} spectra (default
 * {@value #DEFAULT_SPECTRA_PER_TASK}; see {@link #tasks}); each task (one slice) boots, once per
 * executor JVM, the embedded platform from the same bundles that {@code measure} uses, and
 * measures its slice through the {@link SurveyMeasurer} service exactly as {@code measure} does,
 * reading through the same reading facade (so a task holds at most one slice's rows). The
 * catalogue has the same columns as {@code measure}'s and is written as Parquet ({@code catalog.parquet} in the output folder) through Spark's output committer, so a
 * retried task never duplicates rows; {@code provenance.json} beside it names every bundle with
 * its SHA-256, the job's parameters and the input files.
 *
 * <p>Arguments: {@code --bundles DIR --out DIR [--master URL] [--estimator ID] [--templates ID]
 * [--profile ID] [--frame F] [--cosmology ID] [--time-limit-s S] [--spectra-per-task K] INPUTS...}
 * (INPUTS: files, folders or list files, local paths or any URI the Hadoop file system layer reads).
 */
public final class SurveyJob {

    /**
     * The most spectra one task measures unless {@code --spectra-per-task} says otherwise: small
     * enough that a task's rows and a retry stay cheap, large enough that Spark's per-task cost
     * (a few milliseconds) is lost in the measuring time (tens of milliseconds per spectrum).
     */
    public static final int DEFAULT_SPECTRA_PER_TASK = 200;

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
        int spectraPerTask = DEFAULT_SPECTRA_PER_TASK;
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
                        case "--spectra-per-task":
                            try {
                                a.spectraPerTask = Integer.parseInt(v);
                            } catch (NumberFormatException e) {
                                a.spectraPerTask = 0;
                            }
                            if (a.spectraPerTask < 1) {
                                throw new IllegalArgumentException("--spectra-per-task " + v + ": expected a whole number >= 1");
                            }
                            break;
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
        if (System.getProperty("spark.ui.showConsoleProgress") == null) {
            // tasks done / all, on standard error (Spark draws it when its own INFO messages are off)
            b = b.config("spark.ui.showConsoleProgress", "true");
        }
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
    public record Summary(long files, long rows, long failed, double seconds, double bootSeconds, Path catalog,
            Map<String, Double> executorBootSeconds) {
        @Override
        public String toString() {
            StringBuilder boots = new StringBuilder();
            executorBootSeconds.forEach((jvm, s) -> boots.append(boots.length() == 0 ? "" : ", ")
                    .append(String.format(Locale.ROOT, "%s %.2f s", jvm, s)));
            return String.format(Locale.ROOT, "redward on Spark: %d spectra from %d files (%d failed) in %.1f s"
                    + " (platform boot on the driver %.2f s); catalogue %s%nframework boot per executor JVM: %s", rows, files,
                    failed, seconds, bootSeconds, catalog, boots.length() == 0 ? "none reported" : boots);
        }
    }

    /** Runs the job in an existing session. */
    public static Summary run(SparkSession spark, Args args) throws IOException {
        long t0 = System.nanoTime();
        Configuration hadoop = spark.sparkContext().hadoopConfiguration();
        EmbeddedRedward driver = EmbeddedRedward.get(localBundles(args.bundles));
        SpectrumInputs facade = driver.service(SpectrumInputs.class, null);
        List<String> files = listInputs(args.inputs, hadoop, driver.service(ReaderRegistry.class, null), facade);
        SurveyMeasurer measurer = driver.service(SurveyMeasurer.class, null);
        MeasureRequest probe = args.request(List.of());
        List<Column> columns = measurer.table(probe, List.of(), 0).columns();
        StructType schema = schema(columns);

        JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
        List<String> tasks = tasks(files, facade, args);
        // one partition (one task) per slice: no task measures more than spectraPerTask spectra
        JavaRDD<String> fileRdd = jsc.parallelize(tasks, Math.max(1, tasks.size()));
        final Args shipped = args;
        CollectionAccumulator<String> boots = spark.sparkContext().collectionAccumulator("redward.platform.boot");
        JavaRDD<Row> rows = fileRdd.mapPartitions(it -> {
            Iterator<Row> measured = measurePartition(shipped, it);
            boots.add(bootRecord(EmbeddedRedward.get(localBundles(shipped.bundles))));
            return measured;
        });
        Dataset<Row> table = spark.createDataFrame(rows, schema);
        Path outDir = Paths.get(args.out);
        String catalog = outDir.resolve("catalog.parquet").toString();
        table.write().mode(SaveMode.Overwrite).parquet(catalog);

        Dataset<Row> written = spark.read().parquet(catalog);
        long n = written.count();
        long failed = written.filter("status = 'failed'").count();
        Map<String, Double> executorBoots = new java.util.TreeMap<>();
        for (String b : boots.value()) {
            int eq = b.lastIndexOf('=');
            executorBoots.put(b.substring(0, eq), Double.parseDouble(b.substring(eq + 1)));
        }
        writeProvenance(outDir, driver, args, files, n);
        return new Summary(files.size(), n, failed, (System.nanoTime() - t0) / 1e9, driver.bootSeconds(), Paths.get(catalog),
                executorBoots);
    }

    /**
     * {@code executor <id> (pid <pid>)=<boot seconds>} of this JVM's platform.
     * In local mode the executor is the driver's JVM and shares the driver's platform.
     */
    static String bootRecord(EmbeddedRedward platform) {
        org.apache.spark.SparkEnv env = org.apache.spark.SparkEnv.get();
        String id = env == null ? "?" : env.executorId();
        return "executor " + id + " (pid " + ProcessHandle.current().pid() + ")=" + platform.bootSeconds();
    }

    /**
     * The job's tasks in input order, each {@code first TAB count TAB file}: a local file whose
     * reader knows its number of spectra up front (through the reading facade's
     * {@link SpectrumInputs#counts}) is cut into slices of at most {@code args.spectraPerTask}
     * spectra; any other file (remote, or a count unknown before reading) is one task with count -1
     * (the whole file).
     */
    static List<String> tasks(List<String> files, SpectrumInputs facade, Args args) {
        List<Path> local = new ArrayList<>();
        for (String f : files) {
            if (isLocal(f)) {
                local.add(Paths.get(f));
            }
        }
        ReadOptions read = ReadOptions.defaults();
        if (args.options.containsKey("profile")) {
            read = read.withProfile(args.options.get("profile"));
        }
        long[] counts = facade.counts(local, read);
        List<String> out = new ArrayList<>();
        int k = 0;
        for (String f : files) {
            long n = isLocal(f) && counts.length == local.size() ? counts[k++] : -1;
            if (n <= 0) {
                out.add("0\t-1\t" + f);
                continue;
            }
            for (long first = 0; first < n; first += args.spectraPerTask) {
                out.add(first + "\t" + Math.min(args.spectraPerTask, n - first) + "\t" + f);
            }
        }
        return out;
    }

    private static boolean isLocal(String file) {
        return !file.matches("^[a-zA-Z][a-zA-Z0-9+.-]*://.*") || file.startsWith("file:");
    }

    /** Runs on an executor: measures the slices of one partition through the bundles' services. */
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
            String[] task = files.next().split("\t", 3);
            long first = Long.parseLong(task[0]);
            long count = Long.parseLong(task[1]);
            String file = task[2];
            Path local = localCopy(file);
            List<MeasuredRow> measured = new ArrayList<>();
            MeasureRequest request = args.request(List.of(local));
            if (count > 0) {
                request = request.withSlice(first, count);
            }
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

    /**
     * Expands folders (one level, spectrum-like files) through the Hadoop file system layer, and
     * local list files ({@code .list}, {@code .lst}, {@code @FILE}) by the reading facade's rule,
     * as {@code measure} does.
     */
    static List<String> listInputs(List<String> inputs, Configuration conf, ReaderRegistry readers, SpectrumInputs facade)
            throws IOException {
        List<String> out = new ArrayList<>();
        for (String in : inputs) {
            boolean remote = in.matches("^[a-zA-Z][a-zA-Z0-9+.-]*://.*") && !in.startsWith("file:");
            if (!remote) {
                Path p = Paths.get(in.startsWith("file:") ? URI.create(in).getPath() : in).toAbsolutePath().normalize();
                String name = p.getFileName() == null ? "" : p.getFileName().toString().toLowerCase(Locale.ROOT);
                if (in.startsWith("@") || (Files.isRegularFile(p) && (name.endsWith(".list") || name.endsWith(".lst")))) {
                    for (Path f : facade.expand(List.of(Paths.get(in)))) {
                        out.add(f.toAbsolutePath().normalize().toString());
                    }
                } else if (Files.isDirectory(p)) {
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
