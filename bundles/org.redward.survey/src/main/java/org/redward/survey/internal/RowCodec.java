package org.redward.survey.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.json.JSONArray;
import org.json.JSONObject;
import org.redward.api.commands.Json;
import org.redward.api.redshift.Alternative;
import org.redward.api.lines.LineKind;
import org.redward.api.survey.MeasuredLine;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.ObjectClass;

/**
 * A row as one line of JSON: the {@code measure --json} output and the journal share it. Keys
 * begin with the contract ({@code source, index, id, status, error, z, z_err, class, grade,
 * estimator, alternatives}) and go on with the rest; derived quantities follow at top level
 * under their column names; the measured lines, when there are any, under {@code lines} (a list of
 * objects keyed as the columns of the catalogue's lines table). Non-finite numbers are written as null and read back as NaN, and
 * doubles are written in their shortest round-trip form, so a row read back equals the row
 * written.
 */
final class RowCodec {

    private static final Set<String> FIXED = Set.of("source", "index", "id", "status", "error", "z", "z_err", "class",
            "grade", "estimator", "alternatives", "subclass", "reliability", "ra_deg", "dec_deg", "location",
            "warnings", "seconds", "fault", "fault_bundle", "sequence", "lines");

    private RowCodec() {
    }

    static Json toJson(MeasuredRow r) {
        List<Object> alts = new ArrayList<>();
        for (Alternative a : r.alternatives()) {
            alts.add(Json.object().put("z", a.z()).put("score", a.score()).put("z_err", a.zError())
                    .put("delta_score", a.deltaScore()).put("class", a.objectClass().key()).put("subclass", a.subclass()));
        }
        Json j = Json.object().put("source", r.source()).put("index", r.index()).put("id", r.id())
                .put("status", r.status()).put("error", r.error()).put("z", r.z()).put("z_err", r.zErr())
                .put("class", r.objectClass()).put("grade", r.grade()).put("estimator", r.estimator())
                .put("alternatives", alts).put("subclass", r.subclass()).put("reliability", r.reliability())
                .put("ra_deg", r.raDeg()).put("dec_deg", r.decDeg()).put("location", r.location())
                .put("warnings", r.warnings()).put("seconds", r.seconds()).put("fault", r.fault())
                .put("fault_bundle", r.faultBundle()).put("sequence", r.sequence());
        r.derived().forEach(j::put);
        if (!r.lines().isEmpty()) {
            List<Object> lines = new ArrayList<>(r.lines().size());
            for (MeasuredLine l : r.lines()) {
                lines.add(Json.object().put("line", l.name()).put("rest_wavelength_angstrom", l.restAngstrom())
                        .put("kind", l.kind().key()).put("observed_wavelength_angstrom", l.observedAngstrom())
                        .put("observed_wavelength_err_angstrom", l.observedErrorAngstrom())
                        .put("velocity_offset_km_s", l.offsetKmPerS()).put("flux", l.flux()).put("flux_err", l.fluxError())
                        .put("flux_unit", l.fluxUnit()).put("ew_rest_angstrom", l.restEquivalentWidthAngstrom())
                        .put("ew_rest_err_angstrom", l.restEquivalentWidthErrorAngstrom()).put("fwhm_km_s", l.fwhmKmPerS())
                        .put("fwhm_err_km_s", l.fwhmErrorKmPerS()).put("snr", l.snr()).put("blended", l.blended()));
            }
            j.put("lines", lines);
        }
        return j;
    }

    /** Parses a line written by {@link #toJson}; throws {@link org.json.JSONException} if malformed. */
    static MeasuredRow parse(JSONObject o) {
        MeasuredRow.Builder b = MeasuredRow.builder().sequence(o.getLong("sequence"))
                .source(o.getString("source"), o.getInt("index"), o.optString("location", ""))
                .id(o.getString("id"))
                .z(num(o, "z"), num(o, "z_err"))
                .objectClass(o.optString("class", "unknown"), o.optString("subclass", ""))
                .grade(o.optString("grade", ""), num(o, "reliability"))
                .estimator(o.optString("estimator", ""))
                .sky(num(o, "ra_deg"), num(o, "dec_deg"))
                .seconds(num(o, "seconds"))
                .fault(o.optString("fault", ""), o.optString("fault_bundle", ""));
        if (MeasuredRow.OK.equals(o.getString("status"))) {
            b.ok();
        } else {
            b.failed(o.optString("error", ""));
        }
        JSONArray alts = o.optJSONArray("alternatives");
        if (alts != null) {
            List<Alternative> list = new ArrayList<>();
            for (int i = 0; i < alts.length(); i++) {
                JSONObject a = alts.getJSONObject(i);
                list.add(new Alternative(num(a, "z"), num(a, "z_err"), num(a, "score"), num(a, "delta_score"),
                        ObjectClass.parse(a.optString("class", "unknown")), a.optString("subclass", "")));
            }
            b.alternatives(list);
        }
        JSONArray w = o.optJSONArray("warnings");
        if (w != null) {
            for (int i = 0; i < w.length(); i++) {
                b.warning(w.getString(i));
            }
        }
        JSONArray lines = o.optJSONArray("lines");
        if (lines != null) {
            List<MeasuredLine> list = new ArrayList<>(lines.length());
            for (int i = 0; i < lines.length(); i++) {
                JSONObject l = lines.getJSONObject(i);
                list.add(new MeasuredLine(l.optString("line", ""), num(l, "rest_wavelength_angstrom"), LineKind.parse(l.getString("kind")),
                        num(l, "observed_wavelength_angstrom"), num(l, "observed_wavelength_err_angstrom"), num(l, "velocity_offset_km_s"),
                        num(l, "flux"), num(l, "flux_err"), l.optString("flux_unit", ""), num(l, "ew_rest_angstrom"),
                        num(l, "ew_rest_err_angstrom"), num(l, "fwhm_km_s"), num(l, "fwhm_err_km_s"), num(l, "snr"),
                        l.optBoolean("blended", false)));
            }
            b.lines(list);
        }
        for (String key : o.keySet()) {
            if (!FIXED.contains(key)) {
                b.derived(key, num(o, key));
            }
        }
        return b.build();
    }

    private static double num(JSONObject o, String key) {
        if (!o.has(key) || o.isNull(key)) {
            return Double.NaN;
        }
        return o.getDouble(key);
    }
}
