package org.redward.formats.fits.internal;

import java.util.NoSuchElementException;

import org.redward.api.formats.SpectrumRecord;
import org.redward.api.formats.SpectrumSource;

/** The spectra of one open FITS file, streamed in order. Not thread-safe. */
final class FitsSource implements SpectrumSource {

    private final FitsFileView view;
    private final Plan plan;
    private final int count;
    private int next;

    FitsSource(FitsFileView view, Plan plan) {
        this.view = view;
        this.plan = plan;
        this.count = plan.count();
    }

    @Override
    public String layout() {
        return plan.layout();
    }

    @Override
    public long count() {
        return count;
    }

    @Override
    public boolean hasNext() {
        return next < count;
    }

    @Override
    public SpectrumRecord next() {
        if (next >= count) {
            throw new NoSuchElementException();
        }
        return plan.read(next++);
    }

    @Override
    public void close() {
        view.close();
    }
}
