package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's first command on a fresh copy of the repository: {@code ./plenum demo --no-tui}
 * builds the jar itself, then builds the demo workspace; a second run finds it up to date.
 */
class DemoFromCleanCheckoutIT {
    @TempDir
    Path dir;

    @Test
    void buildsAndOpensTheDemoFromAFreshCopy() throws Exception {
        Path checkout = dir.resolve("plenum");
        copyTrackedFiles(Processes.root(), checkout);
        assertFalse(Files.exists(checkout.resolve("target")));

        Processes.Result first = Processes.run(checkout, List.of("./plenum", "demo", "--no-tui"), 600);
        assertEquals(0, first.code(), first.out() + first.err());
        assertTrue(first.err().contains("building target/plenum.jar"), first.err());
        assertTrue(first.out().contains("built "), first.out());
        assertTrue(first.out().matches("(?s).*items\\s+\\d{3} in \\d+ groups and 3 regions.*"), first.out());
        assertTrue(Files.isRegularFile(checkout.resolve("meetings/demo.db")));

        Processes.Result second = Processes.run(checkout, List.of("./plenum", "demo", "--no-tui"), 120);
        assertEquals(0, second.code(), second.err());
        assertTrue(second.out().startsWith("up to date: "), second.out());
        assertFalse(second.err().contains("building"), "the jar is fresh, no rebuild: " + second.err());
    }

    /** What git tracks, plus new files not ignored: what a clean clone of the change would hold. */
    private static void copyTrackedFiles(Path root, Path target) throws Exception {
        Processes.Result files = Processes.run(root, List.of("git", "ls-files", "-co", "--exclude-standard", "-z"), 60);
        assertEquals(0, files.code(), files.err());
        for (String name : files.out().split("\0")) {
            Path from = root.resolve(name);
            if (name.isEmpty() || !Files.isRegularFile(from)) {
                continue;
            }
            Path to = target.resolve(name);
            Files.createDirectories(to.getParent());
            Files.copy(from, to, java.nio.file.StandardCopyOption.COPY_ATTRIBUTES);
        }
    }
}
