package org.redward.survey.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.redward.api.catalog.Column;
import org.redward.api.cosmology.Cosmology;
import org.redward.api.cosmology.Distances;
import org.redward.api.cosmology.DistanceUncertainty;
import org.redward.api.cosmology.Quantity;
import org.redward.api.frames.Frame;
import org.redward.api.frames.FrameCorrection;
import org.redward.api.frames.FrameCorrector;
import org.redward.api.frames.FrameRequest;
import org.redward.api.survey.MeasuredRow;
import org.redward.spectrum.Spectrum;

/**
 * Velocities and distances of a row, through the platform's frame and cosmology services:
 * {@code cz_km_s} = c z of the measured (topocentric) redshift; with a frame, the redshift and
 * cz in that frame (and a warning when the spectrum lacks the time, site or sky position the
 * correction needs); the comoving, luminosity and angular-diameter distances and the distance
 * modulus under the chosen cosmology, at the frame's redshift when there is one, each with its
 * 1-sigma uncertainty (from sigma_z, a peculiar-velocity dispersion of 300 km/s, common practice,
 * and the cosmology's parameter errors, in quadrature), and the Hubble-law distance cz/H0 for
 * comparison, with the cosmology service's warning where it misleads. Thread-safe.
 */
final class CosmoEnricher implements Enricher {

    static final double C_KM_PER_S = 299_792.458;

    private static final Quantity[] DISTANCES = {Quantity.COMOVING_MPC, Quantity.LUMINOSITY_MPC,
        Quantity.ANGULAR_DIAMETER_MPC, Quantity.DISTANCE_MODULUS_MAG};

    private final Cosmology cosmology;
    private final String cosmologyId;
    private final Optional<FrameCorrector> frames;
    private final Optional<Frame> frame;
    private final String frameKey;
    private final List<Column> columns = new ArrayList<>();

    CosmoEnricher(Cosmology cosmology, String cosmologyId, Optional<FrameCorrector> frames, Optional<Frame> frame, String frameKey) {
        this.cosmology = cosmology;
        this.cosmologyId = cosmologyId;
        this.frames = frames;
        this.frame = frame;
        this.frameKey = frameKey;
        columns.add(Column.ofDouble("cz_km_s", "km/s", "spect.dopplerVeloc.opt", "c z of the measured redshift (observed frame)"));
        if (frame.isPresent()) {
            columns.add(Column.ofDouble("z_" + frameKey, "", "src.redshift", "redshift corrected to the " + frame.get().key() + " frame"));
            columns.add(Column.ofDouble("cz_" + frameKey + "_km_s", "km/s", "spect.dopplerVeloc.opt", "c z in the " + frame.get().key() + " frame"));
        }
        String at = frame.isPresent() ? "at z_" + frameKey + ", " : "at z, ";
        for (Quantity q : DISTANCES) {
            String unit = q == Quantity.DISTANCE_MODULUS_MAG ? "mag" : "Mpc";
            String base = q.key().replace("_mpc", "").replace("_mag", "");
            String ucd = q == Quantity.DISTANCE_MODULUS_MAG ? "phot.mag.distMod" : "pos.distance";
            columns.add(Column.ofDouble(q.key(), unit, ucd, base.replace('_', ' ') + " " + at + cosmologyId));
            columns.add(Column.ofDouble(base + "_err_" + unit.toLowerCase(Locale.ROOT), unit, "stat.error;" + ucd,
                    "1-sigma error: sigma_z, 300 km/s peculiar velocity, parameter errors in quadrature"));
        }
        columns.add(Column.ofDouble("hubble_law_mpc", "Mpc", "pos.distance", "cz / H0 (the Hubble law), for comparison only"));
    }

    @Override
    public List<Column> columns() {
        return columns;
    }

    @Override
    public void enrich(Spectrum spectrum, double z, double zErr, MeasuredRow.Builder row) {
        row.derived("cz_km_s", C_KM_PER_S * z);
        double zUse = z;
        if (frame.isPresent()) {
            double zf = Double.NaN;
            if (frames.isPresent()) {
                FrameCorrection c = frames.get().correct(z, spectrum.metadata(), FrameRequest.of(Frame.TOPOCENTRIC, frame.get()));
                if (c.complete()) {
                    zf = c.z();
                } else {
                    row.warning("no " + frame.get().key() + " correction: " + String.join("; ", c.notes()));
                }
            } else {
                row.warning("no " + frame.get().key() + " correction: the frames service is not installed");
            }
            row.derived("z_" + frameKey, zf);
            row.derived("cz_" + frameKey + "_km_s", C_KM_PER_S * zf);
            if (Double.isFinite(zf)) {
                zUse = zf;
            } else {
                row.warning("distances use the uncorrected redshift");
            }
        }
        if (!(zUse > 0)) {
            for (Column c : columns.subList(frame.isPresent() ? 3 : 1, columns.size())) {
                row.derived(c.name(), Double.NaN);
            }
            row.warning("no distances: z <= 0 (a blueshift or a star; the Hubble flow does not apply)");
            return;
        }
        Distances d = cosmology.distances(zUse);
        double sigma = Double.isFinite(zErr) ? zErr : 0;
        for (Quantity q : DISTANCES) {
            String unit = q == Quantity.DISTANCE_MODULUS_MAG ? "mag" : "mpc";
            String base = q.key().replace("_mpc", "").replace("_mag", "");
            row.derived(q.key(), d.get(q));
            DistanceUncertainty u = cosmology.uncertainty(q, zUse, sigma, DistanceUncertainty.DEFAULT_PECULIAR_VELOCITY_KM_PER_S);
            row.derived(base + "_err_" + unit, u.total());
        }
        row.derived("hubble_law_mpc", d.hubbleLawMpc());
        for (String w : d.warnings()) {
            row.warning(w);
        }
    }
}
