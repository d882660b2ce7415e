package org.plenum.app;

import java.io.Writer;
import java.nio.file.Path;
import org.plenum.core.Period;
import org.plenum.core.ValueException;
import org.plenum.io.LedgerCsv;
import org.plenum.store.Ledger;
import org.plenum.store.Workspace;

/** Exports the decision ledger, all of it or one cycle's. */
public final class ExportLedger {
    private ExportLedger() {}

    /** @return the number of decisions written */
    public static int run(Workspaces workspaces, Path db, String cycle, Writer out) {
        try (Workspace ws = workspaces.open(db)) {
            Period c = cycle == null ? null : parseCycle(cycle, ws);
            var decisions = new Ledger(ws).entries(c);
            LedgerCsv.write(decisions, out);
            return decisions.size();
        }
    }

    private static Period parseCycle(String text, Workspace ws) {
        try {
            return Period.parse(text, ws.frequency());
        } catch (ValueException e) {
            throw new org.plenum.core.BadInputException("--cycle: expected " + e.expected() + ", found \"" + text + "\"");
        }
    }
}
