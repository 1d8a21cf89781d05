package org.redward.testkit;

import java.util.List;

import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;

/** A template set built in test code (checksum by the rule of TemplateSets). */
public final class SimpleTemplateSet implements TemplateSet {

    private final String id;
    private final List<Template> templates;
    private final String checksum;

    public SimpleTemplateSet(String id, List<Template> templates) {
        this.id = id;
        this.templates = List.copyOf(templates);
        this.checksum = org.redward.api.templates.TemplateSets.checksum(this.templates);
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
