package org.redward.survey.internal;

import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.LongConsumer;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;
import org.redward.api.catalog.CatalogWriter;
import org.redward.api.catalog.CatalogWriterRegistry;
import org.redward.api.commands.PlatformInfo;
import org.redward.api.cosmology.CosmologyCalculator;
import org.redward.api.cosmology.CosmologyParameters;
import org.redward.api.cosmology.CosmologyRegistry;
import org.redward.api.frames.Frame;
import org.redward.api.frames.FrameCorrector;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ProfileRegistry;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
import org.redward.api.lines.LineFinder;
import org.redward.api.lines.LineFinderRegistry;
import org.redward.api.lines.LineIdentifier;
import org.redward.api.lines.LineIdentifierRegistry;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineListRegistry;
import org.redward.api.redshift.EstimationContext;
import org.redward.api.redshift.EstimatorRegistry;
import org.redward.api.redshift.RedshiftEstimator;
import org.redward.api.registry.Provided;
import org.redward.api.survey.MeasureListener;
import org.redward.api.survey.MeasureRequest;
import org.redward.api.survey.MeasureSummary;
import org.redward.api.survey.MeasuredRow;
import org.redward.api.survey.SurveyMeasurer;
import org.redward.api.templates.TemplateRegistry;
import org.redward.api.templates.TemplateSet;

/**
 * The measuring pipeline as a service: resolves the request's ids through the registries, then
 * runs a {@link SurveyRun}.
 */
@Component(service = {SurveyMeasurer.class, SurveyService.class})
public final class SurveyService implements SurveyMeasurer {

    /** Preferred default estimator and template set, when present. */
    /** The estimator used when none is asked for; the product setting {@value #DEFAULT_ESTIMATOR_SETTING} overrides it. */
    static final String DEFAULT_ESTIMATOR = "chisq";
    static final String DEFAULT_TEMPLATES = "standard";
    /** Framework property (conf/redward.properties) naming the default estimator. */
    static final String DEFAULT_ESTIMATOR_SETTING = "redward.default.estimator";
    /** Framework property (conf/redward.properties) naming the default template set. */
    static final String DEFAULT_TEMPLATES_SETTING = "redward.default.templates";

    private volatile String defaultEstimator = DEFAULT_ESTIMATOR;
    private volatile String defaultTemplates = DEFAULT_TEMPLATES;

    @org.osgi.service.component.annotations.Activate
    void activate(org.osgi.framework.BundleContext bc) {
        String e = bc.getProperty(DEFAULT_ESTIMATOR_SETTING);
        String t = bc.getProperty(DEFAULT_TEMPLATES_SETTING);
        defaultEstimator = e == null || e.isBlank() ? DEFAULT_ESTIMATOR : e.trim();
        defaultTemplates = t == null || t.isBlank() ? DEFAULT_TEMPLATES : t.trim();
    }

    /** The estimator measure uses when --estimator is not given. */
    String defaultEstimator() {
        return defaultEstimator;
    }

