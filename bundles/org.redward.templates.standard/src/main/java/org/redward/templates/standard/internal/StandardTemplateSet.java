package org.redward.templates.standard.internal;

import java.util.List;

import org.osgi.service.component.annotations.Component;
import org.redward.api.registry.Provided;
import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;
import org.redward.api.templates.TemplateSets;

/**
 * The standard template set: 4 galaxy, 1 quasar and 11 stellar templates computed by
 * {@link Recipes}. The checksum follows the rule of {@link TemplateSets#checksum(List)}.
 * and flux (IEEE doubles, big-endian), so it changes whenever a recipe does. Immutable and
 * thread-safe. Registered as a DS component (generated once, at activation).
 */
@Component(service = TemplateSet.class, property = {
    Provided.ID + "=" + StandardTemplateSet.ID,
    Provided.DESCRIPTION + "=default set: galaxies, quasars, stars A-M computed from published facts"})
public final class StandardTemplateSet implements TemplateSet {

    public static final String ID = "standard";
    /** Bump whenever a recipe changes. */
    public static final String VERSION = "1.0.0";

    private final List<Template> templates;
    private final String checksum;

    public StandardTemplateSet() {
        this.templates = List.copyOf(Recipes.all());
        this.checksum = TemplateSets.checksum(templates);
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String version() {
        return VERSION;
    }

    @Override
    public String checksum() {
        return checksum;
    }

    @Override
    public String description() {
        return "Redward standard set: 4 galaxy (passive, intermediate, starforming, nuclear-active), 1 quasar"
                + " (broadline), 11 stars A0-M5; computed from published line lists, ratios and"
                + " strengths (no copied spectra)";
    }

    @Override
    public List<Template> templates() {
        return templates;
    }
}
