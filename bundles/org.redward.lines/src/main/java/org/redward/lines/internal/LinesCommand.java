package org.redward.lines.internal;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ProfileRegistry;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.Identification;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.lines.LineMatch;
import org.redward.api.lines.LineSearch;
import org.redward.api.lines.RedshiftHypothesis;
import org.redward.api.registry.Provided;
import org.redward.spectrum.Spectrum;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code redward lines FILE...}: the detected lines of each spectrum with their measurements and
 * identifications, the implied z of each, and the adopted z with its error.
 */
@Component(property = {Command.NAME + "=lines", Command.SUMMARY + "=detected lines and their identifications"})
public final class LinesCommand implements Command {

    @Reference
    SpectrumInputs inputs;

    @Reference
    LineListRegistry lists;

    @Reference
    ProfileRegistry profiles;

    private final MatchedFilterFinder finder = new MatchedFilterFinder();
    private final PairVoteIdentifier identifier = new PairVoteIdentifier();

    @CommandLine.Command(name = "lines", mixinStandardHelpOptions = true,
            description = {"Find the emission and absorption lines of each spectrum, measure them (centre, FWHM, flux, "
                    + "equivalent width, S/N, with errors from the fit) and identify them with a line list.",
                    "Without --z, the redshift that explains the most lines is adopted; with --z, the lines are labelled at that z."})
    static final class Args {
        @Parameters(arity = "1..*", paramLabel = "FILE", description = "spectrum files, folders or list files")
        List<Path> files = new ArrayList<>();
        @Option(names = "--z", paramLabel = "Z", description = "label the lines at this known redshift instead of searching")
        Double z;
        @Option(names = "--snr", paramLabel = "S/N", description = "detection threshold (matched-filter S/N; default ${DEFAULT-VALUE})")
        double snr = 5.0;
        @Option(names = "--kind", paramLabel = "KIND", description = "emission, absorption or both (default ${DEFAULT-VALUE})")
        String kind = "both";
        @Option(names = "--list", paramLabel = "ID", description = "line list id (default ${DEFAULT-VALUE})")
        String list = LineListRegistry.STANDARD;
        @Option(names = "--profile", paramLabel = "ID", description = "force this instrument profile (default: the best match); its masked regions are masked")
        String profile;
        @Option(names = "--reader", paramLabel = "ID", description = "force this reader (default: chosen by sniffing)")
        String reader;
        @Option(names = "--mask", paramLabel = "FROM:TO", description = "mask this observed vacuum wavelength range, Angstrom (repeatable)")
        List<String> masks = new ArrayList<>();
        @Option(names = "--z-range", paramLabel = "MIN:MAX", description = "redshift range to search (default -0.005:7)")
        String zRange;
        @Option(names = "--spectrum", paramLabel = "N", description = "only the N-th spectrum of each file (0-based)")
        Integer only;
        @Option(names = "--json", description = "one JSON object per line per detected line")
        boolean json;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        FinderSettings fs = finderSettings(a);
        if (a.profile != null) {
            requireProvider(profiles.find(a.profile), "--profile", a.profile, profiles.ids());
        }
        IdentifySettings is = identifySettings(a);
        LineList list = lists.find(a.list).map(Provided::service).orElse(null);
        if (list == null) {
            if (!a.list.equals(LineListRegistry.STANDARD)) {
                throw new UsageException("--list: no line list with id '" + a.list + "' (available: " + String.join(", ", lists.ids()) + ")");
            }
            list = LineListFile.standard();
        }
        List<Path> paths = new ArrayList<>();
        for (Path p : a.files) {
            paths.add(ctx.workingDirectory().resolve(p));
        }
        ReadOptions ro = ReadOptions.defaults().withProfile(a.profile).withReader(a.reader);
        int failures = 0;
        try (SpectrumInputs.Stream stream = inputs.open(paths, ro); Progress progress = ctx.progress("lines", -1)) {
            while (stream.hasNext()) {
                SpectrumRecord rec = stream.next();
                progress.advance(1);
                if (!rec.ok()) {
                    ctx.err().println("redward lines: " + rec.error());
                    failures++;
                    continue;
                }
                if (a.only != null && rec.index() != a.only) {
                    continue;
                }
                spectrum(ctx, a, rec.file(), rec.index(), rec.spectrum().get(), withProfileMasks(fs, rec.profile()), is, list);
            }
        }
        return failures == 0 ? 0 : 1;
    }

    /** The settings plus the masked regions of the instrument profile the reader applied, if any. */
    private FinderSettings withProfileMasks(FinderSettings fs, String profileId) {
        if (profileId == null || profileId.isEmpty()) {
            return fs;
        }
        Optional<Provided<InstrumentProfile>> p = profiles.find(profileId);
        if (p.isEmpty() || p.get().service().maskedRegionsVacuumAngstrom().isEmpty()) {
            return fs;
        }
        List<double[]> m = new ArrayList<>(fs.maskedRegionsVacuumAngstrom());
        m.addAll(p.get().service().maskedRegionsVacuumAngstrom());
        return fs.withMaskedRegions(m);
    }

