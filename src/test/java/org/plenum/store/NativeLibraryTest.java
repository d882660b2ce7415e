package org.plenum.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NativeLibraryTest {
    private String savedPath;
    private String savedName;

    @BeforeEach
    void clearDriverSettings() {
        savedPath = System.clearProperty("org.sqlite.lib.path");
        savedName = System.clearProperty("org.sqlite.lib.name");
    }

    @AfterEach
    void restoreDriverSettings() {
        restore("org.sqlite.lib.path", savedPath);
        restore("org.sqlite.lib.name", savedName);
    }

    @Test
    void unpacksOnceAndRepairsATruncatedCopy(@TempDir Path cache) throws Exception {
        NativeLibrary.useCopyIn(cache);
        Path dir = Path.of(System.getProperty("org.sqlite.lib.path"));
        Path library = dir.resolve(System.getProperty("org.sqlite.lib.name"));
        assertTrue(dir.startsWith(cache), dir.toString());
        long size = Files.size(library);
        assertTrue(size > 100_000, "a whole shared library, not " + size + " bytes");

        FileTime old = FileTime.fromMillis(1_000_000_000_000L);
        Files.setLastModifiedTime(library, old);
        System.clearProperty("org.sqlite.lib.path");
        NativeLibrary.useCopyIn(cache);
        assertEquals(old, Files.getLastModifiedTime(library), "a complete copy is used as it is");

        Files.write(library, new byte[10]);
        System.clearProperty("org.sqlite.lib.path");
        NativeLibrary.useCopyIn(cache);
        assertEquals(size, Files.size(library), "a truncated copy is unpacked again");
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count(), "no partial file is left behind");
        }
    }

    @Test
    void keepsASettingTheUserMade(@TempDir Path cache) throws Exception {
        System.setProperty("org.sqlite.lib.path", "/somewhere/else");
        NativeLibrary.useCopyIn(cache);
        assertEquals("/somewhere/else", System.getProperty("org.sqlite.lib.path"));
        try (Stream<Path> files = Files.list(cache)) {
            assertEquals(0, files.count());
        }
    }

    private static void restore(String key, String value) {
        if (value == null) {
            System.clearProperty(key);
        } else {
            System.setProperty(key, value);
        }
    }
}
