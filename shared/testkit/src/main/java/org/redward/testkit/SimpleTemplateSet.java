package org.redward.testkit;

import java.util.List;

import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;

/** A template set built in test code (its checksum is a 64-bit hash of the data, padded: for tests only). */
public final class SimpleTemplateSet implements TemplateSet {

    private final String id;
    private final List<Template> templates;
    private final String checksum;

    public SimpleTemplateSet(String id, List<Template> templates) {
        this.id = id;
        this.templates = List.copyOf(templates);
        long h = id.hashCode();
        for (Template t : this.templates) {
            h = h * 31 + t.id().hashCode();
            h = h * 31 + java.util.Arrays.hashCode(t.flux());
            h = h * 31 + java.util.Arrays.hashCode(t.restVacuumAngstrom());
        }
        this.checksum = String.format("%064x", h & Long.MAX_VALUE);
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String version() {
        return "0.0.0";
    }

    @Override
    public String checksum() {
        return checksum;
    }

    @Override
    public String description() {
        return "test set " + id;
    }

    @Override
    public List<Template> templates() {
        return templates;
    }
}
