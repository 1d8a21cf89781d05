package org.redward.profiles.internal;

import java.io.InputStream;
import java.net.URL;
import java.util.ArrayList;
import java.util.Dictionary;
import java.util.Enumeration;
import java.util.Hashtable;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.redward.api.formats.InstrumentProfile;
import org.redward.api.registry.Provided;
import org.redward.bundle.kit.HeaderExtender;

/**
 * The profile extender: watches bundles that carry the manifest header {@value #HEADER} and
 * registers one {@link InstrumentProfile} service per descriptor they hold, on the data bundle's
 * own behalf (so that {@code redward plugins} names the data bundle); the services go when the
 * bundle stops. The header lists descriptor paths inside the bundle, comma-separated, with
 * {@code *} wildcards in the file name, e.g. {@code Redward-Profiles: profiles/*.properties}.
 * A descriptor that cannot be read is reported in one line on standard error and skipped.
 */
@Component(immediate = true, service = {})
public final class ProfileExtender {

    /** The manifest header that marks a profile bundle. */
    public static final String HEADER = "Redward-Profiles";
    /** Service property: the reader a profile is meant for. */
    public static final String READER_PROPERTY = "redward.profile.reader";

    private HeaderExtender<List<ServiceRegistration<InstrumentProfile>>> extender;
    private final Map<String, String> problems = new ConcurrentHashMap<>();

    @Activate
    void activate(BundleContext context) {
        extender = HeaderExtender.registering(context, HEADER, this::register);
        extender.open();
    }

    @Deactivate
    void deactivate() {
        extender.close();
    }

    private List<ServiceRegistration<InstrumentProfile>> register(Bundle bundle, String header) {
        List<ServiceRegistration<InstrumentProfile>> regs = new ArrayList<>();
        BundleContext bc = bundle.getBundleContext();
        if (bc == null) {
            return regs;
        }
        for (URL url : descriptors(bundle, header)) {
            String source = bundle.getSymbolicName() + ":" + url.getPath();
            try (InputStream in = url.openStream()) {
                ProfileDescriptor d = ProfileDescriptor.parse(source, in);
                Dictionary<String, Object> props = new Hashtable<>();
                props.put(Provided.ID, d.id());
                props.put(Provided.DESCRIPTION, d.description());
                props.put(READER_PROPERTY, d.reader());
                regs.add(bc.registerService(InstrumentProfile.class, d, props));
            } catch (Exception e) {
                String m = "redward: instrument profile " + source + " skipped: " + e.getMessage();
                problems.put(source, m);
                System.err.println(m);
            }
        }
        return regs;
    }

    /** The descriptor files a header names, sorted by path. */
    static List<URL> descriptors(Bundle bundle, String header) {
        Map<String, URL> found = new TreeMap<>();
        for (String part : header.split(",")) {
            String p = part.trim();
            if (p.isEmpty()) {
                continue;
            }
            int slash = p.lastIndexOf('/');
            String dir = slash < 0 ? "/" : "/" + p.substring(0, slash);
            String pattern = slash < 0 ? p : p.substring(slash + 1);
            Enumeration<URL> e = bundle.findEntries(dir, pattern, false);
            while (e != null && e.hasMoreElements()) {
                URL u = e.nextElement();
                found.put(u.getPath(), u);
            }
        }
        return new ArrayList<>(found.values());
    }
}
