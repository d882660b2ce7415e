package org.plenum.score;

import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;
import org.plenum.core.ScoredChange;

/**
 * The time people spent and the error their decisions avoided (DESIGN §5): minutes per decision,
 * item, meeting and author, and absolute error avoided, Σ(|e_prior| − |e_new|), per meeting hour
 * in units and, where items have a unit value, in money. Averages use only decisions whose
 * minutes were recorded; the per-hour figures use the same decisions for both sides.
 *
 * @param minutesByAuthor minutes of the scored decisions per author
 * @param moneyPerHour money avoided per hour over the decisions on items with a unit value
 */
public record TimeAndMoney(int decisions, int timed, double minutes, OptionalDouble minutesPerDecision,
        OptionalDouble minutesPerItem, OptionalDouble minutesPerMeeting, Map<String, Double> minutesByAuthor,
        double errorAvoided, OptionalDouble errorAvoidedPerHour, OptionalDouble moneyAvoided,
        OptionalDouble moneyPerHour) {

    private static final double MICROS = 1e6;

    /**
     * @param scored standing ledger decisions with an actual
     * @param minutesByCycle minutes of every decision (superseded ones too) per cycle
     * @param unitValues money per unit by item id, in millionths
     */
    public static TimeAndMoney of(List<ScoredChange> scored, Collection<Long> minutesByCycle,
            Map<Integer, Long> unitValues) {
        Map<String, Double> byAuthor = new TreeMap<>();
        java.util.Set<Integer> items = new java.util.HashSet<>();
        double minutes = 0;
        int timed = 0;
        double avoided = 0;
        double avoidedTimed = 0;
        double money = 0;
        double moneyMinutes = 0;
        boolean anyMoney = false;
        for (ScoredChange c : scored) {
            double gain = (Math.abs(c.actual() - c.prior()) - Math.abs(c.actual() - c.quantity())) / MICROS;
            avoided += gain;
            Long unit = unitValues.get(c.item());
            if (c.minutes() != null) {
                double m = c.minutes() / MICROS;
                minutes += m;
                timed++;
                items.add(c.item());
                avoidedTimed += gain;
                byAuthor.merge(c.author() == null ? "(imported)" : c.author(), m, Double::sum);
                if (unit != null) {
                    money += gain * unit / MICROS;
                    moneyMinutes += m;
                    anyMoney = true;
                }
            }
        }
        double meetingMinutes = minutesByCycle.stream().mapToLong(Long::longValue).sum() / MICROS;
        return new TimeAndMoney(scored.size(), timed, minutes, ratio(minutes, timed), ratio(minutes, items.size()),
                ratio(meetingMinutes, minutesByCycle.size()), byAuthor, avoided, ratio(avoidedTimed, minutes / 60),
                anyMoney ? OptionalDouble.of(money) : OptionalDouble.empty(),
                anyMoney ? ratio(money, moneyMinutes / 60) : OptionalDouble.empty());
    }

    private static OptionalDouble ratio(double a, double b) {
        return b > 0 ? OptionalDouble.of(a / b) : OptionalDouble.empty();
    }
}
