package org.redward.templates.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.UsageException;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.registry.Provided;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateRegistry;
import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code redward templates pack|build|list}: make data-only template-set bundles from files or
 * from spectra of known redshift, and list the sets present.
 */
@Component(property = {Command.NAME + "=templates",
        Command.SUMMARY + "=pack files into a template-set bundle; build eigen-templates from spectra of known z; list sets"})
public final class TemplatesCommand implements Command {

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    private volatile TemplateRegistry templates;

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    private volatile SpectrumInputs inputs;

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    private volatile TemplateExtender extender;

    @CommandLine.Command(name = "templates", mixinStandardHelpOptions = true,
            description = {"Template sets: pack files into a data-only bundle, build eigen-templates from spectra of known redshift, list the sets present.",
                "",
                "  redward templates pack FILES... --id ID --class CLASS --medium air|vacuum --out JAR",
                "  redward templates build SPECTRA... --redshifts TABLE --id ID --out JAR",
                "  redward templates list [--json]",
                "",
                "A packed bundle needs no Java: drop it into a folder given with --bundles and choose it with --templates ID."})
    static final class Top {
    }

    @CommandLine.Command(name = "pack", mixinStandardHelpOptions = true,
            description = {"Write a data-only template-set bundle from template files (FITS table, FITS 1D image or text columns).",
                "Options given once apply to every file; given once per argument (or as a comma-separated list), they apply in order;",
                "a folder argument stands for its template files (.fits, .fit, .fts, .txt, .dat, .csv, .tsv, .asc), which share its options."})
    static final class Pack {
        @Parameters(arity = "0..*", paramLabel = "FILES", description = "template files (rest-frame spectra) or folders of them")
        List<Path> files;
        @Option(names = "--descriptor", paramLabel = "FILE", description = {"a hand-written descriptor (properties: id, version, templates, and per template file, class, medium...; see the contributor guide)",
            "instead of FILES and the per-file options; its files are read relative to it"})
        Path descriptor;
        @Option(names = "--id", description = "the set's id (letters, digits, '.', '_', '-'), used with --templates")
        String id;
        @Option(names = "--version", defaultValue = "1.0.0", description = "the set's version (OSGi form, default ${DEFAULT-VALUE})")
        String version;
        @Option(names = "--description", description = "where the templates come from (cite the paper)")
        String description;
        @Option(names = "--class", split = ",", description = "galaxy, quasar or star: once for all files or once per file")
        List<String> classes;
        @Option(names = "--subclass", split = ",", description = "subclass per file (default: the file's name)")
        List<String> subclasses;
        @Option(names = "--medium", split = ",", description = "air or vacuum: the medium of the files' wavelengths (air is converted to vacuum)")
        List<String> media;
        @Option(names = "--unit", split = ",", description = "angstrom, nm, um or log10-angstrom (default: the file's own unit, else angstrom)")
        List<String> units;
        @Option(names = "--trust", split = ",", description = "MIN-MAX rest vacuum Angstrom to keep")
        List<String> trust;
        @Option(names = "--bad-pixels", description = "reject (default) or interpolate across NaN pixels")
        String badPixels;
        @Option(names = "--zero-is-bad", description = "treat interior zero flux as bad pixels (masked pixels in some composites)")
        boolean zeroIsBad;
        @Option(names = "--out", required = true, description = "the bundle jar to write")
        Path out;
        @Option(names = "--json", description = "one JSON object describing the set written")
        boolean json;
    }

    @CommandLine.Command(name = "list", mixinStandardHelpOptions = true, description = "List the template sets present (and the data bundles that failed to load).")
    static final class ListArgs {
        @Option(names = "--json", description = "one JSON object per line per set (status ok) or per failed bundle (status failed)")
        boolean json;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        if (arguments.isEmpty() || arguments.get(0).equals("--help") || arguments.get(0).equals("-h")) {
            new CommandLine(new Top()).usage(ctx.out());
            return arguments.isEmpty() ? 2 : 0;
        }
        List<String> rest = arguments.subList(1, arguments.size());
        switch (arguments.get(0)) {
            case "pack":
                return pack(ctx, rest);
            case "build":
                return TemplateBuildCommand.run(ctx, rest, inputs);
            case "list":
                return list(ctx, rest);
            default:
                throw new UsageException("unknown action '" + arguments.get(0) + "' (pack, build, list)");
        }
    }

