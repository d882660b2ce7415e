package org.plenum.app;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import org.plenum.core.BadInputException;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.PastDecisionsCsv;
import org.plenum.io.PastDecisionsCsv.PastDecision;
import org.plenum.io.Progress;
import org.plenum.store.Catalog;
import org.plenum.store.DecisionDraft;
import org.plenum.store.Ledger;
import org.plenum.store.Summary;
import org.plenum.store.Workspace;

/**
 * Builds the demo workspace from the invented scenario in {@code demo-data/}. Idempotent: a
 * workspace built from the same files is kept as it is; otherwise it is built afresh beside the
 * old one and moved into place, so nobody ever opens a half-built demo.
 */
public final class Demo {
    static final List<String> FILES = List.of("items.csv", "actuals.csv", "forecasts.csv", "events.csv",
            "decisions.csv");

    private Demo() {}

    /** The demo workspace, and whether this call built it. */
    public record Built(Path db, boolean rebuilt, Summary summary) {}

    public static Built build(Workspaces workspaces, Path dataDir, Path db) {
        String fingerprint = fingerprint(dataDir);
        if (Files.exists(db)) {
            try (Workspace ws = workspaces.open(db)) {
                if (ws.demoFingerprint().equals(fingerprint)) {
                    return new Built(db, false, ws.summary());
                }
            }
        }
        Path building = db.resolveSibling(db.getFileName() + ".building");
        deleteWithCompanions(building);
        try (Workspace ws = workspaces.create(building, Workspaces.DEFAULT_STEPS, Workspaces.DEFAULT_LEDGER_STEP)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, dataDir.resolve("items.csv"), false);
            importer.importFile(ImportKind.ACTUALS, dataDir.resolve("actuals.csv"), false);
            importer.importFile(ImportKind.FORECASTS, dataDir.resolve("forecasts.csv"), false);
            importer.importFile(ImportKind.EVENTS, dataDir.resolve("events.csv"), false);
            appendPastDecisions(ws, dataDir.resolve("decisions.csv"));
            ws.setDemoFingerprint(fingerprint);
        }
        deleteWithCompanions(db);
        move(building, db);
        try (Workspace ws = workspaces.open(db)) {
            return new Built(db, true, ws.summary());
        }
    }

    /** Writes the scenario's files afresh; the generator's fixed seed makes them identical each time. */
    public static void regenerate(Path dataDir) {
        try {
            org.plenum.demo.DemoScenario.writeTo(dataDir);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Past decisions go in through the ledger like any other, one batch per item, cycle and author. */
    private static void appendPastDecisions(Workspace ws, Path file) {
        Catalog catalog = ws.catalog();
        List<PastDecision> past = PastDecisionsCsv.read(file, catalog.frequency(), catalog.items().keySet(),
                catalog.tags());
        Map<String, List<DecisionDraft>> batches = new LinkedHashMap<>();
        Map<String, SortedMap<Period, Quantity>> stat = new LinkedHashMap<>();
        String first = catalog.steps().get(0).name();
        for (PastDecision d : past) {
            SortedMap<Period, Quantity> priors = stat.computeIfAbsent(d.item() + "|" + d.cycle(),
                    k -> ws.stepValues(d.item(), first, d.cycle()));
            Quantity prior = priors.get(d.period());
            if (prior == null) {
                throw new BadInputException(file + ":" + d.line() + ":2: expected a cycle and period with a " + first
                        + " forecast for " + d.item() + ", found none");
            }
            batches.computeIfAbsent(d.item() + "|" + d.cycle() + "|" + d.author() + "|" + d.recordedAt(),
                    k -> new ArrayList<>()).add(new DecisionDraft(d.item(), d.cycle(), d.period(),
                    catalog.ledgerStep(), prior, d.quantity() == null ? prior : d.quantity(), d.quantity() == null,
                    d.reason(), d.tag(), d.author(), d.minutes(), d.recordedAt(), null));
        }
        Ledger ledger = new Ledger(ws);
        batches.values().forEach(ledger::append);
    }

    /** SHA-256 over the scenario files and the schema they were loaded with. */
    static String fingerprint(Path dataDir) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(("plenum-demo-v1").getBytes(java.nio.charset.StandardCharsets.UTF_8));
            for (String f : FILES) {
                Path p = dataDir.resolve(f);
                if (!Files.isRegularFile(p)) {
                    throw new UsageException("the demo scenario is incomplete: " + p + " is missing");
                }
                sha.update(f.getBytes(java.nio.charset.StandardCharsets.UTF_8));
                sha.update(Files.readAllBytes(p));
            }
            return HexFormat.of().formatHex(sha.digest());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void deleteWithCompanions(Path db) {
        try {
            for (String suffix : List.of("", "-wal", "-shm", "-journal")) {
                Files.deleteIfExists(db.resolveSibling(db.getFileName() + suffix));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void move(Path from, Path to) {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
