package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.plenum.core.ScoredChange;

class AgendaRankingTest {
    private static Candidate candidate(int id, String code, String group) {
        return new Candidate(id, code, code, group, null, new int[] {21}, List.of());
    }

    @Test
    void handsOffItemsComeLastAndItemsWithoutStakeBeforeThem() {
        // Items 1..3 share one recent error of 10 (stake 10 each); item 4 has no history at all.
        Histories h = new Histories();
        for (int item = 1; item <= 3; item++) {
            h.forecast(item, 19, 20, 110);
        }
        for (int item = 1; item <= 3; item++) {
            h.actual(item, 20, 100);
        }
        // Item 3: 40 changed pairs each worse by a different amount → "worse" with p = 2·2^−40: hands off.
        List<ScoredChange> changed = new ArrayList<>();
        for (int p = 1; p <= 40; p++) {
            changed.add(new ScoredChange("final", 3, p, p + 1, 90_000_000L, (110L + p) * 1_000_000L, 100_000_000L,
                    false, null, null, null, null));
        }
        // Item 5 (not a candidate) in another group: 400 pairs where review halved the error, so the
        // workspace's record, which A, B and D inherit, says review helps.
        for (int p = 1; p <= 400; p++) {
            changed.add(new ScoredChange("final", 5, p, p + 1, 90_000_000L, 95_000_000L, 100_000_000L, false, null, null,
                    null, null));
        }
        TrackRecords records = new TrackRecords(changed, Map.of(3, "bad", 5, "good"), CredibilityShrinkage.DEFAULT_K);
        List<Candidate> candidates = List.of(candidate(3, "C", "bad"), candidate(4, "D", null),
                candidate(2, "B", null), candidate(1, "A", null));
        List<AgendaRow> rows = AgendaRanking.rank(new AgendaRanking.Input(21, 12, candidates, h.build(), records,
                new ExpectedMinutes(3)), AgendaSettings.defaults().withBudget(100));
        // A and B tie on priority: item code decides. D has no stake. C is hands-off.
        assertEquals(List.of("A", "B", "D", "C"), rows.stream().map(AgendaRow::code).toList());
        assertEquals(List.of(1, 2, 3, 4), rows.stream().map(AgendaRow::rank).toList());
        // Their priority: 10 × (1 − r_ws), r_ws = AvgRelMAE of the workspace (400 ln 0.5 + 40 ln 3.05) / 440.
        double workspace = Math.exp((400 * Math.log(0.5) + 40 * Math.log(3.05)) / 440);
        assertEquals(10 * (1 - workspace), rows.get(0).priority().getAsDouble(), 1e-9);
        assertEquals(List.of(true, true, true, false), rows.stream().map(r -> r.aboveCut().orElseThrow()).toList());
        assertEquals(true, rows.get(3).handsOff());
    }

    @Test
    void anEventTagRaisesThePriorityByTheFactor() {
        History h = new Histories().forecast(1, 19, 20, 110).forecast(2, 19, 20, 110).actual(1, 20, 100)
                .actual(2, 20, 100).build();
        List<Candidate> candidates = List.of(new Candidate(1, "A", "A", null, null, new int[] {21}, List.of()),
                new Candidate(2, "B", "B", null, null, new int[] {21}, List.of("promotion")));
        List<AgendaRow> rows = AgendaRanking.rank(new AgendaRanking.Input(21, 12, candidates, h,
                new TrackRecords(List.of(), Map.of(), 5), new ExpectedMinutes(3)),
                AgendaSettings.defaults().withEventFactor(2));
        assertEquals(List.of("B", "A"), rows.stream().map(AgendaRow::code).toList());
        assertEquals(1.0, rows.get(0).priority().getAsDouble(), 1e-12); // 10 × 0.05 × 2
        assertEquals(0.5, rows.get(1).priority().getAsDouble(), 1e-12);
    }
}
