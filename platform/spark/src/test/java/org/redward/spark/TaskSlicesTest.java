package org.redward.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;

/** The job's tasks: files cut into slices of at most K spectra, in input order; unknown counts give whole-file tasks. */
class TaskSlicesTest {

    /** A facade whose counts are given: 250 for a.fits, unknown for b.txt. */
    private static final SpectrumInputs FACADE = new SpectrumInputs() {
        @Override
        public Stream open(List<Path> inputs, ReadOptions options) {
            throw new UnsupportedOperationException();
        }

        @Override
        public List<Path> expand(List<Path> inputs) {
            return inputs;
        }

        @Override
        public long[] counts(List<Path> inputs, ReadOptions options) {
            return inputs.stream().mapToLong(p -> p.toString().endsWith("a.fits") ? 250 : -1).toArray();
        }
    };

    @Test
    void filesAreCutIntoBoundedSlicesInOrder() {
        SurveyJob.Args args = SurveyJob.Args.parse(new String[] {"--bundles", "b", "--out", "o", "--spectra-per-task", "100", "x"});
        List<String> tasks = SurveyJob.tasks(List.of("/d/a.fits", "/d/b.txt", "hdfs://host/d/c.fits"), FACADE, args);
        assertEquals(List.of("0\t100\t/d/a.fits", "100\t100\t/d/a.fits", "200\t50\t/d/a.fits", "0\t-1\t/d/b.txt",
                "0\t-1\thdfs://host/d/c.fits"), tasks);
    }

    @Test
    void theDefaultBoundApplies() {
        SurveyJob.Args args = SurveyJob.Args.parse(new String[] {"--bundles", "b", "--out", "o", "x"});
        assertEquals(SurveyJob.DEFAULT_SPECTRA_PER_TASK, args.spectraPerTask);
        assertEquals(2, SurveyJob.tasks(List.of("/d/a.fits"), FACADE, args).size());
    }
}
