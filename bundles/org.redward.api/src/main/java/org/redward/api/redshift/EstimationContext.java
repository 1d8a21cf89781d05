package org.redward.api.redshift;

import java.util.Map;
import java.util.Objects;
import java.util.Optional;

import org.redward.api.templates.TemplateSet;

/**
 * What an estimator is asked to do besides reading the spectrum: the template set to use (if it
 * uses one), the redshift range to search, masked regions (vacuum Angstrom, e.g. strong sky
 * lines from an instrument profile) and free parameters (recorded in the provenance).
 * Immutable; build modified copies with the {@code with...} methods.
 */
public final class EstimationContext {

    private static final EstimationContext DEFAULT = new EstimationContext(null, -0.005, 4.0, new double[0][], Map.of());

    private final TemplateSet templates;
    private final double zMin;
    private final double zMax;
    private final double[][] maskedRegionsVacuumAngstrom;
    private final Map<String, String> parameters;

    private EstimationContext(TemplateSet templates, double zMin, double zMax, double[][] masked, Map<String, String> parameters) {
        this.templates = templates;
        this.zMin = zMin;
        this.zMax = zMax;
        this.maskedRegionsVacuumAngstrom = masked;
        this.parameters = parameters;
    }

    /** No templates, z from -0.005 to 4, nothing masked, no parameters. */
    public static EstimationContext defaults() {
        return DEFAULT;
    }

    public Optional<TemplateSet> templates() { return Optional.ofNullable(templates); }
    public double zMin() { return zMin; }
    public double zMax() { return zMax; }
    /** Regions [from, to] in vacuum Angstrom (observed frame) to ignore. */
    public double[][] maskedRegionsVacuumAngstrom() {
        double[][] c = new double[maskedRegionsVacuumAngstrom.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = maskedRegionsVacuumAngstrom[i].clone();
        }
        return c;
    }
    public Map<String, String> parameters() { return parameters; }

    public EstimationContext withTemplates(TemplateSet t) {
        return new EstimationContext(t, zMin, zMax, maskedRegionsVacuumAngstrom, parameters);
    }

    public EstimationContext withRedshiftRange(double min, double max) {
        if (!(min < max)) {
            throw new IllegalArgumentException("redshift range: minimum " + min + " is not below maximum " + max);
        }
        return new EstimationContext(templates, min, max, maskedRegionsVacuumAngstrom, parameters);
    }

    public EstimationContext withMaskedRegions(double[][] regionsVacuumAngstrom) {
        return new EstimationContext(templates, zMin, zMax, regionsVacuumAngstrom.clone(), parameters);
    }

    public EstimationContext withParameters(Map<String, String> p) {
        return new EstimationContext(templates, zMin, zMax, maskedRegionsVacuumAngstrom, Map.copyOf(Objects.requireNonNull(p)));
    }
}
