package org.plenum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The layering of DESIGN §8, checked on the sources: a pure core, scoring and agenda without I/O,
 * dependencies pointing one way, and SQL only in the store.
 */
class ArchitectureTest {
    private static final Path MAIN = Path.of("src/main/java/org/plenum");

    /** What each package must not import. */
    private static final Map<String, List<String>> FORBIDDEN = Map.of(
            "core", List.of("org.plenum.store", "org.plenum.io", "org.plenum.app", "org.plenum.cli", "org.plenum.score",
                    "org.plenum.agenda", "org.plenum.demo", "java.io", "java.sql", "java.nio.file", "org.sqlite", "picocli",
                    "com.googlecode.lanterna"),
            "score", List.of("org.plenum.store", "org.plenum.io", "org.plenum.app", "org.plenum.cli", "org.plenum.demo",
                    "org.plenum.agenda", "java.io", "java.sql", "java.nio.file", "org.sqlite", "picocli",
                    "com.googlecode.lanterna"),
            // The agenda is pure like scoring: values in, values out; it may use core and score.
            "agenda", List.of("org.plenum.store", "org.plenum.io", "org.plenum.app", "org.plenum.cli", "org.plenum.demo",
                    "java.io", "java.sql", "java.nio.file", "org.sqlite", "picocli", "com.googlecode.lanterna"),
            "store", List.of("org.plenum.io", "org.plenum.app", "org.plenum.cli", "org.plenum.score", "org.plenum.agenda"),
            "io", List.of("org.plenum.app", "org.plenum.cli", "org.plenum.score", "org.plenum.agenda", "java.sql"),
            "app", List.of("org.plenum.cli", "org.plenum.tui", "java.sql"),
            // Screens compose and display what app returns: no SQL, no store, no files.
            "tui", List.of("org.plenum.store", "org.plenum.io", "org.plenum.cli", "org.plenum.demo", "java.sql",
                    "java.nio.file", "org.sqlite", "picocli"));

    @ParameterizedTest
    @ValueSource(strings = {"core", "score", "agenda", "store", "io", "app", "tui"})
    void importsOnlyWhatItsLayerMay(String pkg) throws IOException {
        List<String> violations = new ArrayList<>();
        for (Path file : sources(MAIN.resolve(pkg))) {
            for (String line : Files.readAllLines(file)) {
                if (line.startsWith("import ")) {
                    FORBIDDEN.get(pkg).stream().filter(f -> line.startsWith("import " + f + ".")
                            || line.startsWith("import static " + f + ".")).forEach(f -> violations.add(file + ": " + line));
                }
            }
        }
        assertEquals(List.of(), violations);
    }

    @ParameterizedTest
    @ValueSource(strings = {"core", "score", "agenda", "io", "app", "cli", "demo", "tui"})
    void speaksNoSqlOutsideTheStore(String pkg) throws IOException {
        List<String> violations = new ArrayList<>();
        for (Path file : sources(MAIN.resolve(pkg))) {
            String text = Files.readString(file);
            for (String keyword : List.of("SELECT ", "INSERT INTO", "CREATE TABLE", "PRAGMA ")) {
                if (text.contains(keyword)) {
                    violations.add(file + " contains " + keyword.strip());
                }
            }
        }
        assertEquals(List.of(), violations);
    }

    private static List<Path> sources(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> files = Files.walk(dir)) {
            return files.filter(f -> f.toString().endsWith(".java")).toList();
        }
    }
}
