package org.redward.mock.internal;

import java.util.List;

import org.redward.api.redshift.Alternative;
import org.redward.spectrum.ObjectClass;
import org.redward.spectrum.SpectrumMetadata;

/**
 * One measured fibre of the demo: where it came from, the estimator's answer, the frame-corrected
 * redshifts and distances (NaN until those steps run), and the truth it is scored against.
 */
final class Row {
    final String file;
    final int index;
    final String objectId;
    final TruthRow truth;
    final SpectrumMetadata metadata;
    boolean measured;
    String error = "";
    double z = Double.NaN;
    double zErr = Double.NaN;
    ObjectClass objectClass = ObjectClass.UNKNOWN;
    String grade = "";
    double reliability = Double.NaN;
    List<String> warnings = List.of();
    List<Alternative> alternatives = List.of();
    String estimator = "";
    double zBary = Double.NaN;
    double zCmb = Double.NaN;
    String frameNotes = "";
    double comovingMpc = Double.NaN;
    double luminosityMpc = Double.NaN;
    double angularDiameterMpc = Double.NaN;
    double distanceModulusMag = Double.NaN;
    double lookbackGyr = Double.NaN;
    double hubbleLawMpc = Double.NaN;

    Row(String file, int index, String objectId, TruthRow truth, SpectrumMetadata metadata) {
        this.file = file;
        this.index = index;
        this.objectId = objectId;
        this.truth = truth;
        this.metadata = metadata;
    }

    Scorecard.Outcome outcome() {
        return new Scorecard.Outcome(truth, measured, z, objectClass, grade, reliability);
    }
}
