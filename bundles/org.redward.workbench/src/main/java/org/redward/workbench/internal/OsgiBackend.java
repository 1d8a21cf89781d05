package org.redward.workbench.internal;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;
import java.util.zip.GZIPInputStream;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleException;
import org.redward.api.commands.PlatformInfo;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumReadException;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.LineFinder;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.redshift.RedshiftSolution;
import org.redward.api.registry.Provided;
import org.redward.api.registry.ProviderRegistry;
import org.redward.api.templates.TemplateRegistry;
import org.redward.charts.FoundLine;
import org.redward.charts.RestLine;
import org.redward.spectrum.Spectrum;

/**
 * The workbench's view of the running platform: readers, estimators and template sets through
 * their registries (looked up at each call, never cached: bundles come and go), bundles through
 * the framework. Thread-safe.
 */
final class OsgiBackend implements Backend {

    private final BundleContext context;
    private final ReaderRegistry readers;
    private final EstimatorRegistry estimators;
    private final TemplateRegistry templates;
    private final PlatformInfo platform;
    private final List<ProviderRegistry<?>> registries;
    private final String user;
    private final String templateSet;
    private final java.util.function.Supplier<LineListRegistry> lineLists;
    private final java.util.function.Supplier<LineFinder> finder;
    private final String lineListId;
    private final java.util.function.Supplier<CosmologyRegistry> cosmologies;
    private final java.util.function.Supplier<CosmologyCalculator> calculator;
    private final String cosmologyId;

    OsgiBackend(BundleContext context, ReaderRegistry readers, EstimatorRegistry estimators, TemplateRegistry templates,
            PlatformInfo platform, List<ProviderRegistry<?>> registries, String user, String templateSet,
            java.util.function.Supplier<LineListRegistry> lineLists, java.util.function.Supplier<LineFinder> finder, String lineListId,
            java.util.function.Supplier<CosmologyRegistry> cosmologies, java.util.function.Supplier<CosmologyCalculator> calculator,
            String cosmologyId) {
        this.cosmologies = cosmologies;
        this.calculator = calculator;
        this.cosmologyId = cosmologyId;
        this.lineLists = lineLists;
        this.finder = finder;
        this.lineListId = lineListId;
        this.context = context;
        this.readers = readers;
        this.estimators = estimators;
        this.templates = templates;
        this.platform = platform;
        this.registries = registries;
        this.user = user;
        this.templateSet = templateSet;
    }

    @Override
    public List<QueueItem> list(Path path) {
        List<QueueItem> out = new ArrayList<>();
        if (Files.isDirectory(path)) {
            try (Stream<Path> s = Files.list(path)) {
                for (Path f : s.filter(Files::isRegularFile).filter(f -> !f.getFileName().toString().startsWith("."))
                        .sorted(Comparator.comparing(Path::toString)).toList()) {
                    if (pick(f).isPresent()) {
                        out.addAll(list(f));
                    }
                }
            } catch (IOException e) {
                QueueItem bad = new QueueItem(path, 0, path.getFileName().toString());
                bad.problem("folder " + path + " cannot be listed: " + e.getMessage());
                out.add(bad);
            }
            return out;
        }
        if (!Files.isRegularFile(path)) {
            QueueItem bad = new QueueItem(path, 0, path.getFileName().toString());
            bad.problem(path + ": no such file");
            out.add(bad);
            return out;
        }
        try (SpectrumSource src = open(path)) {
            long n = src.count();
            if (n >= 0) {
                for (int i = 0; i < n; i++) {
                    out.add(new QueueItem(path, i, null));
                }
            } else {
                int i = 0;
                while (src.hasNext()) {
                    SpectrumRecord r = src.next();
                    out.add(new QueueItem(path, i++, r.spectrum().flatMap(s -> s.metadata().objectId()).orElse(null)));
                }
            }
        } catch (IOException e) {
            QueueItem bad = new QueueItem(path, 0, path.getFileName().toString());
            bad.problem(e.getMessage());
            out.add(bad);
        }
        return out;
    }

