package org.plenum.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.Period;
import org.plenum.core.Series;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.testing.TestWorkspace;

/** The packed reads give back exactly what a plain row-by-row SELECT gives. */
class ScoreReadsTest {

    @Test
    void itemsWithAndWithoutGapsReadBackAsStored(@TempDir Path dir) throws Exception {
        Path db = dir.resolve("w.db");
        StringBuilder items = new StringBuilder("item,description\n");
        StringBuilder actuals = new StringBuilder("item,period,quantity\n");
        StringBuilder forecasts = new StringBuilder("item,period,cycle,step,quantity\n");
        SplittableRandom random = new SplittableRandom(3);
        for (int i = 1; i <= 60; i++) {
            items.append("I").append(i).append(",item\n");
            for (int m = 0; m < 30; m++) {
                Period p = Period.month(2024, 1).plus(m);
                // every third item has holes; quantities include fractions and zeros
                if (i % 3 != 0 || random.nextInt(4) != 0) {
                    actuals.append("I").append(i).append(',').append(p).append(',')
                            .append(random.nextInt(5) == 0 ? "0" : random.nextInt(900) + "." + random.nextInt(10))
                            .append('\n');
                }
                if (i % 4 != 0 || m % 7 != 3) {
                    forecasts.append("I").append(i).append(',').append(p.plus(1)).append(',').append(p)
                            .append(",stat,").append(random.nextInt(1000)).append('\n');
                }
            }
        }
        try (Workspace ws = Workspace.create(db, List.of("stat", "meeting", "final"), "meeting", TestWorkspace.TIMEOUT)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, TestWorkspace.write(dir, "items.csv", items.toString()), false);
            importer.importFile(ImportKind.ACTUALS, TestWorkspace.write(dir, "actuals.csv", actuals.toString()), false);
            importer.importFile(ImportKind.FORECASTS, TestWorkspace.write(dir, "f.csv", forecasts.toString()), false);
            ScoreReads reads = new ScoreReads(ws);
            assertSame(plain(ws, "SELECT item_id, period, quantity FROM actuals ORDER BY item_id, period"),
                    reads.actuals());
            assertSame(plain(ws, "SELECT item_id, period, quantity FROM forecasts WHERE period - cycle = 1"
                    + " ORDER BY item_id, period"), reads.stepAtLag("stat", 1));
            assertEquals(0, reads.stepAtLag("stat", 0).size());
        }
    }

    private static Series plain(Workspace ws, String sql) {
        return ws.read(c -> {
            Series.Builder b = new Series.Builder();
            try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    b.add(rs.getInt(1), rs.getInt(2), rs.getLong(3));
                }
            }
            return b.build();
        });
    }

    private static void assertSame(Series expected, Series actual) {
        assertEquals(expected.size(), actual.size());
        int n = expected.size();
        assertArrayEquals(Arrays.copyOf(expected.items(), n), Arrays.copyOf(actual.items(), n));
        assertArrayEquals(Arrays.copyOf(expected.periods(), n), Arrays.copyOf(actual.periods(), n));
        assertArrayEquals(Arrays.copyOf(expected.quantities(), n), Arrays.copyOf(actual.quantities(), n));
    }
}
