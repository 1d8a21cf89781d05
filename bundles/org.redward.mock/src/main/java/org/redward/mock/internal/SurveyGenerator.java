package org.redward.mock.internal;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.LongConsumer;
import java.util.random.RandomGenerator;
import java.util.stream.IntStream;

/**
 * Generates the mock survey of the invented Ember field: {@code size} fibres in files of
 * {@value Scenario#FIBRES_PER_FILE}, each file one Quill exposure at its own time, with a truth
 * table. Deterministic: the same seed and size give byte-identical files whatever the number of
 * threads (each fibre draws from its own generator seeded from the survey seed and its index).
 * Thread-safe (no shared mutable state).
 */
public final class SurveyGenerator {

    /** Version of the generator's recipes; recorded in the files and the manifest. */
    public static final String VERSION = "1";
    /** Largest survey the generator accepts. */
    public static final int MAX_SIZE = 200_000;

    private final long seed;
    private final int size;
    private final java.util.Map<Integer, double[]> observerVelocity = new java.util.concurrent.ConcurrentHashMap<>();

    public SurveyGenerator(long seed, int size) {
        if (size < 1 || size > MAX_SIZE) {
            throw new IllegalArgumentException("survey size " + size + " is out of range 1.." + MAX_SIZE);
        }
        this.seed = seed;
        this.size = size;
    }

    public long seed() {
        return seed;
    }

    public int size() {
        return size;
    }

    public int files() {
        return (size + Scenario.FIBRES_PER_FILE - 1) / Scenario.FIBRES_PER_FILE;
    }

    public static String fileName(int exposure) {
        return String.format(Locale.ROOT, "quill-ember-e%04d.fits", exposure + 1);
    }

    /** Kinds in fibre order: fixed proportions, shuffled by the seed. */
    List<Kind> kinds() {
        int empty = Math.max(2, (int) Math.round(0.015 * size));
        int broken = Math.max(2, (int) Math.round(0.01 * size));
        if (size < 20) {
            empty = size >= 4 ? 1 : 0;
            broken = size >= 4 ? 1 : 0;
        }
        int rest = size - empty - broken;
        int qso = (int) Math.round(0.14 * rest);
        int star = (int) Math.round(0.21 * rest);
        int abs = (int) Math.round(0.30 * rest);
        int em = rest - qso - star - abs;
        List<Kind> k = new ArrayList<>(size);
        add(k, Kind.GALAXY_EMISSION, em);
        add(k, Kind.GALAXY_ABSORPTION, abs);
        add(k, Kind.QUASAR, qso);
        add(k, Kind.STAR, star);
        add(k, Kind.EMPTY, empty);
        add(k, Kind.BROKEN, broken);
        Collections.shuffle(k, new java.util.Random(seed ^ 0x5DEECE66DL));
        return k;
    }

    private static void add(List<Kind> list, Kind k, int n) {
        for (int i = 0; i < n; i++) {
            list.add(k);
        }
    }

    /**
     * Mid-exposure UTC MJD of an exposure: seasons of 13 exposures a week apart from April of each
     * year, each near the field's transit (which comes 1/365.2422 day earlier every night).
     */
    static double exposureMjd(int exposure) {
        int season = exposure / 13;
        int night = 7 * (exposure % 13);
        return Scenario.FIRST_EXPOSURE_MJD + 365.25 * season + night - night / 365.2422;
    }

    /** One generated fibre: its data and its truth. */
    record Fibre(TruthRow truth, Observation.Result data) {
    }

