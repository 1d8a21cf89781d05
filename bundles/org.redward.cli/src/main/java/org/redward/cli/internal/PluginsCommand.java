package org.redward.cli.internal;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.CopyOnWriteArrayList;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.redward.api.commands.Command;
import org.redward.api.commands.CommandContext;
import org.redward.api.commands.Json;
import org.redward.api.commands.PlatformInfo;
import org.redward.api.commands.PlatformInfo.BundleRecord;
import org.redward.api.registry.Provided;
import org.redward.api.registry.ProviderRegistry;
import org.redward.cli.options.CommandOptions;

import picocli.CommandLine;
import picocli.CommandLine.Option;

/** {@code redward plugins}: bundles, services per family, versions, states, checksums. */
@Component(property = {Command.NAME + "=plugins", Command.SUMMARY + "=bundles, services, versions, states"})
public final class PluginsCommand implements Command {

    /** Name of the checksum list written into the product at build time. */
    static final String CHECKSUMS = "checksums.sha256";

    @Reference
    private PlatformInfo platform;

    private final List<ProviderRegistry<?>> registries = new CopyOnWriteArrayList<>();

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void bindRegistry(ProviderRegistry<?> r) {
        registries.add(r);
    }

    void unbindRegistry(ProviderRegistry<?> r) {
        registries.remove(r);
    }

    @CommandLine.Command(name = "plugins", mixinStandardHelpOptions = true,
            description = "List the installed bundles (symbolic name, version, state, folder, SHA-256) and the services of every family.")
    static final class Args {
        @Option(names = "--json", description = "one JSON object with 'bundles' and 'services'")
        boolean json;
        @Option(names = "--verify", description = "check the product's own bundles against the checksums recorded at build time")
        boolean verify;
    }

    @Override
    public int run(CommandContext ctx, List<String> arguments) throws Exception {
        Args a = new Args();
        if (!CommandOptions.parse(a, arguments, ctx.out())) {
            return 0;
        }
        if (a.verify) {
            return verify(ctx);
        }
        List<BundleRecord> bundles = platform.bundles();
        Map<String, List<Provided<?>>> services = services();
        if (a.json) {
            List<Object> bl = new ArrayList<>();
            for (BundleRecord b : bundles) {
                bl.add(Json.object().put("symbolic_name", b.symbolicName()).put("version", b.version())
                        .put("state", b.state()).put("origin", b.origin()).put("sha256", b.sha256()).put("id", b.id()));
            }
            Map<String, Object> sv = new LinkedHashMap<>();
            for (Map.Entry<String, List<Provided<?>>> e : services.entrySet()) {
                List<Object> items = new ArrayList<>();
                for (Provided<?> p : e.getValue()) {
                    items.add(Json.object().put("id", p.id()).put("bundle", p.bundleSymbolicName())
                            .put("bundle_version", p.bundleVersion()).put("description", p.description()));
                }
                sv.put(e.getKey(), items);
            }
            ctx.out().println(Json.object().put("product_version", platform.productVersion()).put("bundles", bl).put("services", sv));
            return 0;
        }
        PrintStream out = ctx.out();
        out.println("Redward " + platform.productVersion() + ": " + bundles.size() + " bundles");
        out.printf("  %-4s %-10s %-44s %-22s %s%n", "id", "state", "bundle", "version", "folder");
        for (BundleRecord b : bundles) {
            out.printf("  %-4d %-10s %-44s %-22s %s%n", b.id(), b.state(), b.symbolicName(), b.version(), b.origin());
        }
        out.println();
        out.println("services:");
        for (Map.Entry<String, List<Provided<?>>> e : services.entrySet()) {
            out.println("  " + e.getKey() + ":" + (e.getValue().isEmpty() ? " (none)" : ""));
            for (Provided<?> p : e.getValue()) {
                out.printf("    %-22s %s %s%s%n", p.id(), p.bundleSymbolicName(), p.bundleVersion(),
                        p.description().isEmpty() ? "" : "  - " + p.description());
            }
        }
        return 0;
    }

    private Map<String, List<Provided<?>>> services() {
        Map<String, List<Provided<?>>> out = new TreeMap<>();
        for (ProviderRegistry<?> r : registries) {
            out.put(r.family(), new ArrayList<>(r.providers()));
        }
        return out;
    }

    private int verify(CommandContext ctx) throws IOException {
        Path home = ctx.productHome();
        Path list = home.resolve(CHECKSUMS);
        if (!Files.isRegularFile(list)) {
            ctx.err().println("redward plugins: no checksum list at " + list + " (was the product built with 'mvn package'?)");
            return 1;
        }
        Map<String, String> expected = new TreeMap<>();
        for (String line : Files.readAllLines(list)) {
            String t = line.trim();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            String[] parts = t.split("\\s+", 2);
            if (parts.length == 2) {
                expected.put(parts[1].replace('\\', '/'), parts[0].toLowerCase(java.util.Locale.ROOT));
            }
        }
        int bad = 0;
        for (Map.Entry<String, String> e : expected.entrySet()) {
            Path jar = home.resolve(e.getKey());
            if (!Files.isRegularFile(jar)) {
                ctx.out().println("MISSING  " + e.getKey());
                bad++;
                continue;
            }
            String actual = ProductFacts.digest(jar);
            if (!actual.equals(e.getValue())) {
                ctx.out().println("CHANGED  " + e.getKey() + "  (recorded " + e.getValue().substring(0, 12) + "..., now " + actual.substring(0, Math.min(12, actual.length())) + "...)");
                bad++;
            }
        }
        Path bundlesDir = home.resolve("bundles");
        if (Files.isDirectory(bundlesDir)) {
            try (var s = Files.walk(bundlesDir)) {
                for (Path p : (Iterable<Path>) s.filter(f -> f.toString().endsWith(".jar"))::iterator) {
                    String rel = home.relativize(p).toString().replace('\\', '/');
                    if (!expected.containsKey(rel)) {
                        ctx.out().println("UNKNOWN  " + rel + "  (not part of the product as built)");
                        bad++;
                    }
                }
            }
        }
        if (bad == 0) {
            ctx.out().println("all " + expected.size() + " product bundles match the checksums recorded at build time");
            return 0;
        }
        ctx.out().println(bad + " problem(s) found against " + list);
        return 1;
    }
}
