package org.redward.formats.inputs.internal;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumRecord;
import org.redward.spectrum.Spectrum;
import org.redward.spectrum.SpectrumMetadata;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code redward info FILES...}: what the readers understood of each spectrum (reader, profile,
 * layout, pixels, vacuum wavelength range, medium as read, flux unit, masked fraction,
 * metadata). One JSON object per spectrum with {@code --json}; a table otherwise.
 */
@Component(property = {Command.NAME + "=info", Command.SUMMARY + "=what the readers understood: layout, spectra, axis, units"})
public final class InfoCommand implements Command {

    @Reference
    private SpectrumInputs inputs;

    @CommandLine.Command(name = "info", mixinStandardHelpOptions = true,
            description = {"Show what the readers understood of each spectrum: reader and instrument profile, layout, pixels, "
                    + "wavelength range (vacuum Angstrom), medium as read, flux unit, masked fraction, metadata.",
                "FILES may be files, folders (walked) or list files (@FILE, *.list, *.lst: one path a line)."})
    static final class Args {
        @Parameters(arity = "1..*", paramLabel = "FILES", description = "spectrum files, folders or list files")
        List<String> files = new ArrayList<>();
        @Option(names = "--json", description = "one JSON object per spectrum per line")
        boolean json;
        @Option(names = "--profile", paramLabel = "ID", description = "force this instrument profile (see 'redward plugins')")
        String profile;
        @Option(names = "--reader", paramLabel = "ID", description = "force this reader (fits, text, ...)")
        String reader;
        @Option(names = "--time-limit", paramLabel = "SECONDS", defaultValue = "60",
                description = "give up a file that yields nothing for this long (default: ${DEFAULT-VALUE})")
        double timeLimit;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        if (!(a.timeLimit > 0) || a.timeLimit > 86400) {
            throw new UsageException("--time-limit must be between 0 and 86400 seconds, got " + a.timeLimit);
        }
        List<Path> paths = new ArrayList<>();
        for (String f : a.files) {
            paths.add(f.startsWith("@") ? Path.of("@" + ctx.workingDirectory().resolve(f.substring(1)))
                    : ctx.workingDirectory().resolve(f));
        }
        ReadOptions options = ReadOptions.defaults().withProfile(a.profile).withReader(a.reader)
                .withStallLimit(Duration.ofMillis((long) (a.timeLimit * 1000)));
        PrintStream out = ctx.out();
        int failed = 0;
        int ok = 0;
        int assumedAir = 0;
        if (!a.json) {
            out.printf(Locale.ROOT, "%-44s %-22s %7s %21s %-7s %-26s %7s  %s%n", "source[index]", "reader/profile", "pixels",
                    "vacuum range (A)", "medium", "flux unit", "masked", "object");
        }
        try (SpectrumInputs.Stream s = inputs.open(paths, options);
                Progress progress = ctx.progress("reading", s.files())) {
            int lastDone = 0;
            while (s.hasNext()) {
                SpectrumRecord r = s.next();
                if (s.filesDone() > lastDone) {
                    progress.advance(s.filesDone() - lastDone);
                    lastDone = s.filesDone();
                }
                if (r.ok()) {
                    ok++;
                    if (r.spectrum().get().metadata().extra().getOrDefault("redward.medium_source", "").startsWith("assumed")) {
                        assumedAir++;
                    }
                } else {
                    failed++;
                }
                if (a.json) {
                    out.println(json(r));
                } else {
                    row(out, r);
                }
            }
            progress.advance(s.filesDone() - lastDone);
        }
        PrintStream note = a.json ? ctx.err() : out;
        if (!a.json) {
            out.println();
            out.println(ok + " spectra read" + (failed > 0 ? ", " + failed + " failed" : "") + ".");
        }
        if (assumedAir > 0) {
            note.println("note: " + assumedAir + " spectra give no medium; their wavelengths were taken as AIR and converted to vacuum "
                    + "(common for ground-based spectra). If they are vacuum wavelengths, every line and redshift is off by "
                    + "about 80 km/s: use an instrument profile with 'medium = vacuum'.");
        }
        return failed > 0 ? 1 : 0;
    }

    static Json json(SpectrumRecord r) {
        Json j = Json.object().put("source", r.file().toString()).put("index", r.index())
                .put("status", r.ok() ? "ok" : "failed").put("error", r.ok() ? null : r.error())
                .put("reader", r.reader().isEmpty() ? null : r.reader())
                .put("profile", r.profile().isEmpty() ? null : r.profile())
                .put("layout", r.layout().isEmpty() ? null : r.layout())
                .put("location", r.location().isEmpty() ? null : r.location());
        if (r.ok()) {
            Spectrum s = r.spectrum().get();
            SpectrumMetadata m = s.metadata();
            j.put("id", m.objectId().orElse(null)).put("pixels", s.size())
                    .put("wavelength_min_angstrom", s.axis().minVacuumAngstrom())
                    .put("wavelength_max_angstrom", s.axis().maxVacuumAngstrom())
                    .put("medium", s.axis().mediumAsRead().key())
                    .put("medium_source", m.extra().getOrDefault("redward.medium_source", null))
                    .put("unit_as_read", s.axis().unitAsRead().symbol())
                    .put("sampling", s.axis().samplingAsRead().key())
                    .put("flux_unit", s.fluxUnit())
                    .put("has_errors", s.hasErrors())
                    .put("masked_fraction", s.maskedFraction())
                    .put("ra_deg", m.raDeg()).put("dec_deg", m.decDeg())
                    .put("mid_exposure_mjd_utc", m.midExposureMjdUtc()).put("exposure_s", m.exposureSeconds())
                    .put("site_longitude_deg", m.siteLongitudeDeg()).put("site_latitude_deg", m.siteLatitudeDeg())
                    .put("site_height_m", m.siteHeightMetres())
                    .put("instrument", m.instrument().orElse(null));
        }
        return j;
    }

    private static void row(PrintStream out, SpectrumRecord r) {
        String src = shorten(r.file().getFileName() + (r.index() >= 0 ? "[" + r.index() + "]" : ""), 44);
        if (!r.ok()) {
            out.printf(Locale.ROOT, "%-44s FAILED: %s%n", src, r.error());
            return;
        }
        Spectrum s = r.spectrum().get();
        String rp = r.reader() + (r.profile().isEmpty() ? "" : "/" + r.profile());
        String medium = s.axis().mediumAsRead().key()
                + (s.metadata().extra().getOrDefault("redward.medium_source", "").startsWith("assumed") ? "?" : "");
        out.printf(Locale.ROOT, "%-44s %-22s %7d %10.2f-%10.2f %-7s %-26s %6.1f%%  %s%n", src, shorten(rp, 22), s.size(),
                s.axis().minVacuumAngstrom(), s.axis().maxVacuumAngstrom(), medium,
                shorten(s.fluxUnit().isEmpty() ? "(none)" : s.fluxUnit(), 26), 100 * s.maskedFraction(),
                s.metadata().objectId().orElse(""));
    }

    private static String shorten(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 1) + "~";
    }
}
