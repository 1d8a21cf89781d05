package org.redward.workbench.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;

/**
 * The queue of spectra and the filtered view the person walks through. The cursor is a position
 * in the filtered view; changing the filter keeps the current item when it still passes.
 * Not thread-safe: UI thread only.
 */
final class WorkQueue {

    /** What to show. Empty strings and NaN mean "any". */
    record Filter(String objectClass, String machineGrade, double minDisagreementKmPerS, boolean undecidedOnly) {
        static final Filter ALL = new Filter("", "", Double.NaN, false);

        Predicate<QueueItem> predicate() {
            return it -> (objectClass.isEmpty() || objectClass.equals(it.objectClass()))
                    && (machineGrade.isEmpty() || machineGrade.equals(it.machineGrade()))
                    && (Double.isNaN(minDisagreementKmPerS) || it.disagreementKmPerS() >= minDisagreementKmPerS)
                    && (!undecidedOnly || it.decision() == null);
        }
    }

    private final List<QueueItem> all = new ArrayList<>();
    private final List<QueueItem> view = new ArrayList<>();
    private Filter filter = Filter.ALL;
    private int cursor = -1;

    void addAll(List<QueueItem> items) {
        all.addAll(items);
        refilter();
    }

    List<QueueItem> all() { return all; }
    List<QueueItem> view() { return view; }
    Filter filter() { return filter; }

    void filter(Filter f) {
        filter = f;
        refilter();
    }

    /** Re-applies the filter (after answers or decisions changed), keeping the current item if it passes. */
    void refilter() {
        QueueItem keep = current();
        view.clear();
        Predicate<QueueItem> p = filter.predicate();
        for (QueueItem it : all) {
            if (p.test(it)) {
                view.add(it);
            }
        }
        int at = keep == null ? -1 : view.indexOf(keep);
        cursor = at >= 0 ? at : (view.isEmpty() ? -1 : Math.min(Math.max(cursor, 0), view.size() - 1));
    }

    QueueItem current() {
        return cursor >= 0 && cursor < view.size() ? view.get(cursor) : null;
    }

    int cursor() { return cursor; }

    /** Moves the cursor by {@code step} (clamped); returns whether it moved. */
    boolean move(int step) {
        if (view.isEmpty()) {
            return false;
        }
        int to = Math.max(0, Math.min(view.size() - 1, cursor + step));
        boolean moved = to != cursor;
        cursor = to;
        return moved;
    }

    void moveTo(int position) {
        if (position >= 0 && position < view.size()) {
            cursor = position;
        }
    }

    /** Moves to the next item without a decision after the cursor; returns whether one was found. */
    boolean nextUndecided() {
        for (int i = cursor + 1; i < view.size(); i++) {
            if (view.get(i).decision() == null) {
                cursor = i;
                return true;
            }
        }
        return false;
    }

    int decidedCount() {
        int n = 0;
        for (QueueItem it : all) {
            if (it.decision() != null) {
                n++;
            }
        }
        return n;
    }
}
