package org.redward.survey.internal;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

import org.redward.api.formats.SpectrumRecord;
import org.redward.api.lines.DetectedLine;
import org.redward.api.lines.FinderSettings;
import org.redward.api.lines.IdentifySettings;
import org.redward.api.lines.LineFinder;
import org.redward.api.lines.LineIdentifier;
import org.redward.api.lines.LineList;
import org.redward.api.lines.LineMatch;
import org.redward.api.lines.LineSearch;
import org.redward.api.lines.RedshiftHypothesis;
import org.redward.api.registry.Provided;
import org.redward.api.survey.MeasuredLine;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/**
 * The line step through the line services, as {@code redward lines FILE --z Z} does it: the
 * finder with its default settings (plus the masked regions of the spectrum's instrument
 * profile), then the identifier with the line list at the row's catalogue z
 * ({@link IdentifySettings#withFixedZ}). Thread-safe; the services are obtained for each call.
 */
final class ServiceLineStep implements LineStep {

    private final Provided<LineFinder> finder;
    private final Provided<LineIdentifier> identifier;
    private final LineList list;
    private final Function<String, List<double[]>> profileMasks;
    private final Map<String, FinderSettings> settingsByProfile = new ConcurrentHashMap<>();

    /**
     * @param profileMasks the masked regions (observed vacuum Angstrom) of an instrument profile by
     *     id (empty list when none or unknown)
     */
    ServiceLineStep(Provided<LineFinder> finder, Provided<LineIdentifier> identifier, LineList list,
            Function<String, List<double[]>> profileMasks) {
        this.finder = finder;
        this.identifier = identifier;
        this.list = list;
        this.profileMasks = profileMasks;
    }

    @Override
    public MeasuredRow measure(SpectrumRecord record, Spectrum spectrum, MeasuredRow row) {
        String profile = record.profile() == null ? "" : record.profile();
        FinderSettings fs = settingsByProfile.computeIfAbsent(profile,
                p -> p.isEmpty() ? FinderSettings.defaults() : FinderSettings.defaults().withMaskedRegions(profileMasks.apply(p)));
        LineSearch search = finder.service().find(spectrum, fs);
        if (search.empty()) {
            return row;
        }
        double z = row.z();
        var id = identifier.service().identify(search.lines(), list, IdentifySettings.defaults().withFixedZ(z),
                spectrum.axis().minVacuumAngstrom(), spectrum.axis().maxVacuumAngstrom());
        RedshiftHypothesis best = id.best().orElse(null);
        String unit = lineFluxUnit(spectrum.fluxUnit());
        List<MeasuredLine> lines = new ArrayList<>(search.lines().size());
        for (int i = 0; i < search.lines().size(); i++) {
            lines.add(measured(search.lines().get(i), best == null ? null : best.matchOf(i), z, unit));
        }
        return row.toBuilder().lines(lines).build();
    }

    /** A detected line (and its identification at z, or null) as a catalogue line; see {@link MeasuredLine}. */
    static MeasuredLine measured(DetectedLine d, LineMatch m, double z, String fluxUnit) {
        double rest = m == null ? Double.NaN : m.restAngstrom();
        double offset = DetectedLine.C_KM_PER_S * (d.centreAngstrom() / rest - 1.0 - z) / (1.0 + z);
        return new MeasuredLine(m == null ? "" : m.label(), rest, d.kind(), d.centreAngstrom(), d.centreErrorAngstrom(),
                offset, d.flux(), d.fluxError(), fluxUnit, d.equivalentWidthAngstrom() / (1.0 + z),
                d.equivalentWidthErrorAngstrom() / (1.0 + z), d.fwhmKmPerS(), d.fwhmErrorKmPerS(), d.snr(), d.blended());
    }

    /**
     * The unit of a line flux (flux density integrated over Angstrom) from the spectrum's
     * flux-density unit: a trailing per-Angstrom is dropped ({@code 1e-17 erg/s/cm2/Angstrom}
     * gives {@code 1e-17 erg/s/cm2}); any other unit is followed by {@code .Angstrom} (VOUnit
     * product); empty stays empty.
     */
    static String lineFluxUnit(String fluxDensityUnit) {
        String u = fluxDensityUnit == null ? "" : fluxDensityUnit.trim();
        if (u.isEmpty()) {
            return "";
        }
        String lower = u.toLowerCase(Locale.ROOT);
        for (String per : new String[] {"/angstrom", "/ang", "/aa", "/a", "/\u00e5"}) {
            if (lower.endsWith(per)) {
                return u.substring(0, u.length() - per.length()).trim();
            }
        }
        return u + ".Angstrom";
    }

    @Override
    public String bundle() {
        return finder.bundleSymbolicName() + " " + finder.bundleVersion();
    }

    @Override
    public Map<String, String> provenance() {
        Map<String, String> p = new LinkedHashMap<>();
        p.put("lines.finder", finder.id() + " (" + bundle() + ")");
        p.put("lines.identifier", identifier.id() + " (" + identifier.bundleSymbolicName() + " " + identifier.bundleVersion() + ")");
        p.put("lines.list", list.id() + " " + list.version());
        p.put("lines.list.sha256", list.checksum());
        p.put("lines.parameters", String.format(Locale.ROOT, "snr_threshold=%g,identified_at=catalogue_z,tolerance_km_s=%g",
                FinderSettings.defaults().snrThreshold(), IdentifySettings.defaults().toleranceKmPerS()));
        return p;
    }
}