    private static <T> T requireProvider(Optional<Provided<T>> p, String option, String id, List<String> ids) {
        return p.map(Provided::service).orElseThrow(() -> new UsageException(option + ": no provider with id '" + id
                + "' (available: " + (ids.isEmpty() ? "none" : String.join(", ", ids)) + ")"));
    }

    static FinderSettings finderSettings(Args a) {
        FinderSettings fs = FinderSettings.defaults();
        try {
            fs = fs.withSnrThreshold(a.snr);
            switch (a.kind.toLowerCase(Locale.ROOT)) {
                case "emission": fs = fs.withKinds(true, false); break;
                case "absorption": fs = fs.withKinds(false, true); break;
                case "both": break;
                default: throw new UsageException("--kind: '" + a.kind + "' is not emission, absorption or both");
            }
            List<double[]> m = new ArrayList<>();
            for (String s : a.masks) {
                m.add(pair("--mask", s));
            }
            return fs.withMaskedRegions(m);
        } catch (IllegalArgumentException e) {
            throw new UsageException("--snr: " + e.getMessage());
        }
    }

    static IdentifySettings identifySettings(Args a) {
        IdentifySettings is = IdentifySettings.defaults();
        try {
            if (a.zRange != null) {
                double[] r = pair("--z-range", a.zRange);
                is = is.withRedshiftRange(r[0], r[1]);
            }
            if (a.z != null) {
                is = is.withFixedZ(a.z);
            }
        } catch (IllegalArgumentException e) {
            throw new UsageException((a.z != null ? "--z: " : "--z-range: ") + e.getMessage());
        }
        return is;
    }

