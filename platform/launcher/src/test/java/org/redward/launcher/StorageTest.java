package org.redward.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Where the framework storage of a run goes, and what happens when that place refuses it. */
class StorageTest {

    @TempDir
    Path tmp;

    @AfterEach
    void clear() {
        System.clearProperty("redward.storage.dir");
    }

    @Test
    void aConfiguredFolderIsUsed() throws IOException {
        System.setProperty("redward.storage.dir", tmp.toString());
        Path storage = Main.createStorage();
        assertEquals(tmp, storage.getParent());
        assertTrue(Files.isDirectory(storage));
    }

    @Test
    void aConfiguredFolderThatRefusesIsNamedInTheError() throws IOException {
        Path notAFolder = Files.writeString(tmp.resolve("plain-file"), "x");
        System.setProperty("redward.storage.dir", notAFolder.toString());
        IOException e = assertThrows(IOException.class, Main::createStorage);
        assertTrue(e.getMessage().contains(notAFolder.toString()), e.getMessage());
    }

    @Test
    void withoutSettingTheStorageGoesWhereThereIsRoom() throws IOException {
        Path parent = Main.storageParent();
        assertTrue(Files.isDirectory(parent) && Files.isWritable(parent), parent.toString());
        assertTrue(parent.equals(Path.of(System.getProperty("java.io.tmpdir")))
                || Files.getFileStore(parent).getUsableSpace() >= Main.STORAGE_ROOM_BYTES, parent.toString());
    }
}
