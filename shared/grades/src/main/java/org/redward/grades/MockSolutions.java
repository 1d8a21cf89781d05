package org.redward.grades;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Stream;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.redshift.GradeCalibration;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.formats.fits.internal.FitsReader;
import org.redward.mock.internal.SurveyGenerator;
import org.redward.mock.internal.TruthRow;
import org.redward.profiles.internal.ProfileDescriptor;
import org.redward.spectrum.Spectrum;
import org.redward.testkit.GradeCalibrator;

/**
 * Measures a mock survey of the invented Quill instrument with estimators, as the product does:
 * the generator writes the survey's FITS files and truth into a temporary folder, the FITS reader
 * reads them through the Quill instrument profile (air to vacuum, masks, sky-line regions), and
 * each estimator measures every spectrum. The solutions are compared with the truth's
 * {@code z_topo} (the redshift the spectrum itself shows) by {@link GradeCalibration#correct}. A
 * redshift given to a fibre without an object counts as wrong. Not thread-safe (one use at a time).
 */
public final class MockSolutions {

    /** One solution of one estimator for one fibre. */
    public record Outcome(TruthRow truth, RedshiftSolution solution) {

        /** True if a redshift was given and it is correct. */
        public boolean correct() {
            return solution.ok() && truth.kind().hasRedshift() && GradeCalibration.correct(solution.z(), truth.zTopo());
        }

        /** The solution's diagnostic {@code name} (NaN if absent). */
        public double diagnostic(String name) {
            return solution.diagnostics().getOrDefault(name, Double.NaN);
        }
    }

    private MockSolutions() {
    }

    /**
     * Generates the survey {@code (seed, size)} and measures it with every estimator of {@code
     * estimators} on {@code threads} threads.
     *
     * @return per estimator id, the outcomes of the fibres whose spectrum could be read, in fibre order
     */
    public static Map<String, List<Outcome>> measure(long seed, int size, List<GradedEstimator> estimators, int threads)
            throws IOException {
        Path dir = Files.createTempDirectory("redward-grades-");
        try {
            List<TruthRow> truth = new SurveyGenerator(seed, size).write(dir, n -> { });
            Map<String, TruthRow> byFibre = new HashMap<>();
            for (TruthRow t : truth) {
                byFibre.put(t.file() + "#" + t.row(), t);
            }
            InstrumentProfile quill = quillProfile();
            Map<String, List<Future<Outcome>>> pending = new LinkedHashMap<>();
            for (GradedEstimator e : estimators) {
                pending.put(e.id(), new ArrayList<>());
            }
            ExecutorService pool = Executors.newFixedThreadPool(threads);
            try {
                for (int f = 0; f < (size + 99) / 100; f++) {
                    Path file = dir.resolve(SurveyGenerator.fileName(f));
                    List<Future<Outcome>> batch = new ArrayList<>();
                    try (SpectrumSource src = new FitsReader().open(file, Optional.of(quill))) {
                        while (src.hasNext()) {
                            SpectrumRecord r = src.next();
                            TruthRow t = byFibre.get(file.getFileName() + "#" + r.index());
                            Optional<Spectrum> sp = r.spectrum();
                            if (t == null || sp.isEmpty()) {
                                continue;
                            }
                            for (GradedEstimator e : estimators) {
                                Future<Outcome> fu = pool.submit(() -> new Outcome(t, e.estimator().estimate(sp.get(), e.context())));
                                pending.get(e.id()).add(fu);
                                batch.add(fu);
                            }
                        }
                    } catch (Exception ex) {
                        throw new IOException(file + ": cannot be read (" + ex.getMessage() + ")", ex);
                    }
                    for (Future<Outcome> fu : batch) {
                        fu.get(); // keep at most one file of spectra in flight
                    }
                }
                Map<String, List<Outcome>> out = new LinkedHashMap<>();
                for (Map.Entry<String, List<Future<Outcome>>> e : pending.entrySet()) {
                    List<Outcome> list = new ArrayList<>();
                    for (Future<Outcome> fu : e.getValue()) {
                        list.add(fu.get());
                    }
                    out.put(e.getKey(), list);
                }
                return out;
            } catch (InterruptedException | java.util.concurrent.ExecutionException ex) {
                throw new IOException("measuring the mock survey failed: " + ex, ex);
            } finally {
                pool.shutdownNow();
            }
        } finally {
            try (Stream<Path> s = Files.walk(dir)) {
                s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    /** The solutions that gave a redshift, as (statistic, correct) pairs for {@link GradeCalibrator}. */
    public static List<GradeCalibrator.Scored> scored(List<Outcome> outcomes, GradedEstimator e) {
        List<GradeCalibrator.Scored> s = new ArrayList<>();
        for (Outcome o : outcomes) {
            if (o.solution().ok()) {
                s.add(new GradeCalibrator.Scored(o.solution().objectClass().key(), e.statistic(o.solution()), o.correct()));
            }
        }
        return s;
    }

    /** The Quill instrument profile, as the product installs it (from the profile bundle's jar). */
    static InstrumentProfile quillProfile() throws IOException {
        try (InputStream in = MockSolutions.class.getClassLoader().getResourceAsStream("profiles/quill.properties")) {
            if (in == null) {
                throw new IOException("profiles/quill.properties is not on the class path (module org.redward.profiles.quill)");
            }
            return ProfileDescriptor.parse("org.redward.profiles.quill/profiles/quill.properties", in);
        }
    }
}
