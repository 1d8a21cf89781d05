package org.redward.survey.internal;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.redward.api.survey.MeasureListener;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/**
 * A run in its own JVM, for {@link ResumeAfterKillTest} to kill with SIGKILL: arguments are the
 * catalogue file, the number of files, spectra per file and microseconds of busy work per
 * spectrum, and optionally {@code lines} (line spectra, measured with their lines). Always runs
 * with resume on, so each start finishes what the last one left.
 */
public final class KillableRun {

    private KillableRun() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args[0]);
        int files = Integer.parseInt(args[1]);
        int perFile = Integer.parseInt(args[2]);
        long busyNanos = Long.parseLong(args[3]) * 1000;
        boolean lines = args.length > 4 && args[4].equals("lines");
        List<Path> inputs = Synthetic.files(out.getParent(), files);
        Estimation slow = new Estimation() {
            final Estimation spike = lines ? new Synthetic.PlantedEstimation() : new Synthetic.SpikeEstimation();

            @Override
            public void measure(Spectrum s, MeasuredRow.Builder row) throws Exception {
                long t0 = System.nanoTime();
                while (System.nanoTime() - t0 < busyNanos) {
                    Thread.onSpinWait();
                }
                spike.measure(s, row);
            }

            @Override
            public String id() {
                return spike.id();
            }

            @Override
            public String bundle() {
                return spike.bundle();
            }
        };
        SurveyRun run = new SurveyRun(MeasureRequest.of(List.of()).withOutput(out).withResume(true).withThreads(2).withLines(lines), slow,
                lines ? Synthetic.source(inputs, perFile, Synthetic::lineSpectrum) : Synthetic.source(inputs, perFile),
                Optional.of(new SurveyRunTest.LinesWriter()), List.of(), Map.of("product.version", "test"));
        if (lines) {
            run.lines(Synthetic.lineStep(), true);
        }
        run.run(MeasureListener.none());
    }
}
