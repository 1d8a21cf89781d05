package org.redward.platform.tests;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * Survey-scale figures of the assembled product, run end to end as a user runs it (each step a
 * separate JVM through {@code bin/redward}) on a mock survey of the invented Quill spectrograph,
 * with the default estimator:
 *
 * <ol>
 * <li>the speed-up of {@code measure} from 1 to 2 threads on the survey's first S spectra (by
 * default all of them; a subset is said in the output), from the command's own figures and
 * after warm-up: between the moments the journal held 20% and 90% of the spectra. A run's first
 * seconds carry one-time costs (start-up, JIT compilation, the first preparation of the
 * templates), and a JVM's compiler threads run on the core a 1-thread run leaves free, so the
 * shorter the run, the more they lower the figure of the 2-thread run only;</li>
 * <li>for each size (default 10,000 then all N): {@code measure --threads 2} (spectra per second:
 * the command's own figure, and the size over the wall time of the whole process, start-up and
 * catalogue included), then {@code measure --engine spark --master local[2]} on the same spectra
 * (its throughput against {@code measure}'s, goal at least 0.8, and the framework boot time per
 * executor JVM);</li>
 * <li>heap: every {@code measure} runs with {@code -Xmx1g} (or {@code redward.bench.xmx}) and a GC
 * log; the live heap is the peak of the heap in use right after a full collection (the peak after
 * any collection is only an upper bound: old-generation garbage stays until a full collection, so
 * it creeps up through a long run with a large heap), at every size, to show it is flat in the
 * number of spectra. A small {@code -Xmx} forces full collections and so gives the live figure;
 * completing at the same rate under it is the proof that the run fits.</li>
 * </ol>
 *
 * Figures are printed as each step ends, so a run cut short still reports the sizes it finished.
 * The 1-minute load average is sampled during each step and printed beside it (other work on the
 * same cores slows every figure). Nothing is asserted about time.
 *
 * <p>The survey is generated once by {@code redward demo --generate-only} and cached in
 * {@code redward.bench.dir} (default {@code $TMPDIR/redward-bench}, outside the repository); the
 * smaller sizes are list files of its first files. Each step's output is in
 * {@code <dir>/runs/<step>/} as it comes. Settings (system properties): {@code redward.bench.size}
 * (N, default 100000), {@code redward.bench.sizes} (default {@code 10000,N}),
 * {@code redward.bench.subset} (S, default N: the speed-up of the whole survey; its 2-thread run
 * then serves as the size-N step too), {@code redward.bench.seed} (default 8),
 * {@code redward.bench.xmx} (heap limit of every {@code measure}, default 1g),
 * {@code redward.bench.spark} (default true), {@code redward.product} (the product folder; the
 * survey feature must be installed for the Spark steps). Run alone with
 * {@code mvn -B verify -Pbenchmarks -pl platform/tests -Dtest=SurveyScaleBenchmark} (hours at the
 * default size on two cores; a quick look:
 * {@code -Dredward.bench.size=2000 -Dredward.bench.sizes=500,2000 -Dredward.bench.subset=300}).
 */
class SurveyScaleBenchmark {

    private static final Pattern MEASURED = Pattern.compile(
            "measured (\\d+) spectra: (\\d+) ok, (\\d+) failed.* in ([0-9.]+) s \\(([0-9.]+) spectra/s\\)");
    private static final Pattern OWN_HEAP = Pattern.compile("(?:live heap \\(after full collections\\): peak|minor collections at most) (\\d+) MiB");
    private static final Pattern GC_LINE = Pattern.compile("GC\\(\\d+\\) (Pause [A-Za-z ]+?)(?: \\([^)]*\\))* (\\d+)([KMG])->(\\d+)([KMG])\\((\\d+)([KMG])\\)");
    private static final Pattern SPARK = Pattern.compile("redward on Spark: (\\d+) spectra from (\\d+) files \\((\\d+) failed\\) in ([0-9.]+) s");
    private static final Pattern BOOT = Pattern.compile("framework boot per executor JVM: (.*)");

    @Test
    void surveyScale() throws Exception {
        main(new String[0]);
    }