    /** Parses a sub-command's options; bad ones are reported with the sub-command's name. Null after --help. */
    static <T> T parse(CommandContext ctx, T args, List<String> arguments) {
        try {
            return CommandOptions.parse(args, arguments, ctx.out()) ? args : null;
        } catch (UsageException e) {
            throw new UsageException(new CommandLine(args).getCommandName() + ": " + e.getMessage());
        }
    }

    private static final java.util.regex.Pattern TEMPLATE_FILE =
            java.util.regex.Pattern.compile("(?i).*\\.(fits|fit|fts|txt|dat|csv|tsv|asc)(\\.gz)?");

    /** A file as itself; a folder as its template files (by extension, sorted, hidden ones skipped). */
    static List<Path> expand(Path p) throws IOException {
        if (Files.isRegularFile(p)) {
            return List.of(p);
        }
        if (!Files.isDirectory(p)) {
            throw new UsageException("pack: no such file or folder: " + p);
        }
        List<Path> out;
        try (java.util.stream.Stream<Path> s = Files.list(p)) {
            out = s.filter(Files::isRegularFile).filter(f -> !f.getFileName().toString().startsWith("."))
                    .filter(f -> TEMPLATE_FILE.matcher(f.getFileName().toString()).matches()).sorted().toList();
        }
        if (out.isEmpty()) {
            throw new UsageException("pack: folder " + p + " holds no template files (.fits, .fit, .fts, .txt, .dat, .csv, .tsv, .asc)");
        }
        return out;
    }

    /** The i-th value of an option given once for all arguments or once per argument; null if absent. */
    static String perFile(List<String> values, int i, int files, String option) {
        if (values == null || values.isEmpty()) {
            return null;
        }
        if (values.size() == 1) {
            return values.get(0).trim();
        }
        if (values.size() != files) {
            throw new UsageException("pack: " + option + " given " + values.size() + " times for " + files
                    + " files or folders (give it once for all, or once per file or folder)");
        }
        return values.get(i).trim();
    }

    private int pack(CommandContext ctx, List<String> arguments) throws IOException {
        Pack a = parse(ctx, new Pack(), arguments);
        if (a == null) {
            return 0;
        }
        if (a.descriptor != null) {
            return packDescriptor(ctx, a);
        }
        if (a.files == null || a.files.isEmpty() || a.id == null || a.classes == null || a.media == null) {
            throw new UsageException("pack: give FILES with --id, --class and --medium, or a --descriptor");
        }
        int n = a.files.size();
        List<List<Path>> groups = new ArrayList<>();
        int total = 0;
        for (Path p : a.files) {
            List<Path> g = expand(ctx.workingDirectory().resolve(p));
            groups.add(g);
            total += g.size();
        }
        String description = a.description != null ? a.description : "template set " + a.id + " packed from " + total + " files";
        TemplateBundleWriter w;
        try {
            w = new TemplateBundleWriter(a.id, a.version, description);
        } catch (IllegalArgumentException e) {
            throw new UsageException("pack: --version: " + e.getMessage());
        }
        if (a.badPixels != null && !a.badPixels.equals("reject") && !a.badPixels.equals("interpolate")) {
            throw new UsageException("pack: --bad-pixels must be reject or interpolate, not '" + a.badPixels + "'");
        }
        for (int i = 0; i < n; i++) {
            String cls = perFile(a.classes, i, n, "--class");
            if (ObjectClass.parse(cls) == ObjectClass.UNKNOWN) {
                throw new UsageException("pack: --class '" + cls + "' must be galaxy, quasar or star");
            }
            String medium = perFile(a.media, i, n, "--medium").toLowerCase(Locale.ROOT);
            if (!medium.equals("air") && !medium.equals("vacuum")) {
                throw new UsageException("pack: --medium '" + medium + "' must be air or vacuum");
            }
            for (Path f : groups.get(i)) {
                Map<String, String> keys = new LinkedHashMap<>();
                keys.put(Descriptor.CLASS, ObjectClass.parse(cls).key());
                String name = w.nameFor(f.getFileName().toString());
                String sub = perFile(a.subclasses, i, n, "--subclass");
                keys.put(Descriptor.SUBCLASS, sub != null && groups.get(i).size() == 1 ? sub : name);
                keys.put(Descriptor.MEDIUM, medium);
                putIfPresent(keys, Descriptor.UNIT, perFile(a.units, i, n, "--unit"));
                putIfPresent(keys, Descriptor.TRUST, perFile(a.trust, i, n, "--trust"));
                putIfPresent(keys, Descriptor.BAD_PIXELS, a.badPixels);
                if (a.zeroIsBad) {
                    keys.put(Descriptor.ZERO_IS_BAD, "true");
                }
                w.add(name, f.getFileName().toString(), Files.readAllBytes(f), keys);
            }
        }
        Path out = ctx.workingDirectory().resolve(a.out);
        TemplateSetLoader.Loaded loaded = write(ctx, "pack", w, out);
        if (loaded == null) {
            return 1;
        }
        report(ctx, a.json, loaded, out, TemplateBundleWriter.symbolicName(a.id));
        return 0;
    }