    private static double[] pair(String option, String text) {
        String[] p = text.split(":");
        try {
            if (p.length == 2) {
                double lo = Double.parseDouble(p[0].trim());
                double hi = Double.parseDouble(p[1].trim());
                if (lo < hi) {
                    return new double[] {lo, hi};
                }
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new UsageException(option + ": '" + text + "' is not FROM:TO with FROM < TO");
    }

    void spectrum(CommandContext ctx, Args a, Path file, int index, Spectrum s, FinderSettings fs, IdentifySettings is, LineList list) {
        LineSearch ls = finder.find(s, fs);
        String objectId = s.metadata().objectId().orElse("");
        PrintStream out = ctx.out();
        String where = file.getFileName() + " #" + index + (objectId.isEmpty() ? "" : " (" + objectId + ")");
        if (ls.empty()) {
            String why = ls.statements().isEmpty() ? "no lines" : ls.statements().get(0);
            if (a.json) {
                ctx.err().println("redward lines: " + where + ": " + why);
            } else {
                out.println(where + ": " + why);
            }
            return;
        }
        Identification id = identifier.identify(ls.lines(), list, is, s.axis().minVacuumAngstrom(), s.axis().maxVacuumAngstrom());
        RedshiftHypothesis best = id.best().orElse(null);
        double zAdopted = best == null ? Double.NaN : best.z();
        double zErr = best == null ? Double.NaN : best.zError();
        if (id.singleLine() && !is.hasFixedZ() && !id.singleLineCandidates().isEmpty()) {
            LineMatch first = id.singleLineCandidates().get(0);
            zAdopted = first.z();
            zErr = first.zError();
        }
        List<String> notes = new ArrayList<>(ls.statements());
        notes.addAll(id.warnings());
        if (a.json) {
            json(out, file, index, objectId, ls, id, best, zAdopted, zErr, notes);
        } else {
            text(out, where, ls, id, best, zAdopted, zErr, is, list, notes, fs);
        }
    }

    private static void json(PrintStream out, Path file, int index, String objectId, LineSearch ls, Identification id,
            RedshiftHypothesis best, double zAdopted, double zErr, List<String> notes) {
        for (int i = 0; i < ls.lines().size(); i++) {
            DetectedLine d = ls.lines().get(i);
            LineMatch m = best == null ? null : best.matchOf(i);
            Json j = Json.object()
                    .put("source", file.toString()).put("index", index).put("id", objectId)
                    .put("observed_wavelength_angstrom", d.centreAngstrom())
                    .put("observed_wavelength_err_angstrom", d.centreErrorAngstrom())
                    .put("kind", d.kind().key())
                    .put("snr", d.snr()).put("detection_snr", d.detectionSnr())
                    .put("fwhm_km_s", d.fwhmKmPerS()).put("fwhm_err_km_s", d.fwhmErrorKmPerS())
                    .put("flux", d.flux()).put("flux_err", d.fluxError())
                    .put("equivalent_width_angstrom", d.equivalentWidthAngstrom())
                    .put("equivalent_width_err_angstrom", d.equivalentWidthErrorAngstrom())
                    .put("rest_equivalent_width_angstrom", m == null ? null : d.equivalentWidthAngstrom() / (1 + m.z()))
                    .put("continuum", d.continuum())
                    .put("blend", d.blended() ? d.blend() : null)
                    .put("line", m == null ? null : LineRedshift.label(m))
                    .put("rest_wavelength_angstrom", m == null ? null : m.restAngstrom())
                    .put("z", m == null ? null : m.z())
                    .put("z_err", m == null ? null : m.zError())
                    .put("offset_km_s", m == null ? null : m.offsetKmPerS())
                    .put("adopted_z", zAdopted).put("adopted_z_err", zErr)
                    .put("lines_matched", best == null ? 0 : best.matchedCount())
                    .put("single_line", id.singleLine())
                    .put("line_list", id.lineListId() + " " + id.lineListVersion())
                    .put("warnings", notes);
            out.println(j);
        }
    }

    private static void text(PrintStream out, String where, LineSearch ls, Identification id, RedshiftHypothesis best,
            double zAdopted, double zErr, IdentifySettings is, LineList list, List<String> notes, FinderSettings fs) {
        out.printf(Locale.ROOT, "%s: %d line%s detected at matched-filter S/N >= %.1f (the S/N column is the fitted flux's)%n", where,
                ls.lines().size(), ls.lines().size() == 1 ? "" : "s", fs.snrThreshold());
        if (best == null) {
            out.println("  no identification with line list '" + list.id() + "'");
        } else if (is.hasFixedZ()) {
            out.printf(Locale.ROOT, "  given z = %.6f: %d of %d lines identified (line list %s %s)%n", is.fixedZ(), best.matchedCount(),
                    ls.lines().size(), list.id(), list.version());
        } else if (id.singleLine()) {
            out.printf(Locale.ROOT, "  adopted z = %.6f +- %.6f from ONE line: a guess among the candidates below (line list %s %s)%n",
                    zAdopted, zErr, list.id(), list.version());
        } else {
            out.printf(Locale.ROOT, "  adopted z = %.6f +- %.6f from %d of %d lines (line list %s %s)%n", zAdopted, zErr,
                    best.matchedCount(), ls.lines().size(), list.id(), list.version());
        }
        out.printf(Locale.ROOT, "  %10s %6s %-4s %6s %9s %8s %10s %-22s %9s %9s %7s%n", "observed_A", "+-", "kind", "S/N", "FWHM_km/s",
                "EW_A", "flux", "line", "rest_A", "z", "dv_km/s");
        for (int i = 0; i < ls.lines().size(); i++) {
            DetectedLine d = ls.lines().get(i);
            LineMatch m = best == null ? null : best.matchOf(i);
            String name = m == null ? "-" : LineRedshift.label(m);
            out.printf(Locale.ROOT, "  %10.2f %6.2f %-4s %6.1f %9.0f %8.2f %10.4g %-22s %9s %9s %7s%s%n", d.centreAngstrom(),
                    d.centreErrorAngstrom(), d.kind().key().substring(0, 4), d.snr(), d.fwhmKmPerS(), d.equivalentWidthAngstrom(),
                    d.flux(), name, m == null ? "" : String.format(Locale.ROOT, "%.3f", m.restAngstrom()),
                    m == null ? "" : String.format(Locale.ROOT, "%.5f", m.z()),
                    m == null ? "" : String.format(Locale.ROOT, "%+.0f", m.offsetKmPerS()), d.blended() ? "  blend " + d.blend() : "");
        }
        if (id.singleLine() && !is.hasFixedZ()) {
            out.println("  candidate identities of the single line:");
            for (LineMatch m : id.singleLineCandidates()) {
                out.printf(Locale.ROOT, "    %-24s rest %9.3f A  z = %.5f%n", LineRedshift.label(m),
                        m.restAngstrom(), m.z());
            }
        } else if (id.hypotheses().size() > 1 && !is.hasFixedZ()) {
            StringBuilder sb = new StringBuilder("  other redshifts:");
            for (int k = 1; k < Math.min(4, id.hypotheses().size()); k++) {
                RedshiftHypothesis h = id.hypotheses().get(k);
                sb.append(String.format(Locale.ROOT, " z = %.5f (%d line%s, score %.1f);", h.z(), h.matchedCount(),
                        h.matchedCount() == 1 ? "" : "s", h.score()));
            }
            out.println(sb.substring(0, sb.length() - 1));
        }
        if (best != null && !best.missing().isEmpty()) {
            List<String> names = new ArrayList<>();
            best.missing().forEach(l -> names.add(l.name()));
            out.println("  strong lines expected in range but not found: " + String.join(", ", names));
        }
        for (String n : notes) {
            out.println("  note: " + n);
        }
        out.println("  (EW is observed-frame, positive for emission; FWHM is not corrected for the instrument's resolution; dv is the offset from the adopted z)");
    }
}