    @Reference
    EstimatorRegistry estimators;
    @Reference
    TemplateRegistry templates;
    @Reference
    SpectrumInputs inputs;
    @Reference
    ProfileRegistry profiles;
    @Reference
    CatalogWriterRegistry writers;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    volatile PlatformInfo platform;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    volatile CosmologyRegistry cosmologies;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    volatile CosmologyCalculator calculator;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    volatile FrameCorrector frames;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    volatile LineFinderRegistry lineFinders;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    volatile LineIdentifierRegistry lineIdentifiers;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC, policyOption = ReferencePolicyOption.GREEDY)
    volatile LineListRegistry lineLists;

    @Override
    public MeasureSummary measure(MeasureRequest request, MeasureListener listener) throws IOException {
        return measure(request, listener, n -> { });
    }

    /** As {@link #measure(MeasureRequest, MeasureListener)}, reporting each row to {@code progress}. */
    MeasureSummary measure(MeasureRequest request, MeasureListener listener, LongConsumer progress) throws IOException {
        Provided<RedshiftEstimator> est = chooseEstimator(request.estimatorId());
        EstimationContext ctx = EstimationContext.defaults().withRedshiftRange(request.zMin(), request.zMax());
        Map<String, String> prov = new LinkedHashMap<>();
        PlatformInfo p = platform;
        if (p != null) {
            prov.put("product.version", p.productVersion());
        }
        prov.put("estimator", est.id());
        prov.put("estimator.bundle", est.bundleSymbolicName() + " " + est.bundleVersion());
        if (Boolean.TRUE.equals(est.properties().get(RedshiftEstimator.USES_TEMPLATES))) {
            TemplateSet ts = chooseTemplates(request.templatesId());
            ctx = ctx.withTemplates(ts);
            prov.put("templates", ts.id());
            prov.put("templates.version", ts.version());
            prov.put("templates.sha256", ts.checksum());
        } else if (request.templatesId().isPresent()) {
            throw new IllegalArgumentException("--templates: estimator '" + est.id() + "' uses no templates");
        }
        ReadOptions read = ReadOptions.defaults().withStallLimit(request.timeLimit());
        if (request.profileId().isPresent()) {
            String pid = request.profileId().get();
            InstrumentProfile profile = require(profiles.find(pid), "--profile", pid, profiles.ids()).service();
            read = read.withProfile(pid);
            List<double[]> masked = profile.maskedRegionsVacuumAngstrom();
            ctx = ctx.withMaskedRegions(masked.toArray(new double[0][]));
            prov.put("profile", request.profileId().get());
        }
        Enricher enricher = enricher(request, prov);
        prov.put("parameters", "z_min=" + request.zMin() + ",z_max=" + request.zMax() + ",time_limit_s="
                + request.timeLimit().toMillis() / 1000.0 + ",frame=" + request.frame().orElse("none")
                + ",cosmology=" + request.cosmologyId().orElse("default"));
        if (p != null) {
            for (PlatformInfo.BundleRecord b : p.bundles()) {
                if (b.id() != 0) {
                    prov.put("bundle." + b.symbolicName(), b.version() + " sha256:" + b.sha256());
                }
            }
        }
        Optional<CatalogWriter> writer = Optional.empty();
        boolean manyTables = false;
        if (request.output().isPresent()) {
            Provided<CatalogWriter> w = writers.forFile(request.output().get()).orElseThrow(() -> new IllegalArgumentException(
                    "--out " + request.output().get() + ": no catalogue writer for this extension (writers: "
                            + (writers.ids().isEmpty() ? "none" : String.join(", ", writers.ids())) + ")"));
            writer = Optional.of(w.service());
            manyTables = Boolean.TRUE.equals(w.properties().get(CatalogWriter.MANY_TABLES));
        }
        SurveyRun run = new SurveyRun(request, new EstimatorEstimation(est, ctx, enricher),
                new FacadeFeed(inputs, read), writer, enricher.columns(), prov)
                .progress(progress);
        if (request.lines()) {
            run.lines(lineStep(), manyTables);
        }
        try {
            return run.run(listener);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("measurement interrupted", e);
        }
    }

    /**
     * Spectra the request's inputs hold, as their readers know it up front (through the reading
     * facade's {@link SpectrumInputs#counts}, without reading the spectra); a file whose count is
     * unknown is estimated at the mean of the known ones (1 when none is known). For progress
     * totals: an estimate when some counts are unknown. Never throws for bad input.
     */
    long expectedSpectra(MeasureRequest request) {
        ReadOptions read = ReadOptions.defaults();
        if (request.profileId().isPresent()) {
            read = read.withProfile(request.profileId().get());
        }
        long known = 0;
        int knownFiles = 0;
        int unknownFiles = 0;
        for (long c : inputs.counts(request.inputs(), read)) {
            if (c >= 0) {
                known += c;
                knownFiles++;
            } else {
                unknownFiles++;
            }
        }
        long perUnknown = knownFiles == 0 ? 1 : Math.max(1, Math.round((double) known / knownFiles));
        long total = known + unknownFiles * perUnknown;
        if (request.sliceFirst() > 0 || request.sliceCount() >= 0) {
            total = Math.max(0, total - request.sliceFirst());
            total = request.sliceCount() >= 0 ? Math.min(total, request.sliceCount()) : total;
        }
        return total;
    }

    @Override
    public org.redward.api.catalog.CatalogTable table(MeasureRequest request, Iterable<MeasuredRow> rows, long rowCount) {
        CatalogLayout layout = new CatalogLayout(enricher(request, new LinkedHashMap<>()).columns());
        Iterable<Object[]> cells = layout.cells(rows);
        return new org.redward.api.catalog.CatalogTable("catalog", "redshifts measured by redward", layout.columns(), rowCount, cells);
    }

    /**
     * The line step of {@code --lines}: the default line finder and identifier and the standard
     * line list, through their registries (the first installed when the default is absent).
     */
    private LineStep lineStep() {
        LineFinderRegistry f = lineFinders;
        LineIdentifierRegistry i = lineIdentifiers;
        LineListRegistry l = lineLists;
        if (f == null || i == null || l == null) {
            throw new IllegalArgumentException("--lines: the line services (finder, identifier, line lists) are not installed");
        }
        Provided<LineFinder> finder = f.find(LineFinderRegistry.DEFAULT).or(() -> f.providers().stream().findFirst())
                .orElseThrow(() -> new IllegalArgumentException("--lines: no line finder is installed"));
        Provided<LineIdentifier> identifier = i.find(LineIdentifierRegistry.DEFAULT).or(() -> i.providers().stream().findFirst())
                .orElseThrow(() -> new IllegalArgumentException("--lines: no line identifier is installed"));
        LineList list = l.find(LineListRegistry.STANDARD).orElseThrow(() -> new IllegalArgumentException(
                "--lines: the line list '" + LineListRegistry.STANDARD + "' is not installed")).service();
        ProfileRegistry reg = profiles;
        return new ServiceLineStep(finder, identifier, list, id -> reg.find(id)
                .map(p -> p.service().maskedRegionsVacuumAngstrom()).orElse(List.of()));
    }

    /** Frame velocities and distances, when the cosmology services are installed. */
    private Enricher enricher(MeasureRequest request, Map<String, String> prov) {
        Optional<Frame> frame = request.frame().map(SurveyService::frame);
        CosmologyRegistry reg = cosmologies;
        CosmologyCalculator calc = calculator;
        if (reg == null || calc == null) {
            if (request.cosmologyId().isPresent() || frame.isPresent()) {
                throw new IllegalArgumentException("--cosmology/--frame: the cosmology services are not installed");
            }
            prov.put("cosmology", "none (cosmology services not installed): no distances");
            return Enricher.NONE;
        }
        String id = request.cosmologyId().orElse(CosmologyRegistry.DEFAULT_ID);
        CosmologyParameters p = require(reg.find(id), "--cosmology", id, reg.ids()).service().parameters();
        prov.put("cosmology", id);
        prov.put("cosmology.parameters", p.toString());
        prov.put("cosmology.citation", p.citation());
        frame.ifPresent(f -> prov.put("frame", f.key()));
        return new CosmoEnricher(calc.of(p), id, Optional.ofNullable(frames), frame, request.frame().orElse(""));
    }

    /** The frame of a {@code --frame} word. */
    static Frame frame(String word) {
        return switch (word) {
            case "bary" -> Frame.BARYCENTRIC;
            case "helio" -> Frame.HELIOCENTRIC;
            case "cmb" -> Frame.CMB;
            case "lg" -> Frame.LOCAL_GROUP;
            default -> throw new IllegalArgumentException("--frame " + word + ": expected one of bary, helio, cmb, lg");
        };
    }

    Provided<RedshiftEstimator> chooseEstimator(Optional<String> id) {
        if (id.isPresent()) {
            return require(estimators.find(id.get()), "--estimator", id.get(), estimators.ids());
        }
        return estimators.find(defaultEstimator).or(() -> estimators.providers().stream().findFirst())
                .orElseThrow(() -> new IllegalArgumentException("no redshift estimator is installed"));
    }

    private TemplateSet chooseTemplates(Optional<String> id) {
        if (id.isPresent()) {
            return require(templates.find(id.get()), "--templates", id.get(), templates.ids()).service();
        }
        return templates.find(defaultTemplates).or(() -> templates.providers().stream().findFirst())
                .orElseThrow(() -> new IllegalArgumentException("the estimator needs templates and no template set is installed"))
                .service();
    }

    private static <T> Provided<T> require(Optional<Provided<T>> p, String option, String id, List<String> ids) {
        return p.orElseThrow(() -> new IllegalArgumentException(option + " " + id + ": unknown (available: "
                + (ids.isEmpty() ? "none" : String.join(", ", ids)) + ")"));
    }
}
