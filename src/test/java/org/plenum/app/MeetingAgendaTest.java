package org.plenum.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.agenda.AgendaRow;
import org.plenum.agenda.AgendaSettings;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.MeetingAgendas;
import org.plenum.store.Workspace;

/**
 * The agenda kept with a meeting reads back exactly as it was ranked (every number, to the last
 * bit of each double), later screens get that same agenda, and data imported during the meeting
 * do not reorder it.
 */
class MeetingAgendaTest {
    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-01-05T09:00:00Z"), ZoneOffset.UTC);
    private static final int[] LAGS = ScreenBenchmark.LAGS;

    @TempDir
    Path dir;

    @Test
    void keptAgendaReadsBackExactlyAsRanked() {
        Workspaces workspaces = new Workspaces(Map.of());
        Path db = dir.resolve("screen.db");
        ScreenBenchmark.generate(workspaces, dir, db, 2000);
        AgendaSettings settings = AgendaSettings.defaults().withBudget(ScreenBenchmark.BUDGET_MINUTES);
        Agenda.Report ranked = Agenda.run(workspaces, db, ScreenBenchmark.CYCLE.toString(), LAGS, settings);
        long meeting = openMeeting(workspaces, db);

        Agenda.Report first = MeetingAgenda.of(workspaces, db, meeting, ScreenBenchmark.CYCLE, LAGS, settings, CLOCK);
        Agenda.Report joined = MeetingAgenda.of(workspaces, db, meeting, ScreenBenchmark.CYCLE, LAGS, settings, CLOCK);

        assertEquals(values(ranked.rows()), values(first.rows()), "the first screen shows what was ranked");
        assertEquals(values(ranked.rows()), values(joined.rows()), "a later screen reads the very same rows");
        assertEquals(Arrays.toString(ranked.lags()), Arrays.toString(joined.lags()));
        assertEquals(ranked.byValue(), joined.byValue());
        assertEquals(ranked.statStep(), joined.statStep());
        // The generated scenario has every kind of value a row can hold, so the round trip covers them.
        assertTrue(ranked.rows().stream().anyMatch(AgendaRow::handsOff), "some items are hands off");
        assertTrue(ranked.rows().stream().anyMatch(r -> !r.tags().isEmpty()), "some items carry tags");
        assertTrue(ranked.rows().stream().anyMatch(r -> r.aboveCut().orElse(false)), "a cut line");
        assertTrue(ranked.rows().stream().anyMatch(r -> r.trackRecord().own().isEmpty()), "items without a record");
    }

    @Test
    void dataImportedDuringTheMeetingDoNotReorderItsAgenda() throws Exception {
        Workspaces workspaces = new Workspaces(Map.of());
        Path db = dir.resolve("screen.db");
        ScreenBenchmark.generate(workspaces, dir, db, 200);
        AgendaSettings settings = AgendaSettings.defaults().withBudget(ScreenBenchmark.BUDGET_MINUTES);
        long meeting = openMeeting(workspaces, db);
        Agenda.Report kept = MeetingAgenda.of(workspaces, db, meeting, ScreenBenchmark.CYCLE, LAGS, settings, CLOCK);
        // The last-ranked item's recent stat forecasts become wildly wrong: ranked afresh, it would move up.
        String last = kept.rows().get(kept.rows().size() - 1).code();
        StringBuilder csv = new StringBuilder("item,period,cycle,step,quantity\n");
        for (int back = 1; back <= 6; back++) {
            var cycle = ScreenBenchmark.CYCLE.plus(-back);
            csv.append(last).append(',').append(cycle.plus(1)).append(',').append(cycle).append(",stat,999999\n");
        }
        Path file = Files.writeString(dir.resolve("late.csv"), csv.toString());
        try (Workspace ws = workspaces.open(db)) {
            new CsvImporter(ws, Progress.NONE).importFile(ImportKind.FORECASTS, file, true);
        }
        Agenda.Report afresh = Agenda.run(workspaces, db, ScreenBenchmark.CYCLE.toString(), LAGS, settings);
        assertNotEquals(last, afresh.rows().get(afresh.rows().size() - 1).code(), "ranked afresh, the item moves");

        Agenda.Report again = MeetingAgenda.of(workspaces, db, meeting, ScreenBenchmark.CYCLE, LAGS, settings, CLOCK);
        assertEquals(values(kept.rows()), values(again.rows()));
        try (Workspace ws = workspaces.open(db)) {
            assertEquals(kept.rows().size(), new MeetingAgendas(ws).of(meeting).orElseThrow().rowCount());
        }
    }

