package org.redward.lines.internal;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.util.ArrayList;
import java.util.Dictionary;
import java.util.Hashtable;
import java.util.List;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.redward.api.lines.LineList;
import org.redward.api.registry.Provided;
import org.redward.bundle.kit.HeaderExtender;

/**
 * The line-list extender: watches bundles come and go, and for every active bundle whose manifest
 * has the header {@value LineList#MANIFEST_HEADER} (comma-separated paths of line-list files
 * inside the bundle) registers one {@link LineList} service per file, on behalf of that bundle
 * (so the list disappears with it, and its provenance names the data bundle). This bundle's own
 * standard list comes in the same way. A file that cannot be read is reported in one line on
 * standard error, naming the bundle, file, line and column; the bundle's other files still load.
 */
@Component(immediate = true)
public final class LineListExtender {

    /** Service property: the list's version. */
    static final String VERSION = "redward.linelist.version";

    private HeaderExtender<List<ServiceRegistration<LineList>>> extender;

    @Activate
    void activate(BundleContext context) {
        extender = HeaderExtender.registering(context, LineList.MANIFEST_HEADER, LineListExtender::register);
        extender.open();
    }

    @Deactivate
    void deactivate() {
        extender.close();
    }

    private static List<ServiceRegistration<LineList>> register(Bundle bundle, String header) {
        List<ServiceRegistration<LineList>> regs = new ArrayList<>();
        BundleContext owner = bundle.getBundleContext();
        if (owner == null) {
            return regs;
        }
        for (String raw : header.split(",")) {
            String path = raw.strip();
            if (path.isEmpty()) {
                continue;
            }
            String where = bundle.getSymbolicName() + "!/" + path;
            URL url = bundle.getEntry(path);
            if (url == null) {
                System.err.println("redward: line list " + where + " named in " + LineList.MANIFEST_HEADER + " is not in the bundle");
                continue;
            }
            try (InputStream in = url.openStream()) {
                LineList list = LineListFile.read(in, where);
                Dictionary<String, Object> props = new Hashtable<>();
                props.put(Provided.ID, list.id());
                props.put(Provided.DESCRIPTION, list.description());
                props.put(VERSION, list.version());
                regs.add(owner.registerService(LineList.class, list, props));
            } catch (IOException | RuntimeException e) {
                System.err.println("redward: line list not loaded: " + e.getMessage());
            }
        }
        return regs;
    }
}
