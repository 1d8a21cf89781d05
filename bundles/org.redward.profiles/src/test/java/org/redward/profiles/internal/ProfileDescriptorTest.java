package org.redward.profiles.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

class ProfileDescriptorTest {

    static ProfileDescriptor parse(String text) throws Exception {
        return ProfileDescriptor.parse("test.properties", new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void readsKeysRegionsAndReader() throws Exception {
        ProfileDescriptor d = parse("# an invented instrument\nid = lantern-fibres\ndescription = one spectrum per row\n"
                + "reader = FITS\nmatch.INSTRUME = LANTERN*\nmask.regions = 5574.9-5582.9, 6298.0 - 6306.0\n");
        assertEquals("lantern-fibres", d.id());
        assertEquals("fits", d.reader());
        assertEquals("LANTERN*", d.setting("match.INSTRUME").get());
        assertEquals(2, d.maskedRegionsVacuumAngstrom().size());
        assertArrayEquals(new double[] {6298.0, 6306.0}, d.maskedRegionsVacuumAngstrom().get(1), 0);
    }

    @Test
    void badDescriptorsNameTheKey() {
        IllegalArgumentException a = assertThrows(IllegalArgumentException.class, () -> parse("description = no id\n"));
        assertTrue(a.getMessage().contains("test.properties: key 'id'"), a.getMessage());
        IllegalArgumentException b = assertThrows(IllegalArgumentException.class, () -> parse("id = x\nmask.regions = 6000-5000\n"));
        assertTrue(b.getMessage().contains("key 'mask.regions': '6000-5000'"), b.getMessage());
    }
}
