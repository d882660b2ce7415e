package org.plenum.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;

/**
 * Forward-only schema migrations, one SQL resource per version, applied in order when a workspace
 * opens. A database newer than this program is refused rather than guessed at.
 */
final class Migrations {
    static final List<String> SCRIPTS = List.of("V1__workspace.sql", "V2__meetings.sql",
            "V3__meeting_agenda.sql");

    private Migrations() {}

    static int latest() {
        return SCRIPTS.size();
    }

    /** Applies every script after {@code from}; the caller holds the write transaction. */
    static void apply(Connection c, int from) throws SQLException {
        for (int v = from + 1; v <= latest(); v++) {
            try (Statement st = c.createStatement()) {
                for (String sql : statements(read(SCRIPTS.get(v - 1)))) {
                    st.execute(sql);
                }
            }
            Meta.put(c, Meta.SCHEMA_VERSION, Integer.toString(v));
        }
    }

    private static String read(String name) {
        try (InputStream in = Migrations.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new StoreException("migration script missing from the build: " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Splits a script at semicolons that end a line, keeping trigger bodies whole. */
    static List<String> statements(String script) {
        StringBuilder current = new StringBuilder();
        java.util.ArrayList<String> out = new java.util.ArrayList<>();
        boolean inTrigger = false;
        for (String line : script.split("\n")) {
            String trimmed = line.strip();
            if (trimmed.startsWith("--") || trimmed.isEmpty()) {
                continue;
            }
            current.append(line).append('\n');
            if (trimmed.startsWith("CREATE TRIGGER")) {
                inTrigger = true;
            }
            boolean ends = inTrigger ? trimmed.equals("END;") : trimmed.endsWith(";");
            if (ends) {
                out.add(current.toString());
                current.setLength(0);
                inTrigger = false;
            }
        }
        return out;
    }
}