    private Optional<SpectrumReader> pick(Path file) {
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(8640);
            if (head.length > 2 && (head[0] & 0xff) == 0x1f && (head[1] & 0xff) == 0x8b) {
                try (InputStream gz = new GZIPInputStream(Files.newInputStream(file))) {
                    head = gz.readNBytes(8640);
                }
            }
        } catch (IOException e) {
            return Optional.empty();
        }
        SpectrumReader best = null;
        int bestScore = 0;
        for (Provided<SpectrumReader> p : readers.providers()) {
            int s = p.service().sniff(file, head);
            if (s > bestScore) {
                bestScore = s;
                best = p.service();
            }
        }
        return Optional.ofNullable(best);
    }

    private SpectrumSource open(Path file) throws IOException {
        SpectrumReader r = pick(file).orElseThrow(() -> new IOException(file + ": no installed reader understands this file ("
                + (readers.ids().isEmpty() ? "no readers installed" : "readers: " + String.join(", ", readers.ids())) + ")"));
        try {
            return r.open(file, Optional.empty());
        } catch (SpectrumReadException e) {
            throw new IOException(e.getMessage(), e);
        }
    }

    @Override
    public Loaded load(QueueItem item) throws IOException {
        try (SpectrumSource src = open(item.source())) {
            int i = 0;
            while (src.hasNext()) {
                SpectrumRecord r = src.next();
                if (i++ == item.index()) {
                    if (!r.ok()) {
                        throw new IOException(r.error());
                    }
                    Spectrum s = r.spectrum().orElseThrow();
                    return new Loaded(s, s.sky(), src.layout(), findLines(s));
                }
            }
        }
        throw new IOException(item.source() + ": has no spectrum number " + item.index());
    }

    @Override
    public List<String> estimators() {
        return estimators.ids();
    }

    @Override
    public MachineAnswer estimate(String estimatorId, Spectrum spectrum) {
        Optional<Provided<RedshiftEstimator>> p = estimators.find(estimatorId);
        if (p.isEmpty()) {
            return MachineAnswer.failed(estimatorId, "estimator '" + estimatorId + "' is not installed now");
        }
        EstimationContext ctx = EstimationContext.defaults();
        if (Boolean.TRUE.equals(p.get().properties().get(RedshiftEstimator.USES_TEMPLATES)) && templates != null) {
            var set = templateSet == null || templateSet.isEmpty() ? templates.providers().stream().findFirst() : templates.find(templateSet);
            if (set.isEmpty()) {
                return MachineAnswer.failed(estimatorId, "estimator '" + estimatorId + "' needs a template set and none is installed");
            }
            ctx = ctx.withTemplates(set.get().service());
        }
        try {
            RedshiftSolution s = p.get().service().estimate(spectrum, ctx);
            return Answers.of(estimatorId, s);
        } catch (RuntimeException e) {
            return MachineAnswer.failed(estimatorId, "estimator '" + estimatorId + "' failed: " + e);
        }
    }

    /** The lines of the chosen list (default: the standard one); empty when no list is installed. */
    @Override
    public List<RestLine> lines() {
        LineListRegistry r = lineLists.get();
        if (r == null) {
            return List.of();
        }
        String id = lineListId == null || lineListId.isEmpty() ? LineListRegistry.STANDARD : lineListId;
        return r.find(id).or(() -> r.providers().stream().findFirst()).map(p -> LineViews.restLines(p.service())).orElse(List.of());
    }

    /** Lines found by the installed line finder with its default settings; empty when none is installed. */
    @Override
    public List<FoundLine> findLines(Spectrum spectrum) {
        LineFinder f = finder.get();
        if (f == null) {
            return List.of();
        }
        try {
            return LineViews.found(f.find(spectrum, FinderSettings.defaults()));
        } catch (RuntimeException e) {
            return List.of();
        }
    }

    /** Velocities and the Hubble-law distance, then the cosmology service's distances when it is installed. */
    @Override
    public List<String[]> velocitiesAndDistances(double z) {
        List<String[]> rows = new ArrayList<>(Answers.velocityRows(z));
        CosmologyRegistry r = cosmologies.get();
        CosmologyCalculator c = calculator.get();
        if (r == null || c == null) {
            rows.add(new String[] {"distances", "–", "no cosmology service installed"});
            return rows;
        }
        String id = cosmologyId == null || cosmologyId.isEmpty() ? CosmologyRegistry.DEFAULT_ID : cosmologyId;
        var set = r.find(id).or(() -> r.providers().stream().findFirst());
        if (set.isEmpty()) {
            rows.add(new String[] {"distances", "–", "no cosmology parameter set installed"});
            return rows;
        }
        try {
            var params = set.get().service().parameters();
            rows.addAll(Answers.distanceRows(set.get().id(), c.of(params), c.of(params.toBuilder().h0(73.04).build()), z));
        } catch (RuntimeException e) {
            rows.add(new String[] {"distances", "–", "cosmology failed at this z: " + e.getMessage()});
        }
        return rows;
    }

    @Override
    public List<String[]> bundles() {
        List<String[]> out = new ArrayList<>();
        for (Bundle b : context.getBundles()) {
            out.add(new String[] {Long.toString(b.getBundleId()), String.valueOf(b.getSymbolicName()), b.getVersion().toString(),
                state(b.getState())});
        }
        return out;
    }

    private static String state(int s) {
        return switch (s) {
            case Bundle.ACTIVE -> "active";
            case Bundle.RESOLVED -> "resolved";
            case Bundle.INSTALLED -> "installed";
            case Bundle.STARTING -> "starting";
            case Bundle.STOPPING -> "stopping";
            default -> "uninstalled";
        };
    }

    @Override
    public List<String[]> services() {
        List<String[]> out = new ArrayList<>();
        for (ProviderRegistry<?> r : registries) {
            for (Provided<?> p : r.providers()) {
                out.add(new String[] {r.family(), p.id(), p.bundleSymbolicName() + " " + p.bundleVersion()});
            }
        }
        out.sort(Comparator.comparing((String[] a) -> a[0]).thenComparing(a -> a[1]));
        return out;
    }

    @Override
    public String install(Path jar) throws IOException {
        if (!Files.isRegularFile(jar)) {
            throw new IOException(jar + ": no such file");
        }
        Bundle b;
        try {
            b = context.installBundle(jar.toUri().toString());
        } catch (BundleException e) {
            throw new IOException(e.getMessage(), e);
        }
        if (b.getSymbolicName() == null) {
            try {
                b.uninstall();
            } catch (BundleException e) {
                // it was never usable
            }
            throw new IOException(jar.getFileName() + " is a plain jar, not an OSGi bundle (no Bundle-SymbolicName)");
        }
        try {
            if (b.getHeaders().get("Fragment-Host") == null) {
                b.start();
            }
        } catch (BundleException e) {
            throw new IOException("installed " + b.getSymbolicName() + " but it does not start: " + e.getMessage(), e);
        }
        return String.format(Locale.ROOT, "installed and started %s %s", b.getSymbolicName(), b.getVersion());
    }

    @Override
    public String user() {
        return user;
    }

    /** For the platform facts line in the bundles panel. */
    String productVersion() {
        return platform == null ? "" : platform.productVersion();
    }
}