    public static void main(String[] argv) throws Exception {
        int n = Integer.getInteger("redward.bench.size", 100_000);
        List<Integer> sizes = new ArrayList<>();
        for (String w : System.getProperty("redward.bench.sizes", "10000," + n).split(",")) {
            int size = Math.min(n, Integer.parseInt(w.trim()));
            if (!sizes.contains(size)) {
                sizes.add(size);
            }
        }
        int subset = Math.min(n, Integer.getInteger("redward.bench.subset", n));
        long seed = Long.getLong("redward.bench.seed", 8);
        boolean spark = Boolean.parseBoolean(System.getProperty("redward.bench.spark", "true"));
        Path dir = Path.of(System.getProperty("redward.bench.dir", System.getProperty("java.io.tmpdir") + "/redward-bench"))
                .toAbsolutePath();
        Files.createDirectories(dir);
        say("product %s; cache and run folders %s; %d cores; survey N=%d (seed %d); sizes %s; speed-up subset %d",
                Product.home(), dir, Runtime.getRuntime().availableProcessors(), n, seed, sizes, subset);

        long t0 = System.nanoTime();
        Product.Run gen = Product.run(dir, Map.of(), 4 * 3600, "demo", "--generate-only", "--size", Integer.toString(n),
                "--seed", Long.toString(seed), "--out", dir.toString());
        check(gen, "generating the survey");
        Path survey = dir.resolve("survey-seed" + seed + "-n" + n);
        List<Path> files;
        try (Stream<Path> s = Files.list(survey)) {
            files = s.filter(p -> p.getFileName().toString().endsWith(".fits")).sorted(Comparator.comparing(Path::toString)).toList();
        }
        say("survey ready in %.0f s (generated now, or reused when already complete): %d files in %s", secs(t0), files.size(), survey);

        Path subsetList = firstSpectra(dir, files, n, subset);
        Step one = measure(dir, "subset-1-thread", subsetList, 1);
        Step two = measure(dir, "subset-2-threads", subsetList, 2);
        say("BENCHMARK speed-up 1 -> 2 threads on the first %d spectra%s: %.2f (goal >= 1.8) from the command's figures"
                + " (1 thread %.1f spectra/s, 2 threads %.1f spectra/s); %.2f after warm-up, over spectra %d-%d of the run, timed"
                + " from the journal (1 thread %.1f, 2 threads %.1f spectra/s); load %s / %s", one.spectra,
                subset < n ? " (a subset, so that the 1-thread run fits)" : " (the whole survey)", two.rate / one.rate, one.rate,
                two.rate, two.steady / one.steady, Math.round(WARM_FROM * subset) + 1, Math.round(WARM_TO * subset), one.steady,
                two.steady, one.load, two.load);
        List<Step> heaps = new ArrayList<>(List.of(two));
        for (int size : sizes) {
            Path input = size == n ? survey : firstSpectra(dir, files, n, size);
            // the 2-thread run of the speed-up already measured this size: not run twice
            Step all = size == subset ? two : measure(dir, "measure-" + size, input, 2);
            if (all != two) {
                heaps.add(all);
            }
            say("BENCHMARK measure 2 threads, %d spectra: %.1f spectra/s (command's figure), %.1f spectra/s end to end"
                    + " (wall of the whole process, start-up and catalogue included); load %s", all.spectra, all.rate,
                    all.spectra / all.wall, all.load);
            StringBuilder flat = new StringBuilder();
            for (Step h : heaps) {
                flat.append(flat.length() == 0 ? "" : ", ").append(h.spectra).append(" spectra ").append(h.heap());
            }
            say("BENCHMARK heap of measure under -Xmx%s (GC log): %s (goal < 1024 MiB, flat; a small -Xmx such as"
                    + " -Dredward.bench.xmx=128m forces full GCs and so shows the live heap)", System.getProperty("redward.bench.xmx", "1g"), flat);
            if (spark) {
                Step onSpark = spark(dir, "spark-" + size, input);
                say("BENCHMARK spark local[2], the same %d spectra: %.1f spectra/s (job's figure), %.1f end to end;"
                        + " ratio to measure %.2f (job's figures), %.2f (end to end) (goal >= 0.8); framework boot per executor JVM: %s;"
                        + " load %s", onSpark.spectra, onSpark.rate, onSpark.spectra / onSpark.wall, onSpark.rate / all.rate,
                        (onSpark.spectra / onSpark.wall) / (all.spectra / all.wall), onSpark.boot, onSpark.load);
            }
        }
    }

    /** A list file of the survey's first files holding {@code count} spectra (the survey has {@code n} in {@code files}). */
    private static Path firstSpectra(Path dir, List<Path> files, int n, int count) throws IOException {
        int perFile = (int) Math.ceil((double) n / files.size());
        Path list = dir.resolve("first-" + count + "-of-" + n + ".list");
        Files.write(list, files.subList(0, Math.min(files.size(), (count + perFile - 1) / perFile)).stream().map(Path::toString).toList());
        return list;
    }

    /** The rate after warm-up is timed between these fractions of a run's spectra. */
    private static final double WARM_FROM = 0.2;
    private static final double WARM_TO = 0.9;

