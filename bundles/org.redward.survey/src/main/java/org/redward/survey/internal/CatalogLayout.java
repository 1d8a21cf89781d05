package org.redward.survey.internal;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.redward.api.catalog.Column;
import org.redward.api.commands.Json;
import org.redward.api.redshift.Alternative;
import org.redward.api.survey.MeasuredRow;

/**
 * The columns of the main catalogue table, in order: first the keys of {@code measure --json}
 * (the {@code alternatives} list as JSON text), then the runner-up solutions as numbers, the
 * sky position and the rest, then the derived columns (frame velocities, distances). Units are
 * IVOA VOUnits strings; UCDs are IVOA UCD1+ words where the vocabulary has one.
 */
final class CatalogLayout {

    private final List<Column> columns = new ArrayList<>();
    private final List<Column> derived;

    CatalogLayout(List<Column> derivedColumns) {
        this.derived = List.copyOf(derivedColumns);
        columns.add(Column.ofString("source", "meta.file", "file the spectrum came from"));
        columns.add(Column.ofInt("index", "meta.number", "0-based index in its file (-1: whole file failed)"));
        columns.add(Column.ofString("id", "meta.id;meta.main", "object id"));
        columns.add(Column.ofString("status", "meta.code.status", "ok or failed"));
        columns.add(Column.ofString("error", "meta.note", "why the spectrum failed (empty when ok)"));
        columns.add(Column.ofDouble("z", "", "src.redshift", "redshift (observed frame)"));
        columns.add(Column.ofDouble("z_err", "", "stat.error;src.redshift", "1-sigma error of z"));
        columns.add(Column.ofString("class", "src.class", "galaxy, quasar, star or unknown"));
        columns.add(Column.ofString("grade", "meta.code.qual", "confidence grade of the estimator"));
        columns.add(Column.ofString("estimator", "meta.id", "estimator id"));
        columns.add(Column.ofString("alternatives", "meta.note", "ranked solutions as JSON: list of {z, score}"));
        columns.add(Column.ofDouble("runner_up_z", "", "src.redshift", "redshift of the second-ranked solution"));
        columns.add(Column.ofDouble("runner_up_score", "", "stat.value", "estimator score of the second-ranked solution"));
        columns.add(Column.ofDouble("third_z", "", "src.redshift", "redshift of the third-ranked solution"));
        columns.add(Column.ofDouble("third_score", "", "stat.value", "estimator score of the third-ranked solution"));
        columns.add(Column.ofDouble("score", "", "stat.value", "estimator score of the adopted solution"));
        columns.add(Column.ofString("subclass", "src.class", "template or subclass of the adopted solution"));
        columns.add(Column.ofDouble("reliability", "", "stat.probability", "estimated probability that z is right"));
        columns.add(Column.ofDouble("ra_deg", "deg", "pos.eq.ra;meta.main", "right ascension (ICRS)"));
        columns.add(Column.ofDouble("dec_deg", "deg", "pos.eq.dec;meta.main", "declination (ICRS)"));
        columns.add(Column.ofString("location", "meta.ref", "where in the file (HDU, row)"));
        columns.add(Column.ofString("warnings", "meta.note", "things a user must know about this row, separated by ' | '"));
        columns.add(Column.ofString("fault", "meta.code.error", "what misbehaved: threw, timed_out, nonsense, reader (empty: nothing)"));
        columns.add(Column.ofString("fault_bundle", "meta.id", "the plug-in bundle at fault"));
        columns.add(new Column("seconds", Double.class, "s", "time.duration", "time the estimate took"));
        columns.add(Column.ofLong("sequence", "meta.number", "0-based position of the spectrum in the run"));
        columns.addAll(derived);
    }

    List<Column> columns() {
        return columns;
    }

    Object[] toCells(MeasuredRow r) {
        List<Alternative> a = r.alternatives();
        List<Object> alts = new ArrayList<>();
        for (Alternative x : a) {
            alts.add(Json.object().put("z", x.z()).put("score", x.score()));
        }
        Object[] c = new Object[columns.size()];
        int i = 0;
        c[i++] = r.source();
        c[i++] = r.index();
        c[i++] = r.id();
        c[i++] = r.status();
        c[i++] = r.error();
        c[i++] = r.z();
        c[i++] = r.zErr();
        c[i++] = r.objectClass();
        c[i++] = r.grade();
        c[i++] = r.estimator();
        c[i++] = Json.toJson(alts);
        c[i++] = a.size() > 1 ? a.get(1).z() : Double.NaN;
        c[i++] = a.size() > 1 ? a.get(1).score() : Double.NaN;
        c[i++] = a.size() > 2 ? a.get(2).z() : Double.NaN;
        c[i++] = a.size() > 2 ? a.get(2).score() : Double.NaN;
        c[i++] = a.isEmpty() ? Double.NaN : a.get(0).score();
        c[i++] = r.subclass();
        c[i++] = r.reliability();
        c[i++] = r.raDeg();
        c[i++] = r.decDeg();
        c[i++] = r.location();
        c[i++] = String.join(" | ", r.warnings());
        c[i++] = r.fault();
        c[i++] = r.faultBundle();
        c[i++] = r.seconds();
        c[i++] = r.sequence();
        for (Column d : derived) {
            c[i++] = r.derived(d.name());
        }
        return c;
    }

    Iterable<Object[]> cells(Iterable<MeasuredRow> rows) {
        return () -> {
            Iterator<MeasuredRow> it = rows.iterator();
            return new Iterator<>() {
                @Override
                public boolean hasNext() {
                    return it.hasNext();
                }

                @Override
                public Object[] next() {
                    return toCells(it.next());
                }
            };
        };
    }
}