    @Test
    void aScreenJoiningWithOtherLagsWorksAtTheLagsTheAgendaWasRankedAt() {
        Workspaces workspaces = new Workspaces(Map.of());
        Path db = dir.resolve("screen.db");
        ScreenBenchmark.generate(workspaces, dir, db, 50);
        AgendaSettings settings = AgendaSettings.defaults();
        long meeting = openMeeting(workspaces, db);
        try (Meeting before = Meeting.join(workspaces, db, ScreenBenchmark.CYCLE.toString(), null, List.of(2, 3),
                "planner", CLOCK)) {
            assertEquals(List.of(2, 3), before.lags(), "no agenda kept yet: the screen's own lags");
        }
        MeetingAgenda.of(workspaces, db, meeting, ScreenBenchmark.CYCLE, new int[] {1, 2}, settings, CLOCK);
        try (Meeting after = Meeting.join(workspaces, db, ScreenBenchmark.CYCLE.toString(), null, List.of(2, 3),
                "planner", CLOCK)) {
            assertEquals(List.of(1, 2), after.lags(), "the kept agenda's lags");
            String item = MeetingAgenda.of(workspaces, db, meeting, ScreenBenchmark.CYCLE, new int[] {2, 3}, settings,
                    CLOCK).rows().get(0).code();
            assertEquals(List.of(ScreenBenchmark.CYCLE.plus(1), ScreenBenchmark.CYCLE.plus(2)),
                    after.item(item).decisionPeriods(), "the form preselects the periods at those lags");
        }
    }

    private static long openMeeting(Workspaces workspaces, Path db) {
        try (Meeting m = Meeting.join(workspaces, db, ScreenBenchmark.CYCLE.toString(), ScreenBenchmark.BUDGET_MINUTES,
                List.of(1, 2, 3), "facilitator", CLOCK)) {
            return m.info().id();
        }
    }

    /** Every value of each row, arrays as lists, doubles as their exact bits. */
    private static List<List<Object>> values(List<AgendaRow> rows) {
        return rows.stream().map(r -> List.<Object>of(r.rank(), r.item().id(), r.code(), r.item().description(),
                String.valueOf(r.item().group()), String.valueOf(r.item().unitValueMicros()),
                Arrays.toString(r.item().targetPeriods()), r.tags(), bits(r.stake().value()), bits(r.stake().mae()),
                r.stake().basis(), r.stake().periods(), bits(r.stake().unitValue()), bits(r.trackRecord().own()),
                r.trackRecord().n(), bits(r.trackRecord().parent()), bits(r.trackRecord().shrunk()),
                r.trackRecord().evidence().label(), bits(r.trackRecord().evidence().pValue()),
                r.trackRecord().evidence().pairs(), r.trackRecord().pool(), bits(r.priority()), r.abc(), r.xyz(),
                bits(r.cv()), bits(r.eventFactor()), bits(r.expectedMinutes()), String.valueOf(r.aboveCut()))).toList();
    }

    private static String bits(java.util.OptionalDouble d) {
        return d.isEmpty() ? "empty" : bits(d.getAsDouble());
    }

    private static String bits(double d) {
        return Long.toHexString(Double.doubleToRawLongBits(d));
    }
}
