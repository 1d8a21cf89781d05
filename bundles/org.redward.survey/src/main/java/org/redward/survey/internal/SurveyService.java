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
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ProfileRegistry;
import org.redward.api.formats.ReadOptions;
import org.redward.api.formats.SpectrumInputs;
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
    static final String DEFAULT_ESTIMATOR = "xcorr";
    static final String DEFAULT_TEMPLATES = "standard";

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
        Enricher enricher = enricher(request);
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
        if (request.output().isPresent()) {
            writer = Optional.of(writers.forFile(request.output().get()).orElseThrow(() -> new IllegalArgumentException(
                    "--out " + request.output().get() + ": no catalogue writer for this extension (writers: "
                            + (writers.ids().isEmpty() ? "none" : String.join(", ", writers.ids())) + ")")).service());
        }
        SurveyRun run = new SurveyRun(request, new EstimatorEstimation(est, ctx, enricher),
                new FacadeFeed(inputs, read), writer, enricher.columns(), prov)
                .progress(progress);
        try {
            return run.run(listener);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("measurement interrupted", e);
        }
    }

    @Override
    public org.redward.api.catalog.CatalogTable table(MeasureRequest request, Iterable<MeasuredRow> rows, long rowCount) {
        CatalogLayout layout = new CatalogLayout(enricher(request).columns());
        Iterable<Object[]> cells = () -> new java.util.Iterator<Object[]>() {
            private final java.util.Iterator<MeasuredRow> it = rows.iterator();

            @Override
            public boolean hasNext() {
                return it.hasNext();
            }

            @Override
            public Object[] next() {
                return layout.toCells(it.next());
            }
        };
        return new org.redward.api.catalog.CatalogTable("catalog", "redshifts measured by redward", layout.columns(), rowCount, cells);
    }

    /** The derived columns (frame velocities, distances) the request asks for. */
    private Enricher enricher(MeasureRequest request) {
        return Enricher.NONE;
    }

    Provided<RedshiftEstimator> chooseEstimator(Optional<String> id) {
        if (id.isPresent()) {
            return require(estimators.find(id.get()), "--estimator", id.get(), estimators.ids());
        }
        return estimators.find(DEFAULT_ESTIMATOR).or(() -> estimators.providers().stream().findFirst())
                .orElseThrow(() -> new IllegalArgumentException("no redshift estimator is installed"));
    }

    private TemplateSet chooseTemplates(Optional<String> id) {
        if (id.isPresent()) {
            return require(templates.find(id.get()), "--templates", id.get(), templates.ids()).service();
        }
        return templates.find(DEFAULT_TEMPLATES).or(() -> templates.providers().stream().findFirst())
                .orElseThrow(() -> new IllegalArgumentException("the estimator needs templates and no template set is installed"))
                .service();
    }

    private static <T> Provided<T> require(Optional<Provided<T>> p, String option, String id, List<String> ids) {
        return p.orElseThrow(() -> new IllegalArgumentException(option + " " + id + ": unknown (available: "
                + (ids.isEmpty() ? "none" : String.join(", ", ids)) + ")"));
    }
}
