package org.redward.survey.internal;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.catalog.Catalog;
import org.redward.api.catalog.CatalogTable;
import org.redward.api.catalog.CatalogWriterRegistry;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasureSummary;
import org.redward.api.survey.MeasuredRow;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Mixin;

/** {@code redward compare}: several estimators on the same spectra, side by side. */
@Component(property = {Command.NAME + "=compare", Command.SUMMARY + "=two or more estimators on the same spectra"})
public final class CompareCommand implements Command {

    @Reference
    SurveyService survey;
    @Reference
    CatalogWriterRegistry writers;

    @CommandLine.Command(name = "compare", mixinStandardHelpOptions = true, sortOptions = false,
            description = {"Run every estimator on the same spectra and compare them: a per-spectrum table, a summary",
                "(agreement within the combined 3 sigma, distribution of dv, catastrophic disagreements, grades",
                "against grades, speed), plots and a short Markdown report, all in the --out folder.",
                "dv = c (z_B - z_A) / (1 + z_A), the rest-frame velocity difference."})
    static final class Args {
        @Mixin
        RunOptions run = new RunOptions();
        @Option(names = "--estimators", required = true, split = ",", paramLabel = "A,B[,C]", description = "estimator ids (two or more)")
        List<String> estimators = new ArrayList<>();
        @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the table, summary, plots and report")
        Path out;
        @Option(names = "--catastrophic", paramLabel = "KM_S", description = "|dv| above which a disagreement is catastrophic (default: 1000 km/s)")
        double catastrophicKmPerS = 1000;
        @Option(names = "--json", description = "print the summary as one JSON object")
        boolean json;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        List<String> ids = a.estimators.stream().map(String::trim).filter(s -> !s.isEmpty()).distinct().toList();
        if (ids.size() < 2) {
            throw new UsageException("--estimators: give at least two different estimator ids, e.g. --estimators xcorr,chisq");
        }
        if (!(a.catastrophicKmPerS > 0)) {
            throw new UsageException("--catastrophic " + a.catastrophicKmPerS + ": must be positive");
        }
        MeasureRequest base = a.run.request(ctx);
        for (String id : ids) {
            try {
                survey.chooseEstimator(java.util.Optional.of(id));
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
        }
        Path dir = ctx.workingDirectory().resolve(a.out);
        Files.createDirectories(dir);
        Map<String, Json> speed = new LinkedHashMap<>();
        List<Iterable<MeasuredRow>> streams = new ArrayList<>();
        for (String id : ids) {
            Path rows = dir.resolve("rows-" + id + ".jsonl");
            MeasureSummary s;
            try (BufferedWriter w = Files.newBufferedWriter(rows, StandardCharsets.UTF_8);
                    Progress progress = ctx.progress("compare: " + id, -1)) {
                s = survey.measure(base.withEstimator(id).withTemplates(usesTemplates(id) ? a.run.templates : null), row -> {
                    try {
                        w.write(RowCodec.toJson(row).toString());
                        w.write('\n');
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                }, progress::advance);
            } catch (IllegalArgumentException e) {
                throw new UsageException(e.getMessage());
            }
            speed.put(id, Json.object().put("seconds", s.seconds()).put("spectra_per_second", s.spectraPerSecond())
                    .put("misbehaving", s.misbehaving()));
            streams.add(JsonRows.read(rows, false));
        }
        Comparison cmp = new Comparison(ids, a.catastrophicKmPerS);
        for (List<MeasuredRow> rows : Comparison.zip(streams)) {
            cmp.add(rows);
        }
        Json summary = cmp.summary(speed);
        Files.writeString(dir.resolve("summary.json"), summary + "\n");
        writeTable(dir, ids, cmp, streams);
        List<String> plots = ComparePlots.write(dir, cmp, ids);
        Files.writeString(dir.resolve("report.md"), CompareReport.markdown(ids, cmp, speed, plots, a.catastrophicKmPerS));
        PrintStream out = ctx.out();
        if (a.json) {
            out.println(summary);
        } else {
            out.print(CompareReport.text(ids, cmp));
            out.println("written to " + dir + ": per-spectrum.csv, summary.json, report.md" + (plots.isEmpty() ? "" : ", " + String.join(", ", plots)));
        }
        return 0;
    }

    private boolean usesTemplates(String id) {
        Object v = survey.chooseEstimator(java.util.Optional.of(id)).properties()
                .get(org.redward.api.redshift.RedshiftEstimator.USES_TEMPLATES);
        return Boolean.TRUE.equals(v);
    }

    private void writeTable(Path dir, List<String> ids, Comparison cmp, List<Iterable<MeasuredRow>> streams) throws IOException {
        Iterable<Object[]> cells = CatalogLayout.map(Comparison.zip(streams), cmp::cells);
        Map<String, String> prov = new LinkedHashMap<>();
        prov.put("estimators", String.join(",", ids));
        CatalogTable t = new CatalogTable("comparison", "one row per spectrum: every estimator's answer and the differences",
                cmp.columns(), cmp.spectra(), cells);
        Path file = dir.resolve("per-spectrum.csv");
        var writer = writers.forFile(file).orElseThrow(() -> new IOException("no CSV catalogue writer installed")).service();
        Path tmp = dir.resolve(".per-spectrum.csv.part");
        writer.write(Catalog.of("Redward estimator comparison", prov, List.of(t)), tmp);
        Files.move(tmp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
    }

    static String fmt(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.1f", v) : "n/a";
    }
}
