package org.redward.templates.internal;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.util.ArrayList;
import java.util.Hashtable;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.redward.api.registry.Provided;
import org.redward.api.templates.TemplateSet;
import org.redward.bundle.kit.HeaderExtender;

/**
 * The template extender: watches bundles that carry the {@value TemplateSet#BUNDLE_HEADER}
 * manifest header, loads each descriptor it names ({@link TemplateSetLoader}) and registers one
 * {@link TemplateSet} service per descriptor <em>in the name of the data bundle</em> (so the
 * registry and every solution's provenance name the data bundle and its version), with the
 * properties {@value Provided#ID}, {@value Provided#DESCRIPTION}, {@value TemplateSet#VERSION}
 * and {@value TemplateSet#CHECKSUM}. The services go when the bundle stops.
 *
 * <p>A bad set gives one line on standard error naming the bundle and the file, and is listed
 * by {@code redward templates list}; the other sets of that bundle and of other bundles go on.
 * Thread-safe.
 */
@Component(service = TemplateExtender.class, immediate = true)
public final class TemplateExtender {

    /** A set that could not be loaded: which bundle, and why (names the file). */
    public record Problem(String bundle, String message) {
    }

    /** A set that was loaded: which bundle, and what was done to its data. */
    public record Registered(String bundle, String bundleVersion, String descriptor, TemplateSet set, List<String> notes) {
    }

    private record Tracked(List<ServiceRegistration<TemplateSet>> registrations, List<Registered> sets, List<Problem> problems) {
    }

    private final Map<Long, Tracked> byBundle = new ConcurrentHashMap<>();
    private HeaderExtender<Tracked> extender;

    @Activate
    void activate(BundleContext context) {
        extender = new HeaderExtender<>(context, TemplateSet.BUNDLE_HEADER, new HeaderExtender.Handler<>() {
            @Override
            public Tracked adding(Bundle bundle, String header) {
                Tracked t = extend(bundle, header);
                byBundle.put(bundle.getBundleId(), t);
                return t;
            }

            @Override
            public List<ServiceRegistration<TemplateSet>> registrations(Tracked t) {
                return t.registrations();
            }

            @Override
            public void removed(Bundle bundle, Tracked t) {
                byBundle.remove(bundle.getBundleId());
            }
        });
        extender.open();
    }

    @Deactivate
    void deactivate() {
        extender.close();
        byBundle.clear();
    }

    /** The sets registered now, by bundle id order. */
    public List<Registered> registered() {
        List<Registered> out = new ArrayList<>();
        new java.util.TreeMap<>(byBundle).values().forEach(t -> out.addAll(t.sets()));
        return out;
    }

    /** The sets that could not be loaded, with their reasons. */
    public List<Problem> problems() {
        List<Problem> out = new ArrayList<>();
        new java.util.TreeMap<>(byBundle).values().forEach(t -> out.addAll(t.problems()));
        return out;
    }

    private static Tracked extend(Bundle bundle, String header) {
        String origin = "bundle " + bundle.getSymbolicName() + " " + bundle.getVersion();
        List<ServiceRegistration<TemplateSet>> regs = new ArrayList<>();
        List<Registered> sets = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        BundleContext ctx = bundle.getBundleContext();
        for (String descriptor : descriptorPaths(header)) {
            try {
                TemplateSetLoader.Loaded loaded = TemplateSetLoader.load(origin, descriptor, path -> read(bundle, path));
                if (ctx == null) {
                    throw new TemplateDataException(origin + ": the bundle has no context (not started)");
                }
                regs.add(ctx.registerService(TemplateSet.class, loaded.set(), properties(loaded.set())));
                sets.add(new Registered(bundle.getSymbolicName(), bundle.getVersion().toString(), descriptor, loaded.set(), loaded.notes()));
            } catch (TemplateDataException | RuntimeException e) {
                String msg = e instanceof TemplateDataException ? e.getMessage() : origin + ", descriptor " + descriptor + ": " + e;
                problems.add(new Problem(bundle.getSymbolicName(), msg));
                System.err.println("redward: template set not loaded: " + msg);
            }
        }
        return new Tracked(regs, sets, problems);
    }

    /** The descriptor paths of a header value: comma-separated, leading '/' dropped. */
    static List<String> descriptorPaths(String header) {
        List<String> out = new ArrayList<>();
        for (String part : header.split(",")) {
            String p = part.trim();
            int semi = p.indexOf(';');
            if (semi >= 0) {
                p = p.substring(0, semi).trim();
            }
            if (p.startsWith("/")) {
                p = p.substring(1);
            }
            if (!p.isEmpty()) {
                out.add(p);
            }
        }
        return out;
    }

    static Hashtable<String, Object> properties(TemplateSet set) {
        Hashtable<String, Object> p = new Hashtable<>();
        p.put(Provided.ID, set.id());
        p.put(Provided.DESCRIPTION, set.description());
        p.put(TemplateSet.VERSION, set.version());
        p.put(TemplateSet.CHECKSUM, set.checksum());
        return p;
    }

    private static byte[] read(Bundle bundle, String path) throws IOException {
        URL url = bundle.getEntry(path);
        if (url == null) {
            return null;
        }
        try (InputStream in = url.openStream()) {
            return in.readAllBytes();
        }
    }
}
