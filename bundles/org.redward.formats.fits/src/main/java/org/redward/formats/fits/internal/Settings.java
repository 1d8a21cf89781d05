package org.redward.formats.fits.internal;

import java.util.Optional;

import org.redward.api.formats.InstrumentProfile;

/** The instrument profile's settings as the FITS reader uses them (empty without a profile). */
final class Settings {

    static final Settings NONE = new Settings(null);

    private final InstrumentProfile profile;

    Settings(InstrumentProfile profile) {
        this.profile = profile;
    }

    Optional<InstrumentProfile> profile() {
        return Optional.ofNullable(profile);
    }

    Optional<String> get(String key) {
        return profile == null ? Optional.empty() : profile.setting(key);
    }

    Optional<Integer> integer(String key) {
        Optional<String> v = get(key);
        if (v.isEmpty()) {
            return Optional.empty();
        }
        try {
            return Optional.of(Integer.parseInt(v.get()));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("profile '" + profile.id() + "': setting " + key + " = '" + v.get()
                    + "' is not a whole number");
        }
    }
}