    private int packDescriptor(CommandContext ctx, Pack a) throws IOException {
        if (a.files != null && !a.files.isEmpty() || a.classes != null || a.media != null || a.subclasses != null
                || a.units != null || a.trust != null || a.badPixels != null || a.zeroIsBad) {
            throw new UsageException("pack: with --descriptor, the files and their keys come from the descriptor; leave out FILES and the per-file options");
        }
        Path file = ctx.workingDirectory().resolve(a.descriptor);
        if (!Files.isRegularFile(file)) {
            throw new UsageException("pack: --descriptor: no such file: " + file);
        }
        String text = Files.readString(file, java.nio.charset.StandardCharsets.UTF_8);
        Descriptor d;
        String id;
        String version;
        Map<String, byte[]> files = new LinkedHashMap<>();
        try {
            d = Descriptor.parse(file.toString(), text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
            id = d.required(Descriptor.ID);
            version = d.optional(Descriptor.VERSION, "1.0.0");
            for (String name : d.templateNames()) {
                String rel = d.requiredOf(name, Descriptor.FILE).replace('\\', '/');
                if (rel.startsWith("/") || rel.contains("../") || rel.startsWith("..")) {
                    throw new TemplateDataException("descriptor " + file + ": template '" + name + "': file " + rel
                            + " must be a path below the descriptor's folder");
                }
                Path f = file.toAbsolutePath().getParent().resolve(rel);
                if (!Files.isRegularFile(f)) {
                    throw new TemplateDataException("descriptor " + file + ": template '" + name + "': no such file: " + f);
                }
                files.put(rel, Files.readAllBytes(f));
            }
        } catch (TemplateDataException e) {
            ctx.err().println("redward templates pack: " + e.getMessage());
            return 1;
        }
        if (a.id != null && !a.id.equals(id)) {
            throw new UsageException("pack: --id " + a.id + " differs from the descriptor's id " + id);
        }
        TemplateBundleWriter w;
        try {
            w = new TemplateBundleWriter(id, version, d.optional(Descriptor.DESCRIPTION, "template set " + id));
        } catch (IllegalArgumentException e) {
            throw new UsageException("pack: descriptor version: " + e.getMessage());
        }
        w.useDescriptor(text, files);
        Path out = ctx.workingDirectory().resolve(a.out);
        TemplateSetLoader.Loaded loaded = write(ctx, "pack", w, out);
        if (loaded == null) {
            return 1;
        }
        report(ctx, a.json, loaded, out, TemplateBundleWriter.symbolicName(id));
        return 0;
    }

    /** Writes the bundle; on refusal prints one line naming the file and returns null. */
    static TemplateSetLoader.Loaded write(CommandContext ctx, String action, TemplateBundleWriter w, Path out) throws IOException {
        try {
            return w.write(out);
        } catch (TemplateDataException e) {
            ctx.err().println("redward templates " + action + ": " + e.getMessage());
            return null;
        }
    }

    /** Prints what was written (shared by pack and build). */
    static void report(CommandContext ctx, boolean json, TemplateSetLoader.Loaded loaded, Path out, String bsn) {
        TemplateSet s = loaded.set();
        if (json) {
            ctx.out().println(describe(s).put("bundle", bsn).put("out", out.toString()).put("notes", loaded.notes()));
            return;
        }
        PrintStream o = ctx.out();
        o.println("wrote " + out + " (bundle " + bsn + " " + s.version() + ")");
        o.println("  set " + s.id() + ": " + s.templates().size() + (s.templates().size() == 1 ? " template " : " templates ") + classCounts(s) + ", sha256 " + s.checksum());
        for (Template t : s.templates()) {
            o.printf(Locale.ROOT, "    %-16s %-7s %-16s %8.1f - %8.1f A  %6d px%n", t.id(), t.objectClass().key(), t.subclass(),
                    t.minRestVacuumAngstrom(), t.maxRestVacuumAngstrom(), t.size());
        }
        for (String note : loaded.notes()) {
            o.println("  note: " + note);
        }
        o.println("use it: redward --bundles " + (out.getParent() == null ? "." : out.getParent()) + " measure FILES... --templates " + s.id());
    }

    static Json describe(TemplateSet s) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (Template t : s.templates()) {
            min = Math.min(min, t.minRestVacuumAngstrom());
            max = Math.max(max, t.maxRestVacuumAngstrom());
        }
        Map<String, Object> classes = new LinkedHashMap<>();
        counts(s).forEach((k, v) -> classes.put(k.key(), v));
        return Json.object().put("id", s.id()).put("version", s.version()).put("checksum_sha256", s.checksum())
                .put("templates", s.templates().size()).put("classes", classes)
                .put("rest_wavelength_min_angstrom", min).put("rest_wavelength_max_angstrom", max)
                .put("description", s.description());
    }

