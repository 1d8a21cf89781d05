package org.redward.templates.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Progress;
import org.redward.api.commands.UsageException;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.templates.Template;
import org.redward.spectrum.ObjectClass;

import picocli.CommandLine;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code redward templates build}: eigen-templates per class by PCA from spectra of known redshift. */
final class TemplateBuildCommand {

    @CommandLine.Command(name = "build", mixinStandardHelpOptions = true,
            description = {"Derive eigen-templates per class (PCA, Commons Math SVD) from spectra of known redshift and write them as a data-only template-set bundle.",
                "The redshift table is text (blank, comma or tab separated, '#' comments) with a header line naming the columns",
                "file (the spectrum file's name), z, class (galaxy, quasar, star) and optionally index (0-based spectrum within the file)."})
    static final class Args {
        @Parameters(arity = "1..*", paramLabel = "SPECTRA", description = "spectrum files, folders or list files (any layout a reader understands)")
        List<Path> spectra;
        @Option(names = "--redshifts", required = true, paramLabel = "TABLE", description = "known redshift and class of each spectrum")
        Path redshifts;
        @Option(names = "--id", required = true, description = "the new set's id")
        String id;
        @Option(names = "--version", defaultValue = "1.0.0", description = "the set's version (default ${DEFAULT-VALUE})")
        String version;
        @Option(names = "--components", defaultValue = "4", description = "components per class (default ${DEFAULT-VALUE})")
        int components;
        @Option(names = "--step", defaultValue = "1e-4", description = "rest-frame grid step in log10(lambda) (default ${DEFAULT-VALUE}, 69 km/s)")
        double step;
        @Option(names = "--coverage", defaultValue = "0.5", description = "fraction of spectra that must cover a rest pixel (default ${DEFAULT-VALUE})")
        double coverage;
        @Option(names = "--out", required = true, description = "the bundle jar to write")
        Path out;
        @Option(names = "--json", description = "one JSON object describing the set written")
        boolean json;
    }

    /** One row of the redshift table. */
    record Known(String file, int index, double z, ObjectClass cls) {
    }

    private TemplateBuildCommand() {
    }

    static int run(CommandContext ctx, List<String> arguments, SpectrumInputs inputs) throws IOException {
        Args a = new Args();
        if (TemplatesCommand.parse(ctx, a, arguments) == null) {
            return 0;
        }
        if (a.components < 1 || !(a.step > 0) || !(a.coverage > 0 && a.coverage <= 1)) {
            throw new UsageException("build: --components must be >= 1, --step > 0, --coverage in (0, 1]");
        }
        if (inputs == null) {
            ctx.err().println("redward templates build: the spectrum reading service is not installed, so the spectra cannot be read");
            return 1;
        }
        Path table = ctx.workingDirectory().resolve(a.redshifts);
        Map<String, Known> known = readTable(table);
        Map<ObjectClass, List<EigenTemplates.Input>> byClass = new EnumMap<>(ObjectClass.class);
        int skipped = 0;
        List<Path> paths = new ArrayList<>();
        for (Path p : a.spectra) {
            paths.add(ctx.workingDirectory().resolve(p));
        }
        try (SpectrumInputs.Stream stream = inputs.open(paths, ReadOptions.defaults());
                Progress progress = ctx.progress("reading spectra", stream.files())) {
            int done = 0;
            while (stream.hasNext()) {
                SpectrumRecord r = stream.next();
                if (stream.filesDone() > done) {
                    progress.advance(stream.filesDone() - done);
                    done = stream.filesDone();
                }
                if (!r.ok()) {
                    ctx.err().println("redward templates build: " + r.error() + "; skipped");
                    skipped++;
                    continue;
                }
                Known k = known.get(key(r.file().getFileName().toString(), r.index()));
                if (k != null) {
                    byClass.computeIfAbsent(k.cls(), c -> new ArrayList<>())
                            .add(new EigenTemplates.Input(r.file().getFileName() + "#" + r.index(), r.spectrum().get(), k.z()));
                }
            }
        }
        if (byClass.isEmpty()) {
            ctx.err().println("redward templates build: none of the spectra is listed in " + table + " (match by file name and index)");
            return 1;
        }
        TemplateBundleWriter w;
        try {
            w = new TemplateBundleWriter(a.id, a.version, "eigen-templates built by PCA from " + count(byClass) + " spectra of known redshift");
        } catch (IllegalArgumentException e) {
            throw new UsageException("build: --version: " + e.getMessage());
        }
        List<String> notes = new ArrayList<>();
        for (Map.Entry<ObjectClass, List<EigenTemplates.Input>> e : byClass.entrySet()) {
            EigenTemplates.Result res;
            try {
                res = EigenTemplates.build(e.getKey(), e.getValue(), a.step, a.components, a.coverage);
            } catch (IllegalArgumentException ex) {
                ctx.err().println("redward templates build: " + ex.getMessage() + "; class left out");
                continue;
            }
            notes.add(res.note());
            for (int c = 0; c < res.templates().size(); c++) {
                Template t = res.templates().get(c);
                Map<String, String> keys = new LinkedHashMap<>();
                keys.put(Descriptor.CLASS, t.objectClass().key());
                keys.put(Descriptor.SUBCLASS, t.subclass());
                keys.put(Descriptor.MEDIUM, "vacuum");
                keys.put(Descriptor.UNIT, "angstrom");
                w.add(t.id(), t.id() + ".txt", text(t, res.varianceFraction()[c]), keys);
            }
        }
        if (notes.isEmpty()) {
            ctx.err().println("redward templates build: no class had enough spectra for templates");
            return 1;
        }
        Path out = ctx.workingDirectory().resolve(a.out);
        TemplateSetLoader.Loaded loaded = TemplatesCommand.write(ctx, "build", w, out);
        if (loaded == null) {
            return 1;
        }
        List<String> all = new ArrayList<>(notes);
        all.addAll(loaded.notes());
        TemplatesCommand.report(ctx, a.json, new TemplateSetLoader.Loaded(loaded.set(), all, loaded.descriptorPath()), out,
                TemplateBundleWriter.symbolicName(a.id));
        return skipped == 0 ? 0 : 1;
    }

