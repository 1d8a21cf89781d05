package org.redward.formats.inputs.internal;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.redward.api.formats.InstrumentProfile;
import org.redward.api.formats.ProfileRegistry;
import org.redward.api.formats.ReaderRegistry;
import org.redward.api.formats.SpectrumReader;
import org.redward.api.registry.Provided;
import org.redward.profiles.internal.ProfileDescriptor;

/** Fixed registries for plain JUnit tests (no framework). */
final class Registries {

    private Registries() {
    }

    static ReaderRegistry readers(Map<String, SpectrumReader> readers) {
        List<Provided<SpectrumReader>> list = new ArrayList<>();
        readers.forEach((id, r) -> list.add(Provided.of(id, r, "test", "0", "", Map.of())));
        list.sort(java.util.Comparator.comparing(Provided::id));
        return new ReaderRegistry() {
            @Override
            public String family() {
                return FAMILY;
            }

            @Override
            public List<Provided<SpectrumReader>> providers() {
                return list;
            }
        };
    }

    /** The profiles shipped in the survey profile bundle, read from the source tree. */
    static ProfileRegistry surveyProfiles() throws Exception {
        List<Provided<InstrumentProfile>> list = new ArrayList<>();
        Path dir = Path.of("..", "org.redward.profiles.survey", "src", "main", "resources", "profiles");
        try (var files = Files.list(dir)) {
            for (Path p : (Iterable<Path>) files.sorted()::iterator) {
                try (InputStream in = Files.newInputStream(p)) {
                    ProfileDescriptor d = ProfileDescriptor.parse(p.toString(), in);
                    list.add(Provided.of(d.id(), d, "org.redward.profiles.survey", "0", d.description(), Map.of()));
                }
            }
        }
        return new ProfileRegistry() {
            @Override
            public String family() {
                return FAMILY;
            }

            @Override
            public List<Provided<InstrumentProfile>> providers() {
                return list;
            }
        };
    }
}
