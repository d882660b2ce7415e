package org.plenum.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.plenum.agenda.AgendaRow;
import org.plenum.agenda.Candidate;
import org.plenum.agenda.Stake;
import org.plenum.agenda.TrackRecord;
import org.plenum.score.Evidence;

/** The kept agenda's format gives back every value, the empty ones too, and refuses a damaged value. */
class AgendaRowsFormatTest {

    private static AgendaRow full() {
        return new AgendaRow(1, new Candidate(7, "A-1", "Pan, 28 cm — cast iron", "pans", 12_500_000L,
                new int[] {24313, 24314}, List.of("price change", "promotion")),
                new Stake(OptionalDouble.of(0.1 + 0.2), OptionalDouble.of(Math.PI), Stake.Basis.RECENT, 2,
                        OptionalDouble.of(12.5)),
                new TrackRecord(OptionalDouble.of(1.0 / 3), 41, 0.97, Math.nextUp(1.0),
                        new Evidence(Evidence.Label.WORSE, OptionalDouble.of(0.012), 41), TrackRecord.Pool.ITEM),
                OptionalDouble.of(Double.MIN_VALUE), "A", "Y", OptionalDouble.of(0.42), 1.5, 3.0, Optional.of(true));
    }

    private static AgendaRow empty() {
        return new AgendaRow(2, new Candidate(8, "B-2", "", null, null, new int[0], List.of()),
                new Stake(OptionalDouble.empty(), OptionalDouble.empty(), Stake.Basis.NONE, 0, OptionalDouble.empty()),
                new TrackRecord(OptionalDouble.empty(), 0, 1, 1,
                        new Evidence(Evidence.Label.TOO_FEW_TO_TELL, OptionalDouble.empty(), 0),
                        TrackRecord.Pool.WORKSPACE),
                OptionalDouble.empty(), "C", "-", OptionalDouble.empty(), 1, 3, Optional.empty());
    }

    @Test
    void everyValueComesBackExactly() {
        List<AgendaRow> rows = List.of(full(), empty(), full());
        List<AgendaRow> back = AgendaRowsFormat.decode(AgendaRowsFormat.encode(rows));
        assertEquals(rows.size(), back.size());
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(Arrays.toString(rows.get(i).item().targetPeriods()),
                    Arrays.toString(back.get(i).item().targetPeriods()));
            assertEquals(withoutPeriods(rows.get(i)), withoutPeriods(back.get(i)), "row " + i);
        }
        assertEquals(0, AgendaRowsFormat.decode(AgendaRowsFormat.encode(List.of())).size());
    }

    @Test
    void aDamagedValueIsRefused() {
        byte[] value = AgendaRowsFormat.encode(List.of(full(), empty()));
        assertThrows(IllegalArgumentException.class,
                () -> AgendaRowsFormat.decode(Arrays.copyOf(value, value.length - 1)), "cut short");
        assertThrows(IllegalArgumentException.class,
                () -> AgendaRowsFormat.decode(Arrays.copyOf(value, value.length + 1)), "trailing bytes");
        byte[] wrongLength = value.clone();
        wrongLength[8] = (byte) 0x7f; // the first word's length, made huge
        assertThrows(IllegalArgumentException.class, () -> AgendaRowsFormat.decode(wrongLength));
    }

    /** The row's values; records compare doubles exactly, arrays by identity (so periods are compared apart). */
    private static List<Object> withoutPeriods(AgendaRow r) {
        Candidate c = r.item();
        return Arrays.asList(r.rank(), c.id(), c.code(), c.description(), c.group(), c.unitValueMicros(), c.tags(),
                r.stake(), r.trackRecord(), r.priority(), r.abc(), r.xyz(), r.cv(), r.eventFactor(), r.expectedMinutes(),
                r.aboveCut());
    }
}