    private static Map<ObjectClass, Integer> counts(TemplateSet s) {
        Map<ObjectClass, Integer> m = new EnumMap<>(ObjectClass.class);
        for (Template t : s.templates()) {
            m.merge(t.objectClass(), 1, Integer::sum);
        }
        return m;
    }

    private static String classCounts(TemplateSet s) {
        List<String> parts = new ArrayList<>();
        counts(s).forEach((k, v) -> parts.add(v + " " + k.key()));
        return "(" + String.join(", ", parts) + ")";
    }

    private static void putIfPresent(Map<String, String> m, String k, String v) {
        if (v != null) {
            m.put(k, v);
        }
    }

    private int list(CommandContext ctx, List<String> arguments) {
        ListArgs a = parse(ctx, new ListArgs(), arguments);
        if (a == null) {
            return 0;
        }
        TemplateRegistry reg = templates;
        List<Provided<TemplateSet>> sets = reg == null ? List.of() : reg.providers();
        TemplateExtender ext = extender;
        List<TemplateExtender.Problem> problems = ext == null ? List.of() : ext.problems();
        if (a.json) {
            List<TemplateExtender.Registered> loaded = ext == null ? List.of() : ext.registered();
            for (Provided<TemplateSet> p : sets) {
                List<String> notes = new ArrayList<>();
                for (TemplateExtender.Registered r : loaded) {
                    if (r.set() == p.service()) {
                        notes.addAll(r.notes());
                    }
                }
                ctx.out().println(describe(p.service()).put("status", "ok").put("error", null)
                        .put("bundle", p.bundleSymbolicName()).put("bundle_version", p.bundleVersion()).put("notes", notes));
            }
            for (TemplateExtender.Problem pr : problems) {
                ctx.out().println(Json.object().put("status", "failed").put("bundle", pr.bundle()).put("error", pr.message()));
            }
            return problems.isEmpty() ? 0 : 1;
        }
        PrintStream o = ctx.out();
        if (sets.isEmpty()) {
            o.println("no template sets present" + (reg == null ? " (the template registry is not running)" : ""));
        } else {
            o.printf("  %-24s %-10s %-9s %-28s %-14s %s%n", "id", "version", "templates", "classes", "sha256", "bundle");
            for (Provided<TemplateSet> p : sets) {
                TemplateSet s = p.service();
                o.printf(Locale.ROOT, "  %-24s %-10s %-9d %-28s %-14s %s %s%n", s.id(), s.version(), s.templates().size(),
                        classCounts(s), s.checksum().substring(0, 12), p.bundleSymbolicName(), p.bundleVersion());
            }
        }
        for (TemplateExtender.Problem pr : problems) {
            o.println("  FAILED " + pr.message());
        }
        return problems.isEmpty() ? 0 : 1;
    }
}