    Fibre fibre(int index, Kind kind) {
        RandomGenerator r = new SplittableRandom(seed * 0x9E3779B97F4A7C15L + index * 0xBF58476D1CE4E5B9L + 7);
        int exposure = index / Scenario.FIBRES_PER_FILE;
        int row = index % Scenario.FIBRES_PER_FILE;
        double mjd = exposureMjd(exposure);
        // position: uniform on the field disc
        double rad = Scenario.FIELD_RADIUS_DEG * Math.sqrt(r.nextDouble());
        double ang = 2 * Math.PI * r.nextDouble();
        double dec = Scenario.FIELD_DEC_DEG + rad * Math.sin(ang);
        double ra = Scenario.FIELD_RA_DEG + rad * Math.cos(ang) / Math.cos(Math.toRadians(dec));
        double[] vObs = observerVelocity.computeIfAbsent(exposure, e -> ObserverMotion.observerVelocityKmPerS(mjd,
                Scenario.SITE_LONGITUDE_DEG, Scenario.SITE_LATITUDE_DEG, Scenario.SITE_HEIGHT_M));
        double[] dir = ObserverMotion.direction(ra, dec);
        double vBary = vObs[0] * dir[0] + vObs[1] * dir[1] + vObs[2] * dir[2];
        double skyScale = new SplittableRandom(seed + 1000003L * exposure).nextDouble(0.7, 1.4);
        Grid g = Grid.quill();
        double zCosmo = Double.NaN;
        double vPec = Double.NaN;
        double zBary = Double.NaN;
        double zTopo = Double.NaN;
        Observation.Result data;
        java.util.Map<String, Double> params = new java.util.LinkedHashMap<>();
        if (kind.hasRedshift()) {
            if (kind == Kind.STAR) {
                double v = r.nextDouble() < 0.8 ? -15 + 45 * r.nextGaussian() : -40 + 150 * r.nextGaussian();
                v = Math.max(-450, Math.min(450, v));
                double beta = v / Grid.C_KM_S;
                zBary = Math.sqrt((1 + beta) / (1 - beta)) - 1;
                params.put("v_radial_km_s", v);
            } else {
                zCosmo = switch (kind) {
                    case GALAXY_ABSORPTION -> smail(r, 0.30, 0.01, 1.0);
                    case GALAXY_EMISSION -> smail(r, 0.38, 0.005, 1.2);
                    default -> Recipes.uniform(r, 0.25, 3.5);
                };
                vPec = 300 * r.nextGaussian(); // typical galaxy peculiar velocities ~300 km/s (common practice)
                double beta = vPec / Grid.C_KM_S;
                zBary = (1 + zCosmo) * Math.sqrt((1 + beta) / (1 - beta)) - 1; // relativistic Doppler, composed multiplicatively
            }
            zTopo = (1 + zBary) / (1 + vBary / Grid.C_KM_S) - 1;
            Recipes.Built b = switch (kind) {
                case GALAXY_ABSORPTION -> Recipes.absorptionGalaxy(g, zTopo, r);
                case GALAXY_EMISSION -> Recipes.emissionGalaxy(g, zTopo, r);
                case QUASAR -> Recipes.quasar(g, zTopo, r);
                default -> Recipes.star(g, zTopo, r);
            };
            params.putAll(b.parameters());
            double snr = Recipes.logUniform(r, 1.5, 40);
            data = Observation.observe(g, b.model().flux(), snr, skyScale, r);
        } else if (kind == Kind.EMPTY) {
            data = Observation.observe(g, null, 0, skyScale, r);
        } else {
            data = Observation.broken(g, r);
        }
        String id = String.format(Locale.ROOT, "EMB-%05d", index + 1);
        TruthRow t = new TruthRow(id, fileName(exposure), row, row + 1, kind, ra, dec, mjd, zCosmo, vPec, zBary, vBary,
                zTopo, kind.hasRedshift() ? data.snrMedian : Double.NaN, data.magAb, data.cosmicHits, data.cosmicUnflagged, params);
        return new Fibre(t, data);
    }

    /** Redshift drawn from p(z) ~ z^2 exp(-(z/z0)^1.5) on [lo, hi] (a common survey n(z) shape). */
    static double smail(RandomGenerator r, double z0, double lo, double hi) {
        double zPeak = z0 * Math.pow(4.0 / 3.0, 2.0 / 3.0);
        double pMax = zPeak * zPeak * Math.exp(-Math.pow(zPeak / z0, 1.5));
        while (true) {
            double z = Recipes.uniform(r, lo, hi);
            if (r.nextDouble() * pMax <= z * z * Math.exp(-Math.pow(z / z0, 1.5))) {
                return z;
            }
        }
    }

    /**
     * Writes the survey into {@code dir} (which must exist and be empty): the Quill files and
     * {@code truth.csv}. Reports each finished fibre to {@code progress}.
     *
     * @return the truth rows in fibre order
     */
    public List<TruthRow> write(Path dir, LongConsumer progress) throws IOException {
        List<Kind> kinds = kinds();
        List<TruthRow> truth = new ArrayList<>(size);
        AtomicLong done = new AtomicLong();
        for (int e = 0; e < files(); e++) {
            int from = e * Scenario.FIBRES_PER_FILE;
            int to = Math.min(size, from + Scenario.FIBRES_PER_FILE);
            Fibre[] fibres = IntStream.range(from, to).parallel().mapToObj(i -> {
                Fibre f = fibre(i, kinds.get(i));
                progress.accept(done.incrementAndGet());
                return f;
            }).toArray(Fibre[]::new);
            try {
                QuillFiles.write(dir.resolve(fileName(e)), e, exposureMjd(e), seed, fibres);
            } catch (UncheckedIOException ex) {
                throw ex.getCause();
            }
            for (Fibre f : fibres) {
                truth.add(f.truth());
            }
        }
        try (var w = Files.newBufferedWriter(dir.resolve("truth.csv"))) {
            w.write("# Truth of the mock survey of the invented Ember field (Quill spectrograph, Ossel 2.6m, Quenta Ridge).\n");
            w.write("# Invented data for demonstrations and accuracy benchmarks only. Seed " + seed + ", size " + size
                    + ", generator version " + VERSION + ".\n");
            w.write("# z_topo: redshift as seen at the telescope; z_bary = (1+z_topo)(1+v_bary_km_s/c) - 1; z_cosmo: Hubble flow;"
                    + " snr_median: median noise-free S/N per pixel; mag_ab: 5600-6800 A box.\n");
            w.write(TruthRow.HEADER);
            w.write('\n');
            for (TruthRow t : truth) {
                w.write(t.toCsv());
                w.write('\n');
            }
        }
        return truth;
    }

    /** Reads a truth table written by {@link #write}. */
    public static List<TruthRow> readTruth(Path csv) throws IOException {
        List<TruthRow> rows = new ArrayList<>();
        for (String line : Files.readAllLines(csv)) {
            if (line.isBlank() || line.startsWith("#") || line.startsWith("obj_id,")) {
                continue;
            }
            rows.add(TruthRow.parse(line));
        }
        return rows;
    }
}
