package org.redward.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;

class OptionsTest {

    @Test
    void globalOptionsAreTakenOutAnywhere() {
        Path cwd = Path.of("/tmp/w");
        Options o = Options.parse(new String[] {"measure", "--bundles", "drop", "a.fits", "--debug", "--bundles=/x"}, cwd);
        assertEquals(List.of(Path.of("/tmp/w/drop"), Path.of("/x")), o.dropInFolders);
        assertEquals(List.of("measure", "a.fits"), o.commandLine);
        assertTrue(o.debug);
        assertEquals("measure", o.commandWord());
    }

    @Test
    void bundlesWithoutFolderIsAnError() {
        assertThrows(IllegalArgumentException.class, () -> Options.parse(new String[] {"plugins", "--bundles"}, Path.of("/")));
    }

    @Test
    void everythingAfterDoubleDashIsKept() {
        Options o = Options.parse(new String[] {"info", "--", "--debug"}, Path.of("/"));
        assertEquals(List.of("info", "--", "--debug"), o.commandLine);
    }
}
