package org.redward.formats.fits.internal;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.redward.api.formats.InstrumentProfile;
import org.redward.profiles.internal.ProfileDescriptor;

/** Loads the profile descriptors shipped in the survey profile bundle (from the source tree). */
final class SurveyProfiles {

    private SurveyProfiles() {
    }

    static InstrumentProfile load(String id) throws Exception {
        Path dir = Path.of("..", "org.redward.profiles.survey", "src", "main", "resources", "profiles");
        Path p = dir.resolve(id + ".properties");
        try (InputStream in = Files.newInputStream(p)) {
            return ProfileDescriptor.parse(p.toString(), in);
        }
    }
}
