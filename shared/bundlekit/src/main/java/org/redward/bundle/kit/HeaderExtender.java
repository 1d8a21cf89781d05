package org.redward.bundle.kit;

import java.util.List;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleEvent;
import org.osgi.framework.ServiceRegistration;
import org.osgi.util.tracker.BundleTracker;

/**
 * The skeleton of an extender (the OSGi extender pattern): tracks the bundles, starting or
 * active, whose manifest carries a given header, hands each one with the header's value to a
 * {@link Handler}, which registers services on that bundle's behalf and returns what it keeps of
 * it; when the bundle stops or goes, every registration in what was kept is undone (quietly for
 * those the framework undid already with their bundle), then the handler hears of it.
 *
 * <p>Open it in the extender component's activation, close it in its deactivation. Thread-safe
 * as {@link BundleTracker} is: the handler may be called on the framework's threads.
 *
 * @param <T> what the handler keeps per bundle
 */
public final class HeaderExtender<T> {

    /** What an extender does with one data bundle. */
    public interface Handler<T> {

        /**
         * A bundle with the header came: register its services (on its own context) and return what
         * to keep, or null to leave the bundle alone.
         *
         * @param header the header's value, not blank
         */
        T adding(Bundle bundle, String header);

        /** The registrations in what was kept, undone when the bundle goes. */
        List<? extends ServiceRegistration<?>> registrations(T kept);

        /** The bundle went and its registrations are undone (default: nothing more to do). */
        default void removed(Bundle bundle, T kept) {
        }
    }

    /** A handler that keeps only the registrations it made. */
    public interface Registrar<S> {

        /** Registers the services of a bundle with the header, on the bundle's behalf. */
        List<ServiceRegistration<S>> register(Bundle bundle, String header);
    }

    private final BundleTracker<T> tracker;

    /** An extender for {@code header}; nothing happens before {@link #open()}. */
    public HeaderExtender(BundleContext context, String header, Handler<T> handler) {
        this.tracker = new BundleTracker<>(context, Bundle.STARTING | Bundle.ACTIVE, null) {
            @Override
            public T addingBundle(Bundle bundle, BundleEvent event) {
                String value = bundle.getHeaders("").get(header);
                if (value == null || value.isBlank()) {
                    return null;
                }
                return handler.adding(bundle, value);
            }

            @Override
            public void removedBundle(Bundle bundle, BundleEvent event, T kept) {
                unregisterAll(handler.registrations(kept));
                handler.removed(bundle, kept);
            }
        };
    }

    /** An extender whose handler keeps only the registrations it made. */
    public static <S> HeaderExtender<List<ServiceRegistration<S>>> registering(BundleContext context, String header,
            Registrar<S> registrar) {
        return new HeaderExtender<>(context, header, new Handler<>() {
            @Override
            public List<ServiceRegistration<S>> adding(Bundle bundle, String value) {
                return registrar.register(bundle, value);
            }

            @Override
            public List<ServiceRegistration<S>> registrations(List<ServiceRegistration<S>> kept) {
                return kept;
            }
        });
    }

    /** Starts tracking: the bundles already there are handled now. */
    public void open() {
        tracker.open();
    }

    /** Stops tracking and undoes every registration made. */
    public void close() {
        tracker.close();
    }

    /** Unregisters each one, skipping those the framework unregistered already (their bundle stopped first). */
    public static void unregisterAll(Iterable<? extends ServiceRegistration<?>> registrations) {
        for (ServiceRegistration<?> r : registrations) {
            try {
                r.unregister();
            } catch (IllegalStateException alreadyGone) {
                // unregistered with its bundle
            }
        }
    }
}
