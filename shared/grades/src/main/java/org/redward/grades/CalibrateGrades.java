package org.redward.grades;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;

import org.redward.api.redshift.GradeCalibration;
import org.redward.testkit.GradeCalibrator;

/**
 * Recalibrates the grades of our estimators on the mock survey and checks them on another seed.
 *
 * <p>Run from the repository root (after a build):
 * <pre>
 * mvn -B -o -pl shared/grades -am verify -Pcalibrate-grades -Dsurefire.failIfNoSpecifiedTests=false
 * </pre>
 * or with options: {@code -Dgrades.args="--repo . --calibration-size 6000 --check-size 3000"}.
 * Options: {@code --repo DIR} (where the tables are written; without it they are only printed),
 * {@code --calibration-seed A} (default {@value #CALIBRATION_SEED}), {@code --calibration-size N}
 * (default 6000), {@code --check-seed B} (default {@value #CHECK_SEED}), {@code --check-size N}
 * (default 4000), {@code --threads N}, {@code --dump FILE} (every solution's diagnostics as TSV).
 * Neither seed is the demo's default (2026); the check seed is the accuracy benchmark's default,
 * so {@code redward accuracy} shows the same kind of figures.
 *
 * <p>Prints, per estimator, the table derived on seed A and the check on seed B: grade, stated
 * fraction (the grade's floor), measured fraction, count and whether the floor is met within two
 * binomial standard errors.
 */
public final class CalibrateGrades {

    /** The mock survey seed the committed tables are derived on. */
    public static final long CALIBRATION_SEED = 4242;
    /** The mock survey seed they are checked on (never the calibration seed). */
    public static final long CHECK_SEED = 7;

    private CalibrateGrades() {
    }

    public static void main(String[] args) throws IOException {
        Path repo = null;
        long seedA = CALIBRATION_SEED;
        long seedB = CHECK_SEED;
        int sizeA = 6000;
        int sizeB = 4000;
        int threads = Runtime.getRuntime().availableProcessors();
        Path dump = null;
        for (int i = 0; i < args.length; i++) {
            String v = i + 1 < args.length ? args[i + 1] : "";
            switch (args[i]) {
                case "--repo" -> repo = Path.of(args[++i]);
                case "--calibration-seed" -> seedA = Long.parseLong(args[++i]);
                case "--calibration-size" -> sizeA = Integer.parseInt(args[++i]);
                case "--check-seed" -> seedB = Long.parseLong(args[++i]);
                case "--check-size" -> sizeB = Integer.parseInt(args[++i]);
                case "--threads" -> threads = Integer.parseInt(args[++i]);
                case "--dump" -> dump = Path.of(args[++i]);
                default -> throw new IllegalArgumentException("unknown option " + args[i] + " " + v);
            }
        }
        if (seedA == seedB) {
            throw new IllegalArgumentException("--calibration-seed and --check-seed must differ (the check must be honest)");
        }
        List<GradedEstimator> ests = GradedEstimator.ours();
        long t0 = System.nanoTime();
        Map<String, List<MockSolutions.Outcome>> a = MockSolutions.measure(seedA, sizeA, ests, threads);
        System.out.printf(Locale.ROOT, "calibration survey: seed %d, %d fibres, measured in %.0f s%n", seedA, sizeA, (System.nanoTime() - t0) / 1e9);
        if (dump != null) {
            dump(dump, a);
        }
        t0 = System.nanoTime();
        Map<String, List<MockSolutions.Outcome>> b = MockSolutions.measure(seedB, sizeB, ests, threads);
        System.out.printf(Locale.ROOT, "check survey: seed %d, %d fibres, measured in %.0f s%n", seedB, sizeB, (System.nanoTime() - t0) / 1e9);
        System.out.println(GradeCalibration.CORRECT_DEFINITION + " (against the truth's z_topo; a redshift for an empty fibre is wrong)");
        for (GradedEstimator e : ests) {
            String origin = String.format(Locale.ROOT,
                    "grades of %s measured on the mock survey (seed %d, %d fibres, generator version %s) with %s; checked on seed %d",
                    e.id(), seedA, sizeA, org.redward.mock.internal.SurveyGenerator.VERSION,
                    e.context().templates().map(t -> "template set " + t.id()).orElse("no templates"), seedB);
            String table = GradeCalibrator.derive(MockSolutions.scored(a.get(e.id()), e), e.statistic(), origin);
            GradeCalibration cal = GradeCalibration.read(e.statistic(),
                    new ByteArrayInputStream(table.getBytes(StandardCharsets.UTF_8)), 0.0);
            System.out.println();
            System.out.print(table);
            System.out.print(GradeCalibrator.format(String.format(Locale.ROOT, "check of %s on seed %d (%d fibres):", e.id(), seedB, sizeB),
                    GradeCalibrator.check(MockSolutions.scored(b.get(e.id()), e), cal)));
            if (repo != null) {
                Path p = e.tablePath(repo);
                Files.createDirectories(p.getParent());
                Files.writeString(p, table);
                System.out.println("written " + p);
            }
        }
    }

    private static void dump(Path file, Map<String, List<MockSolutions.Outcome>> all) throws IOException {
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(file))) {
            TreeSet<String> keys = new TreeSet<>();
            all.values().forEach(l -> l.forEach(o -> keys.addAll(o.solution().diagnostics().keySet())));
            w.println("estimator\tobj_id\tkind\tsnr\tz_true\tok\tz\tclass\tcorrect\tgrade\twarnings\t" + String.join("\t", keys));
            for (Map.Entry<String, List<MockSolutions.Outcome>> e : all.entrySet()) {
                for (MockSolutions.Outcome o : e.getValue()) {
                    StringBuilder b = new StringBuilder();
                    b.append(e.getKey()).append('\t').append(o.truth().objectId()).append('\t').append(o.truth().kind().key()).append('\t')
                            .append(o.truth().snrMedian()).append('\t').append(o.truth().zTopo()).append('\t').append(o.solution().ok())
                            .append('\t').append(o.solution().z()).append('\t').append(o.solution().objectClass().key()).append('\t').append(o.correct()).append('\t').append(o.solution().grade())
                            .append('\t').append(o.solution().warnings().size());
                    for (String k : keys) {
                        b.append('\t').append(o.diagnostic(k));
                    }
                    w.println(b);
                }
            }
        }
    }
}
