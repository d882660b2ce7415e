package org.plenum.agenda;

import java.util.Arrays;
import org.plenum.core.CycleSeries;
import org.plenum.core.Series;

/**
 * Each item's statistical forecasts at the decision lags and its actuals before the cycle, read
 * as a recent window and, for the few items whose window is not enough, an older part. Every
 * older cycle and period lies before every one of the window's, so an item's rows are the older
 * rows followed by the window's.
 */
public final class History {
    private final Part window;
    private final Part older;

    private record Part(CycleSeries stat, ItemRanges statRanges, Series actuals, ItemRanges actualRanges) {
        static Part of(CycleSeries stat, Series actuals) {
            return new Part(stat, new ItemRanges(stat.items(), stat.size()), actuals,
                    new ItemRanges(actuals.items(), actuals.size()));
        }

        int count(int item, int from, int to) {
            int n = 0;
            for (int i = actualRanges.from(item); i < actualRanges.to(item); i++) {
                n += actuals.periods()[i] >= from && actuals.periods()[i] <= to ? 1 : 0;
            }
            return n;
        }
    }

    private History(Part window, Part older) {
        this.window = window;
        this.older = older;
    }

    /**
     * @param stat statistical forecasts sorted by item, cycle and period
     * @param actuals actuals sorted by item and period
     */
    public static History of(CycleSeries stat, Series actuals) {
        return new History(Part.of(stat, actuals), Part.of(empty(), new Series(new int[0], new int[0], new long[0], 0)));
    }

    /** This history with older rows of some items added (they must all lie before the window's). */
    public History withOlder(CycleSeries stat, Series actuals) {
        return new History(window, Part.of(stat, actuals));
    }

    private static CycleSeries empty() {
        return new CycleSeries(new int[0], new int[0], new int[0], new long[0], 0);
    }

    /** Visits the item's forecasts, newest cycle first. */
    void forecastsNewestFirst(int item, ForecastVisitor visitor) {
        for (Part p : new Part[] {window, older}) {
            CycleSeries s = p.stat();
            for (int i = p.statRanges().to(item) - 1; i >= p.statRanges().from(item); i--) {
                if (!visitor.visit(s.cycles()[i], s.periods()[i], s.quantities()[i])) {
                    return;
                }
            }
        }
    }

    /** What is done with each forecast; false stops the walk. */
    interface ForecastVisitor {
        boolean visit(int cycle, int period, long quantityMicros);
    }

    /** The item's actual of {@code period}, or −1 when it is not known. */
    long actual(int item, int period) {
        for (Part p : new Part[] {window, older}) {
            int from = p.actualRanges().from(item);
            int to = p.actualRanges().to(item);
            int pos = Arrays.binarySearch(p.actuals().periods(), from, to, period);
            if (pos >= 0) {
                return p.actuals().quantities()[pos];
            }
        }
        return -1;
    }

    /** The item's known actuals of periods {@code from..to}, oldest first. */
    long[] actualsBetween(int item, int from, int to) {
        int n = 0;
        for (Part p : new Part[] {older, window}) {
            n += p.count(item, from, to);
        }
        long[] out = new long[n];
        int k = 0;
        for (Part p : new Part[] {older, window}) {
            for (int i = p.actualRanges().from(item); i < p.actualRanges().to(item); i++) {
                int period = p.actuals().periods()[i];
                if (period >= from && period <= to) {
                    out[k++] = p.actuals().quantities()[i];
                }
            }
        }
        return out;
    }

    /** The item's known actuals before {@code cycle}, oldest first, as (periods, quantities). */
    long[][] actualsBefore(int item, int cycle) {
        int n = 0;
        for (Part p : new Part[] {older, window}) {
            for (int i = p.actualRanges().from(item); i < p.actualRanges().to(item); i++) {
                n += p.actuals().periods()[i] < cycle ? 1 : 0;
            }
        }
        long[][] out = new long[2][n];
        int k = 0;
        for (Part p : new Part[] {older, window}) {
            for (int i = p.actualRanges().from(item); i < p.actualRanges().to(item); i++) {
                if (p.actuals().periods()[i] < cycle) {
                    out[0][k] = p.actuals().periods()[i];
                    out[1][k++] = p.actuals().quantities()[i];
                }
            }
        }
        return out;
    }
}
