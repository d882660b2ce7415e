package org.plenum.store;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.net.URLConnection;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.sqlite.SQLiteJDBCLoader;
import org.sqlite.util.OSInfo;

/**
 * sqlite-jdbc's native library, unpacked once per user and driver version. Left to itself the
 * driver unpacks its library into a fresh temporary file at every start, which is about a tenth
 * of a second of every command and of every planner joining a meeting.
 */
public final class NativeLibrary {
    private NativeLibrary() {}

    /**
     * Points the driver at a copy of its library under {@code cacheDir}, unpacking it there first
     * when no complete copy exists. Does nothing when the driver is already configured, or when
     * this platform's library is not in the driver's jar; any failure leaves the driver's own
     * behaviour in place.
     */
    public static void useCopyIn(Path cacheDir) {
        if (System.getProperty("org.sqlite.lib.path") != null) {
            return;
        }
        String folder = OSInfo.getNativeLibFolderPathForCurrentOS();
        String name = System.mapLibraryName("sqlitejdbc");
        URL resource = SQLiteJDBCLoader.class.getResource("/org/sqlite/native/" + folder + "/" + name);
        if (resource == null) {
            return;
        }
        try {
            URLConnection connection = resource.openConnection();
            long size = connection.getContentLengthLong();
            Path dir = cacheDir.resolve("sqlite-jdbc-" + SQLiteJDBCLoader.getVersion() + "-" + folder.replace('/', '-'));
            Path library = dir.resolve(name);
            if (size < 0 || !Files.isRegularFile(library) || Files.size(library) != size) {
                unpack(connection, dir, library);
            }
            System.setProperty("org.sqlite.lib.path", dir.toString());
            System.setProperty("org.sqlite.lib.name", name);
        } catch (IOException | RuntimeException e) {
            // keep the driver's default: it unpacks into its temporary directory, as without this
        }
    }

    /** Written beside its final name and moved into place, so a reader never sees half a file. */
    private static void unpack(URLConnection connection, Path dir, Path library) throws IOException {
        Files.createDirectories(dir);
        Path part = Files.createTempFile(dir, library.getFileName().toString(), ".part");
        try (InputStream in = connection.getInputStream()) {
            Files.copy(in, part, StandardCopyOption.REPLACE_EXISTING);
            Files.move(part, library, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(part);
        }
    }
}