    /** One timed step; {@code steady}: spectra per second after warm-up (NaN if not timed). */
    private record Step(String label, long spectra, long failed, double rate, double wall, long gcPeakMiB, long ownPeakMiB,
            long gcCount, long liveMiB, long fullCount, String boot, String load, double steady) {
        String heap() {
            String live = fullCount > 0 ? String.format(Locale.ROOT, "live %d MiB (peak after %d full GCs)", liveMiB, fullCount)
                    : "no full GC";
            return String.format(Locale.ROOT, "%s; after any GC <= %d MiB; measure's own line %d MiB", live, gcPeakMiB, ownPeakMiB);
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%-18s %7d spectra (%d failed) %8.1f spectra/s (%.1f after warm-up), wall %7.1f s,"
                    + " heap after GC peak %s over %d GCs; load %s%s", label, spectra, failed, rate, steady, wall, heap(), gcCount, load,
                    boot.isEmpty() ? "" : "; boot " + boot);
        }
    }

    private static Step measure(Path dir, String label, Path input, int threads) throws Exception {
        Path work = fresh(dir.resolve("runs").resolve(label));
        Path gcLog = work.resolve("gc.log");
        String opts = "-Xmx" + System.getProperty("redward.bench.xmx", "1g") + " -Xlog:gc:file=" + gcLog;
        say("%s: redward measure %s --threads %d --out catalog.fits (REDWARD_JAVA_OPTS=%s)", label, input, threads, opts);
        LoadSampler load = new LoadSampler();
        JournalWatch journal = new JournalWatch(work.resolve("catalog.fits.journal"));
        long t0 = System.nanoTime();
        Product.Run r = live(work, Map.of("REDWARD_JAVA_OPTS", opts), "measure", input.toString(),
                "--threads", Integer.toString(threads), "--out", "catalog.fits");
        double wall = secs(t0);
        String loadText = load.stop();
        journal.stop();
        check(r, label);
        Matcher m = find(MEASURED, r.err(), label);
        Matcher own = OWN_HEAP.matcher(r.err());
        long ownPeak = own.find() ? Long.parseLong(own.group(1)) : -1;
        long[] gc = gcPeak(gcLog);
        Step s = new Step(label, Long.parseLong(m.group(1)), Long.parseLong(m.group(3)), Double.parseDouble(m.group(5)), wall,
                gc[0], ownPeak, gc[1], gc[2], gc[3], "", loadText, journal.rate(Long.parseLong(m.group(1))));
        say("  %s", s);
        return s;
    }

    private static Step spark(Path dir, String label, Path input) throws Exception {
        Path work = fresh(dir.resolve("runs").resolve(label));
        say("%s: redward measure %s --engine spark --master local[2] --out spark-out", label, input);
        LoadSampler load = new LoadSampler();
        long t0 = System.nanoTime();
        Product.Run r = live(work, Map.of(), "measure", input.toString(), "--engine", "spark",
                "--master", "local[2]", "--out", "spark-out");
        double wall = secs(t0);
        String loadText = load.stop();
        check(r, label);
        Matcher m = find(SPARK, r.out() + r.err(), label);
        Matcher boot = BOOT.matcher(r.out() + r.err());
        long spectra = Long.parseLong(m.group(1));
        Step s = new Step(label, spectra, Long.parseLong(m.group(3)), spectra / Double.parseDouble(m.group(4)), wall, -1, -1, 0, -1, 0,
                boot.find() ? boot.group(1).trim() : "not reported", loadText, Double.NaN);
        say("  %s", s);
        return s;
    }

    /**
     * Runs {@code redward args...} in {@code work} with its output in {@code work/stdout.txt} and
     * {@code work/stderr.txt} as it comes (to follow a long run), at most four hours.
     */
    private static Product.Run live(Path work, Map<String, String> env, String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        cmd.add(Product.home().resolve("bin").resolve("redward").toString());
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(work.toFile());
        pb.environment().putAll(env);
        Path out = work.resolve("stdout.txt");
        Path err = work.resolve("stderr.txt");
        Process p = pb.redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(4, java.util.concurrent.TimeUnit.HOURS)) {
            p.destroyForcibly();
            throw new AssertionError("redward " + String.join(" ", args) + " did not finish within 4 hours");
        }
        return new Product.Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
    }

    /**
     * From a {@code -Xlog:gc} file: the peak heap after any collection (MiB; an upper bound of the
     * live heap, since old-generation garbage stays until a full collection), the number of
     * collections, the peak after a full collection (the live heap; -1 if none) and the number of
     * full collections.
     */
    static long[] gcPeak(Path gcLog) throws IOException {
        long peak = -1;
        long count = 0;
        long live = -1;
        long full = 0;
        if (!Files.exists(gcLog)) {
            return new long[] {-1, 0, -1, 0};
        }
        for (String line : Files.readAllLines(gcLog)) {
            Matcher m = GC_LINE.matcher(line);
            if (m.find()) {
                count++;
                long after = mib(Long.parseLong(m.group(4)), m.group(5));
                peak = Math.max(peak, after);
                if (m.group(1).startsWith("Pause Full")) {
                    full++;
                    live = Math.max(live, after);
                }
            }
        }
        return new long[] {peak, count, live, full};
    }

    private static long mib(long v, String unit) {
        return switch (unit) {
            case "K" -> v / 1024;
            case "G" -> v * 1024;
            default -> v;
        };
    }

    private static Matcher find(Pattern p, String text, String label) {
        Matcher m = p.matcher(text);
        if (!m.find()) {
            throw new AssertionError(label + ": no line matching " + p + " in:\n" + text);
        }
        return m;
    }

    private static void check(Product.Run r, String what) {
        if (r.status() != 0) {
            throw new AssertionError(what + " failed: " + r);
        }
    }

    private static Path fresh(Path p) throws IOException {
        if (Files.exists(p)) {
            try (Stream<Path> s = Files.walk(p)) {
                for (Path q : s.sorted(Comparator.reverseOrder()).toList()) {
                    Files.delete(q);
                }
            }
        }
        return Files.createDirectories(p);
    }

    private static double secs(long t0) {
        return (System.nanoTime() - t0) / 1e9;
    }

    private static void say(String format, Object... args) {
        System.out.println(String.format(Locale.ROOT, format, args));
        System.out.flush();
    }

    /**
     * Follows a run's journal (one line per measured spectrum, flushed as it comes) every 200 ms,
     * to time the run after its warm-up: the start-up, the first compilations of the hot code and
     * the first loading of the templates all fall in the first spectra of a run, and a short run's
     * figure mixes them with the rate the run settles at.
     */
    private static final class JournalWatch {
        private final Path file;
        private final List<long[]> samples = new ArrayList<>();
        private final Thread thread;
        private long offset;
        private long lines;

        JournalWatch(Path file) {
            this.file = file;
            thread = new Thread(() -> {
                try {
                    while (true) {
                        Thread.sleep(200);
                        poll();
                    }
                } catch (InterruptedException e) {
                    // stopped
                }
            }, "journal-watch");
            thread.setDaemon(true);
            thread.start();
        }

        private void poll() {
            long now = System.nanoTime();
            try (java.nio.channels.FileChannel ch = java.nio.channels.FileChannel.open(file)) {
                ch.position(offset);
                java.nio.ByteBuffer b = java.nio.ByteBuffer.allocate(1 << 16);
                int k;
                while ((k = ch.read(b)) > 0) {
                    for (int i = 0; i < k; i++) {
                        if (b.get(i) == '\n') {
                            lines++;
                        }
                    }
                    offset += k;
                    b.clear();
                }
            } catch (IOException e) {
                return; // not there yet, or already turned into the catalogue
            }
            synchronized (samples) {
                samples.add(new long[] {now, Math.max(0, lines - 1)}); // the first line names the run
            }
        }

        void stop() throws InterruptedException {
            thread.interrupt();
            thread.join();
        }

        /** Spectra per second between the polls where the journal passed WARM_FROM and WARM_TO of {@code spectra} rows. */
        double rate(long spectra) {
            synchronized (samples) {
                long[] a = null;
                long[] b = null;
                for (long[] s : samples) {
                    if (a == null && s[1] >= WARM_FROM * spectra) {
                        a = s;
                    }
                    if (b == null && s[1] >= WARM_TO * spectra) {
                        b = s;
                    }
                }
                return a == null || b == null || b[0] <= a[0] ? Double.NaN : (b[1] - a[1]) / ((b[0] - a[0]) / 1e9);
            }
        }
    }

    /** Samples the 1-minute load average (/proc/loadavg) every 15 s on a daemon thread. */
    private static final class LoadSampler {
        private final List<Double> samples = new ArrayList<>();
        private final Thread thread;

        LoadSampler() {
            thread = new Thread(() -> {
                try {
                    while (true) {
                        sample();
                        Thread.sleep(15_000);
                    }
                } catch (InterruptedException e) {
                    // stopped
                }
            }, "load-sampler");
            thread.setDaemon(true);
            thread.start();
        }

        private void sample() {
            try {
                String s = Files.readString(Path.of("/proc/loadavg")).trim().split("\\s+")[0];
                synchronized (samples) {
                    samples.add(Double.parseDouble(s));
                }
            } catch (IOException | RuntimeException e) {
                // not Linux: no figure
            }
        }

        String stop() throws InterruptedException {
            thread.interrupt();
            thread.join();
            sample();
            synchronized (samples) {
                if (samples.isEmpty()) {
                    return "n/a";
                }
                double sum = 0;
                double max = 0;
                for (double d : samples) {
                    sum += d;
                    max = Math.max(max, d);
                }
                return String.format(Locale.ROOT, "1-min avg mean %.1f, max %.1f (%d samples)", sum / samples.size(), max, samples.size());
            }
        }
    }
}
