package org.redward.redshift.kit;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;

import org.redward.api.templates.TemplateSet;

/** The provenance map every solution carries (keys snake_case). */
public final class Provenance {

    private Provenance() {
    }

    /**
     * @param bundle estimator bundle symbolic name
     * @param version its version
     * @param estimatorId the estimator's service id
     * @param set the template set used (may be null)
     * @param parameters the effective parameters (defaults included)
     */
    public static Map<String, String> of(String bundle, String version, String estimatorId, TemplateSet set,
            Map<String, String> parameters) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("estimator", estimatorId);
        m.put("estimator_bundle", bundle);
        m.put("estimator_version", version);
        if (set != null) {
            m.put("template_set", set.id());
            m.put("template_set_version", set.version());
            m.put("template_set_checksum", set.checksum());
        }
        new TreeMap<>(parameters).forEach((k, v) -> m.put("param." + k, v));
        return m;
    }
}