    private static int count(Map<ObjectClass, List<EigenTemplates.Input>> m) {
        return m.values().stream().mapToInt(List::size).sum();
    }

    /** A component as two text columns, full double precision (so the packed checksum is exact). */
    static byte[] text(Template t, double varianceFraction) {
        StringBuilder sb = new StringBuilder();
        sb.append("# ").append(t.id()).append(": eigen-template (PCA component) of class ").append(t.objectClass().key())
                .append(String.format(Locale.ROOT, ", %.4f of the summed squared singular values%n", varianceFraction));
        sb.append("# rest vacuum wavelength (Angstrom)   component (dimensionless)\n");
        double[] w = t.restVacuumAngstrom();
        double[] f = t.flux();
        for (int i = 0; i < w.length; i++) {
            sb.append(w[i]).append(' ').append(f[i]).append('\n');
        }
        return sb.toString().getBytes(StandardCharsets.UTF_8);
    }

    static String key(String file, int index) {
        return file + "#" + index;
    }

    /** Reads the redshift table; the message of any problem names the file and line. */
    static Map<String, Known> readTable(Path table) throws IOException {
        if (!Files.isRegularFile(table)) {
            throw new UsageException("build: --redshifts: no such file: " + table);
        }
        Map<String, Known> out = new HashMap<>();
        String[] header = null;
        int lineNo = 0;
        for (String line : Files.readAllLines(table, StandardCharsets.UTF_8)) {
            lineNo++;
            String t = line.trim();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            String[] parts = t.split("\\s*[,\\t]\\s*|\\s+");
            if (header == null) {
                header = parts;
                for (int i = 0; i < header.length; i++) {
                    header[i] = header[i].toLowerCase(Locale.ROOT);
                }
                if (col(header, "file") < 0 || col(header, "z") < 0 || col(header, "class") < 0) {
                    throw new UsageException("build: " + table + ", line " + lineNo
                            + ": the header must name the columns file, z and class (and optionally index)");
                }
                continue;
            }
            if (parts.length < header.length) {
                throw new UsageException("build: " + table + ", line " + lineNo + ": " + parts.length
                        + " columns, the header has " + header.length);
            }
            String file = Path.of(parts[col(header, "file")]).getFileName().toString();
            int index = 0;
            double z;
            try {
                if (col(header, "index") >= 0) {
                    index = Integer.parseInt(parts[col(header, "index")]);
                }
                z = Double.parseDouble(parts[col(header, "z")]);
            } catch (NumberFormatException e) {
                throw new UsageException("build: " + table + ", line " + lineNo + ": not a number (" + e.getMessage() + ")");
            }
            ObjectClass c = ObjectClass.parse(parts[col(header, "class")]);
            if (c == ObjectClass.UNKNOWN) {
                throw new UsageException("build: " + table + ", line " + lineNo + ": class '"
                        + parts[col(header, "class")] + "' is not galaxy, quasar or star");
            }
            out.put(key(file, index), new Known(file, index, z, c));
        }
        if (out.isEmpty()) {
            throw new UsageException("build: " + table + " lists no spectra");
        }
        return out;
    }

    private static int col(String[] header, String name) {
        for (int i = 0; i < header.length; i++) {
            if (header[i].equals(name)) {
                return i;
            }
        }
        return -1;
    }
}
