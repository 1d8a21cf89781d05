package org.redward.templates.standard.internal;

import java.util.Set;

import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;
import org.redward.testkit.TemplateSetContractTest;

/** The template-set conformance kit for the standard set. */
class StandardTemplateSetContractTest extends TemplateSetContractTest {

    private static final TemplateSet SET = new StandardTemplateSet();

    @Override
    protected TemplateSet templateSet() {
        return SET;
    }

    @Override
    protected Set<ObjectClass> requiredClasses() {
        return Set.of(ObjectClass.GALAXY, ObjectClass.QUASAR, ObjectClass.STAR);
    }
}
