package org.plenum.store;

import java.sql.PreparedStatement;
import org.plenum.core.ScoredChange;
import java.sql.ResultSet;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** What the decision lens reads: scored changes, and the minutes people spent. */
public final class LensReads {
    private final Workspace workspace;

    public LensReads(Workspace workspace) {
        this.workspace = workspace;
    }

    /** Standing ledger decisions (of any step) whose target period has an actual, oldest first. */
    public List<ScoredChange> decisions() {
        return workspace.read(c -> {
            List<ScoredChange> out = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT d.item_id, d.cycle, d.period, d.prior, d.quantity,"
                    + " d.kept, d.author, d.tag, d.reason, d.minutes, a.quantity, s.name FROM decisions d"
                    + " JOIN steps s ON s.id = d.step_id JOIN actuals a ON a.item_id = d.item_id AND a.period = d.period"
                    + " WHERE NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes = d.id) ORDER BY d.id");
                    ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    long minutes = rs.getLong(10);
                    Long minutesOrNull = rs.wasNull() ? null : minutes;
                    out.add(new ScoredChange(rs.getString(12), rs.getInt(1), rs.getInt(2), rs.getInt(3), rs.getLong(4),
                            rs.getLong(5), rs.getLong(11), rs.getInt(6) == 1, rs.getString(7), rs.getString(8),
                            rs.getString(9), minutesOrNull));
                }
            }
            return out;
        });
    }

    /**
     * For each imported step after the ledger step: its values that differ from the step before
     * it (the standing decision, or the step before that where nobody decided), with an actual.
     */
    public List<ScoredChange> importedChanges() {
        Catalog catalog = workspace.catalog();
        Step ledger = catalog.step(catalog.ledgerStep()).orElseThrow();
        Step beforeLedger = catalog.previous(ledger).orElseThrow();
        List<ScoredChange> out = new ArrayList<>();
        for (Step step : catalog.steps()) {
            if (catalog.previous(step).filter(p -> p.id() == ledger.id()).isPresent()) {
                out.addAll(changesAfterLedger(step, ledger, beforeLedger));
            }
        }
        return out;
    }

    private List<ScoredChange> changesAfterLedger(Step step, Step ledger, Step beforeLedger) {
        return workspace.read(c -> {
            List<ScoredChange> out = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT f.item_id, f.cycle, f.period, f.quantity,"
                    + " coalesce((SELECT d.quantity FROM decisions d WHERE d.item_id = f.item_id AND d.cycle = f.cycle"
                    + " AND d.period = f.period AND d.step_id = ? ORDER BY d.id DESC LIMIT 1), p.quantity), a.quantity"
                    + " FROM forecasts f JOIN forecasts p ON p.item_id = f.item_id AND p.cycle = f.cycle"
                    + " AND p.period = f.period AND p.step_id = ? JOIN actuals a ON a.item_id = f.item_id"
                    + " AND a.period = f.period WHERE f.step_id = ? ORDER BY f.item_id, f.cycle, f.period")) {
                ps.setInt(1, ledger.id());
                ps.setInt(2, beforeLedger.id());
                ps.setInt(3, step.id());
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        long prior = rs.getLong(5);
                        long quantity = rs.getLong(4);
                        if (prior != quantity) {
                            out.add(new ScoredChange(step.name(), rs.getInt(1), rs.getInt(2), rs.getInt(3), prior,
                                    quantity, rs.getLong(6), false, null, null, null, null));
                        }
                    }
                }
            }
            return out;
        });
    }

    /** Minutes recorded per cycle, over every decision including superseded ones: time spent is spent. */
    public Map<Integer, Long> minutesByCycle() {
        return workspace.read(c -> {
            Map<Integer, Long> out = new LinkedHashMap<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT cycle, sum(minutes) FROM decisions"
                    + " WHERE minutes IS NOT NULL GROUP BY cycle ORDER BY cycle"); ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.put(rs.getInt(1), rs.getLong(2));
                }
            }
            return out;
        });
    }
}
