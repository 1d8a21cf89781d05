package org.redward.redshift.kit;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.redward.api.templates.Template;
import org.redward.api.templates.TemplateSet;

/**
 * A template set gridded at the analysis step, with the templates it could not use (and why).
 * Built once per template set checksum and kept in a small cache ({@link Cache}). Immutable.
 */
public final class TemplateBank {

    public final TemplateSet set;
    public final List<GriddedTemplate> templates;
    public final List<String> rejected;

    private TemplateBank(TemplateSet set, List<GriddedTemplate> t, List<String> rejected) {
        this.set = set;
        this.templates = List.copyOf(t);
        this.rejected = List.copyOf(rejected);
    }

    public static TemplateBank of(TemplateSet set, double log10Step) {
        List<GriddedTemplate> ok = new ArrayList<>();
        List<String> bad = new ArrayList<>();
        for (Template t : set.templates()) {
            GriddedTemplate g = GriddedTemplate.of(t, log10Step);
            if (g == null) {
                bad.add(t.id() + ": fewer than 4 usable pixels at the analysis step");
            } else {
                ok.add(g);
            }
        }
        return new TemplateBank(set, ok, bad);
    }

    /**
     * A small least-recently-used cache of prepared objects keyed by text (e.g. a template set
     * checksum plus an FFT size). Thread-safe; a value may be computed twice under contention.
     */
    public static final class Cache<V> {
        private final Map<String, V> map;

        public Cache(int capacity) {
            this.map = Collections.synchronizedMap(new LinkedHashMap<>(16, 0.75f, true) {
                private static final long serialVersionUID = 1L;

                @Override
                protected boolean removeEldestEntry(Map.Entry<String, V> e) {
                    return size() > capacity;
                }
            });
        }

        public V get(String key, Function<String, V> make) {
            V v = map.get(key);
            if (v == null) {
                v = make.apply(key);
                map.put(key, v);
            }
            return v;
        }
    }
}
