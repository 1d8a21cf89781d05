package org.redward.spectrum;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;

/**
 * What is known about a spectrum besides its pixels. Unknown numbers are NaN, unknown strings
 * are empty {@link Optional}s.
 *
 * <p>Conventions: sky position ICRS degrees; time is the exposure mid-point as a UTC Modified
 * Julian Date; site longitude east-positive degrees, geodetic latitude degrees, height above the
 * WGS84 ellipsoid in metres. Immutable and thread-safe; build with {@link #builder()}.
 */
public final class SpectrumMetadata {

    /** Metadata with nothing known. */
    public static final SpectrumMetadata EMPTY = builder().build();

    private final String objectId;
    private final double raDeg;
    private final double decDeg;
    private final double midExposureMjdUtc;
    private final double exposureSeconds;
    private final double siteLongitudeDeg;
    private final double siteLatitudeDeg;
    private final double siteHeightMetres;
    private final String instrument;
    private final Map<String, String> extra;

    private SpectrumMetadata(Builder b) {
        this.objectId = b.objectId;
        this.raDeg = b.raDeg;
        this.decDeg = b.decDeg;
        this.midExposureMjdUtc = b.midExposureMjdUtc;
        this.exposureSeconds = b.exposureSeconds;
        this.siteLongitudeDeg = b.siteLongitudeDeg;
        this.siteLatitudeDeg = b.siteLatitudeDeg;
        this.siteHeightMetres = b.siteHeightMetres;
        this.instrument = b.instrument;
        this.extra = Collections.unmodifiableMap(new TreeMap<>(b.extra));
    }

    public static Builder builder() {
        return new Builder();
    }

    /** A builder pre-filled with this metadata. */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.objectId = objectId;
        b.raDeg = raDeg;
        b.decDeg = decDeg;
        b.midExposureMjdUtc = midExposureMjdUtc;
        b.exposureSeconds = exposureSeconds;
        b.siteLongitudeDeg = siteLongitudeDeg;
        b.siteLatitudeDeg = siteLatitudeDeg;
        b.siteHeightMetres = siteHeightMetres;
        b.instrument = instrument;
        b.extra.putAll(extra);
        return b;
    }

    public Optional<String> objectId() { return Optional.ofNullable(objectId); }
    public double raDeg() { return raDeg; }
    public double decDeg() { return decDeg; }
    public boolean hasSkyPosition() { return Double.isFinite(raDeg) && Double.isFinite(decDeg); }
    public double midExposureMjdUtc() { return midExposureMjdUtc; }
    public double exposureSeconds() { return exposureSeconds; }
    public double siteLongitudeDeg() { return siteLongitudeDeg; }
    public double siteLatitudeDeg() { return siteLatitudeDeg; }
    public double siteHeightMetres() { return siteHeightMetres; }
    public boolean hasSite() { return Double.isFinite(siteLongitudeDeg) && Double.isFinite(siteLatitudeDeg); }
    public Optional<String> instrument() { return Optional.ofNullable(instrument); }
    /** Further keyword/value pairs a reader chose to keep (sorted by key). */
    public Map<String, String> extra() { return extra; }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof SpectrumMetadata m)) {
            return false;
        }
        return Objects.equals(objectId, m.objectId) && Double.compare(raDeg, m.raDeg) == 0
                && Double.compare(decDeg, m.decDeg) == 0 && Double.compare(midExposureMjdUtc, m.midExposureMjdUtc) == 0
                && Double.compare(exposureSeconds, m.exposureSeconds) == 0
                && Double.compare(siteLongitudeDeg, m.siteLongitudeDeg) == 0
                && Double.compare(siteLatitudeDeg, m.siteLatitudeDeg) == 0
                && Double.compare(siteHeightMetres, m.siteHeightMetres) == 0
                && Objects.equals(instrument, m.instrument) && extra.equals(m.extra);
    }

    @Override
    public int hashCode() {
        return Objects.hash(objectId, raDeg, decDeg, midExposureMjdUtc, instrument);
    }

    @Override
    public String toString() {
        return "SpectrumMetadata[id=" + objectId + ", ra=" + raDeg + ", dec=" + decDeg + ", mjd=" + midExposureMjdUtc
                + ", instrument=" + instrument + ", extra=" + extra + "]";
    }

    /** Builder for {@link SpectrumMetadata}; not thread-safe. */
    public static final class Builder {
        private String objectId;
        private double raDeg = Double.NaN;
        private double decDeg = Double.NaN;
        private double midExposureMjdUtc = Double.NaN;
        private double exposureSeconds = Double.NaN;
        private double siteLongitudeDeg = Double.NaN;
        private double siteLatitudeDeg = Double.NaN;
        private double siteHeightMetres = Double.NaN;
        private String instrument;
        private final Map<String, String> extra = new TreeMap<>();

        private Builder() {
        }

        public Builder objectId(String v) { objectId = v; return this; }
        public Builder skyPosition(double raDegrees, double decDegrees) { raDeg = raDegrees; decDeg = decDegrees; return this; }
        public Builder midExposureMjdUtc(double v) { midExposureMjdUtc = v; return this; }
        public Builder exposureSeconds(double v) { exposureSeconds = v; return this; }
        public Builder site(double longitudeDegEast, double latitudeDeg, double heightMetres) {
            siteLongitudeDeg = longitudeDegEast;
            siteLatitudeDeg = latitudeDeg;
            siteHeightMetres = heightMetres;
            return this;
        }
        public Builder instrument(String v) { instrument = v; return this; }
        public Builder extra(String key, String value) { extra.put(key, value); return this; }

        public SpectrumMetadata build() {
            return new SpectrumMetadata(this);
        }
    }
}
