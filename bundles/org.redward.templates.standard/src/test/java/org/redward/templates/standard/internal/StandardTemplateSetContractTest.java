package org.redward.templates.standard.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import java.util.Set;

import org.redward.api.templates.TemplateSet;
import org.redward.spectrum.ObjectClass;
import org.redward.testkit.TemplateSetContractTest;

/** The template-set conformance kit for the standard set. */
class StandardTemplateSetContractTest extends TemplateSetContractTest {

    private static final TemplateSet SET = new StandardTemplateSet();

    @Override
    protected TemplateSet createTemplateSet() {
        return new StandardTemplateSet();
    }

    @Test
    void coversGalaxiesQuasarsAndStars() {
        Set<ObjectClass> classes = new java.util.HashSet<>();
        SET.templates().forEach(t -> classes.add(t.objectClass()));
        assertEquals(Set.of(ObjectClass.GALAXY, ObjectClass.QUASAR, ObjectClass.STAR), classes);
    }
}
