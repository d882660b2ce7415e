package org.plenum.agenda;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Ranks a cycle's candidate items (DESIGN §6), the agenda's entry point: stake, track record,
 * gain, priority, classes, event factor, hands-off and cut line for every candidate, ordered
 * by priority, ties by item code. Hands-off items are kept off the top: they follow every other
 * item. Items whose stake is unknown (no error and no two consecutive actuals yet) follow the
 * ranked ones, by item code, ahead of the hands-off ones.
 */
public final class AgendaRanking {
    private AgendaRanking() {}

    /**
     * What one ranking needs.
     *
     * @param cycle the ranked cycle ({@code Period.index})
     * @param seasonLength periods in a season (12 months, 52 weeks): the window of the classes
     */
    public record Input(int cycle, int seasonLength, List<Candidate> candidates, History history,
            TrackRecords trackRecords, ExpectedMinutes minutes) {}

    /**
     * The candidates whose recent error found fewer than {@value RecentError#CYCLES} cycles in the
     * history given, so that older forecasts and actuals must be read for them.
     */
    public static Set<Integer> needingOlderHistory(List<Candidate> candidates, History history, int cycle) {
        Set<Integer> out = new LinkedHashSet<>();
        for (Candidate c : candidates) {
            if (RecentError.of(history, c.id(), cycle).isShort()) {
                out.add(c.id());
            }
        }
        return out;
    }

    public static List<AgendaRow> rank(Input in, AgendaSettings settings) {
        List<long[]> seasons = in.candidates().stream().map(c -> season(in, c.id())).toList();
        Map<String, String> abc = abcClasses(in, settings, seasons);
        XyzClassification xyz = new XyzClassification(settings.xyz()[0], settings.xyz()[1]);
        List<AgendaRow> rows = new ArrayList<>();
        for (int i = 0; i < in.candidates().size(); i++) {
            Candidate c = in.candidates().get(i);
            Stake stake = Stake.of(in.history(), c.id(), in.cycle(), c.targetPeriods().length, c.unitValueMicros());
            TrackRecord record = in.trackRecords().of(c.id());
            boolean event = !c.tags().isEmpty();
            OptionalDouble priority = Priority.of(stake.value(), record.gain(), settings.gainFloor(), event,
                    settings.eventFactor());
            long[] season = seasons.get(i);
            rows.add(new AgendaRow(0, c, stake, record, priority, abc.get(c.code()), xyz.classOf(season),
                    XyzClassification.coefficientOfVariation(season), event ? settings.eventFactor() : 1,
                    in.minutes().of(c.id()), Optional.empty()));
        }
        rows.sort(ORDER);
        return numbered(rows, settings);
    }

    /** Ranked items first, then those without a stake, then the hands-off ones; ties by item code. */
    private static final Comparator<AgendaRow> ORDER = Comparator.comparingInt(AgendaRanking::tier)
            .thenComparingDouble(r -> -r.priority().orElse(Double.NEGATIVE_INFINITY))
            .thenComparing(AgendaRow::code);

    private static int tier(AgendaRow r) {
        return r.handsOff() ? 2 : r.priority().isPresent() ? 0 : 1;
    }

    private static List<AgendaRow> numbered(List<AgendaRow> sorted, AgendaSettings settings) {
        double[] minutes = sorted.stream().mapToDouble(AgendaRow::expectedMinutes).toArray();
        boolean[] handsOff = new boolean[sorted.size()];
        for (int i = 0; i < handsOff.length; i++) {
            handsOff[i] = sorted.get(i).handsOff();
        }
        List<Boolean> cut = settings.budgetMinutes().isPresent()
                ? CutLine.of(settings.budgetMinutes().getAsDouble(), minutes, handsOff) : null;
        List<AgendaRow> out = new ArrayList<>();
        for (int i = 0; i < sorted.size(); i++) {
            AgendaRow r = sorted.get(i);
            out.add(new AgendaRow(i + 1, r.item(), r.stake(), r.trackRecord(), r.priority(), r.abc(), r.xyz(), r.cv(),
                    r.eventFactor(), r.expectedMinutes(), cut == null ? Optional.empty() : Optional.of(cut.get(i))));
        }
        return out;
    }

    /** The item's known actuals of the last season before the cycle. */
    private static long[] season(Input in, int item) {
        return in.history().actualsBetween(item, in.cycle() - in.seasonLength(), in.cycle() - 1);
    }

    private static Map<String, String> abcClasses(Input in, AgendaSettings settings, List<long[]> seasons) {
        boolean byValue = abcByValue(in.candidates(), settings);
        List<AbcClassification.Value> values = new ArrayList<>();
        for (int i = 0; i < in.candidates().size(); i++) {
            Candidate c = in.candidates().get(i);
            BigInteger volume = exactSum(seasons.get(i));
            BigInteger amount = !byValue ? volume
                    : c.unitValueMicros() == null ? BigInteger.ZERO : volume.multiply(BigInteger.valueOf(c.unitValueMicros()));
            values.add(new AbcClassification.Value(c.code(), amount));
        }
        return new AbcClassification(settings.abc()[0], settings.abc()[1]).classes(values);
    }

    /** The exact sum: in a long while it fits (always, for any real season), else in a BigInteger. */
    private static BigInteger exactSum(long[] values) {
        long sum = 0;
        try {
            for (long v : values) {
                sum = Math.addExact(sum, v);
            }
            return BigInteger.valueOf(sum);
        } catch (ArithmeticException overflow) {
            BigInteger big = BigInteger.ZERO;
            for (long v : values) {
                big = big.add(BigInteger.valueOf(v));
            }
            return big;
        }
    }

    /** Whether ABC ran by value for these candidates under these settings. */
    public static boolean abcByValue(List<Candidate> candidates, AgendaSettings settings) {
        return switch (settings.abcBasis()) {
            case VALUE -> true;
            case VOLUME -> false;
            case AUTO -> candidates.stream().allMatch(c -> c.unitValueMicros() != null);
        };
    }
}
