package org.plenum.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import org.plenum.app.Score;
import org.plenum.score.Comparison;
import org.plenum.score.LensGroup;
import org.plenum.score.TimeAndMoney;
import org.plenum.score.Scorecard;
import org.plenum.score.StepScore;

/** The score report as an 80-column table, CSV or the JSON contract of DESIGN §4. Display only. */
final class ScoreFormats {
    private ScoreFormats() {}

    static void table(Score.Report report, PrintWriter out) {
        Scorecard all = report.all();
        out.printf(Locale.ROOT, "Process scorecard at lag %d against the %s placebo: %,d pairs, %,d left out%n",
                all.lag(), all.placebo().stepName().replace('_', ' '), all.pairs(), all.leftOut());
        out.println("(left out: pairs with an actual but without every step's forecast)");
        table(all, out);
        for (Score.Breakdown b : report.breakdowns()) {
            for (Map.Entry<String, Scorecard> g : b.scorecards().entrySet()) {
                out.println();
                out.printf(Locale.ROOT, "%s = %s: %,d pairs%n", b.field(), g.getKey(), g.getValue().pairs());
                table(g.getValue(), out);
            }
        }
        lens(report, out);
    }

    private static void lens(Score.Report report, PrintWriter out) {
        Score.Lens lens = report.lens();
        out.println();
        out.printf(Locale.ROOT, "Decision lens: %,d standing %s decisions with an actual%n", lens.time().decisions(),
                lens.ledgerStep());
        lensTable("class", lens.classes(), out);
        lensTable("direction", lens.directions(), out);
        if (!lens.importedClasses().isEmpty()) {
            out.println("Imported steps' changes against the step before:");
            lensTable("class", lens.importedClasses(), out);
        }
        for (Score.Breakdown b : report.breakdowns()) {
            out.println("Decisions by " + b.field() + ":");
            lensTable(b.field(), b.lens(), out);
        }
        time(lens.time(), out);
    }

    private static void lensTable(String heading, List<LensGroup> groups, PrintWriter out) {
        if (groups.isEmpty()) {
            return;
        }
        out.printf("%-16s %5s %5s %5s %5s %5s %5s %6s  %s%n", clip(heading, 16), "n", "right", "over", "optim",
                "impr", "GMR", "p", "evidence");
        for (LensGroup g : groups) {
            out.printf(Locale.ROOT, "%-16s %5d %5s %5s %5s %5s %5s %6s  %s%n", clip(g.key(), 16), g.count(),
                    share(g.shareRight()), share(g.shareOvershoot()), share(g.shareOptimistic()),
                    share(g.shareImproved()), num(g.ratio().value(), 2), pValue(g.wilcoxon().pValue()),
                    g.evidence().label().text());
        }
    }

    private static void time(TimeAndMoney t, PrintWriter out) {
        out.printf(Locale.ROOT, "Time: %,d of %,d scored decisions timed, %,.0f minutes in all;%n", t.timed(),
                t.decisions(), t.minutes());
        out.printf(Locale.ROOT, "  minutes per decision %s, per item %s, per meeting %s%n",
                num(t.minutesPerDecision(), 1), num(t.minutesPerItem(), 1), num(t.minutesPerMeeting(), 0));
        if (!t.minutesByAuthor().isEmpty()) {
            StringBuilder authors = new StringBuilder("  minutes by author:");
            t.minutesByAuthor().forEach((a, m) -> authors.append(String.format(Locale.ROOT, " %s %.0f", a, m)));
            out.println(authors);
        }
        out.printf(Locale.ROOT, "Absolute error avoided: %,.0f units; %s units per meeting hour%n", t.errorAvoided(),
                num(t.errorAvoidedPerHour(), 1));
        if (t.moneyPerHour().isPresent()) {
            out.printf(Locale.ROOT, "  in money: %,.0f; %,.0f per meeting hour%n", t.moneyAvoided().getAsDouble(),
                    t.moneyPerHour().getAsDouble());
        }
        out.println("(negative = the decisions made the forecast worse)");
    }

    private static String share(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%.0f%%", 100 * v.getAsDouble()) : "-";
    }

    private static void table(Scorecard card, PrintWriter out) {
        out.printf("%-14s %8s %9s %7s %8s %-16s %6s%n", "step", "n", "MAE", "WAPE", "accuracy", "bias", "MASE");
        for (StepScore s : card.steps()) {
            out.printf(Locale.ROOT, "%-14s %8d %9s %7s %8s %-16s %6s%n", clip(s.step(), 14), s.n(), num(s.mae(), 2),
                    pct(s.wape()), pct(s.accuracy().isPresent()
                            ? OptionalDouble.of(Math.max(0, s.accuracy().getAsDouble())) : s.accuracy()),
                    bias(s.bias()), num(s.mase(), 3));
        }
        out.printf("%-10s %9s %9s %-15s %5s %6s  %s%n", "vs prev", "FVA", "AvgRelMAE", " 95% interval", "GMR", "p",
                "evidence");
        for (StepScore s : card.steps()) {
            s.vsPrevious().ifPresent(c -> out.printf(Locale.ROOT, "%-10s %9s %9s %-15s %5s %6s  %s%n",
                    clip(s.step(), 10), points(c.fva()), num(c.avgRelMae().value(), 3), interval(c),
                    num(c.ratio().value(), 2), pValue(c.wilcoxon().pValue()), c.evidence().label().text()));
        }
    }

    static void csv(Score.Report report, PrintWriter out) {
        out.println("group,step,n,mae,wape,accuracy,bias,mase,fva_vs_prev,fva_vs_placebo,avg_rel_mae_vs_prev,"
                + "avg_rel_mae_low,avg_rel_mae_high,items_left_out,gmr_vs_prev,exact_hits,p_value,evidence");
        rows("", report.all(), out);
        for (Score.Breakdown b : report.breakdowns()) {
            b.scorecards().forEach((value, card) -> rows(b.field() + "=" + value, card, out));
        }
    }

    private static void rows(String group, Scorecard card, PrintWriter out) {
        for (StepScore s : card.steps()) {
            Comparison c = s.vsPrevious().orElse(null);
            out.println(String.join(",", List.of(csvText(group), csvText(s.step()), Integer.toString(s.n()),
                    raw(s.mae()), raw(s.wape()), raw(s.accuracy()), raw(s.bias()), raw(s.mase()),
                    c == null ? "" : raw(c.fva()), raw(s.fvaVsPlacebo()),
                    c == null ? "" : raw(c.avgRelMae().value()),
                    c == null ? "" : c.interval().map(i -> Double.toString(i.lower())).orElse(""),
                    c == null ? "" : c.interval().map(i -> Double.toString(i.upper())).orElse(""),
                    c == null ? "" : Integer.toString(c.avgRelMae().seriesLeftOut()),
                    c == null ? "" : raw(c.ratio().value()),
                    c == null ? "" : Integer.toString(c.ratio().candidateExact()),
                    c == null ? "" : raw(c.wilcoxon().pValue()),
                    c == null ? "" : csvText(c.evidence().label().text()))));
        }
    }

    static void json(Score.Report report, PrintWriter out) {
        Json j = new Json().open();
        card(j, report.all());
        j.openObject("by");
        for (Score.Breakdown b : report.breakdowns()) {
            j.openArray(b.field());
            b.scorecards().forEach((value, card) -> {
                j.open().field("value", value);
                card(j, card);
                j.close();
            });
            j.closeArray();
        }
        j.close();
        lensJson(j, report);
        out.println(j.close());
    }

    private static void lensJson(Json j, Score.Report report) {
        Score.Lens lens = report.lens();
        j.openObject("lens").field("step", lens.ledgerStep());
        groupsJson(j, "classes", lens.classes());
        groupsJson(j, "directions", lens.directions());
        groupsJson(j, "imported_classes", lens.importedClasses());
        j.openObject("by");
        for (Score.Breakdown b : report.breakdowns()) {
            groupsJson(j, b.field(), b.lens());
        }
        j.close();
        TimeAndMoney t = lens.time();
        j.openObject("time").field("decisions", t.decisions()).field("timed", t.timed())
                .field("minutes", OptionalDouble.of(t.minutes())).field("minutes_per_decision", t.minutesPerDecision())
                .field("minutes_per_item", t.minutesPerItem()).field("minutes_per_meeting", t.minutesPerMeeting())
                .field("error_avoided", OptionalDouble.of(t.errorAvoided()))
                .field("error_avoided_per_hour", t.errorAvoidedPerHour()).field("money_avoided", t.moneyAvoided())
                .field("money_avoided_per_hour", t.moneyPerHour()).openObject("minutes_by_author");
        t.minutesByAuthor().forEach((a, m) -> j.field(a, OptionalDouble.of(m)));
        j.close().close();
        j.close();
    }

    private static void groupsJson(Json j, String key, List<LensGroup> groups) {
        j.openArray(key);
        for (LensGroup g : groups) {
            j.open().field("key", g.key()).field("n", g.count()).field("share_right", g.shareRight())
                    .field("share_overshoot", g.shareOvershoot()).field("share_optimistic", g.shareOptimistic())
                    .field("share_improved", g.shareImproved()).field("bias", g.bias())
                    .field("gmr", g.ratio().value()).field("exact_hits", g.ratio().candidateExact())
                    .field("p_value", g.wilcoxon().pValue()).field("evidence", g.evidence().label().text())
                    .field("median_scaled_size", g.medianScaledSize()).close();
        }
        j.closeArray();
    }

    private static void card(Json j, Scorecard card) {
        j.field("lag", card.lag()).field("placebo", card.placebo().name().toLowerCase(Locale.ROOT))
                .field("pairs", card.pairs()).field("left_out", card.leftOut()).openArray("steps");
        for (StepScore s : card.steps()) {
            j.open().field("step", s.step()).field("n", s.n()).field("mae", s.mae()).field("wape", s.wape())
                    .field("accuracy", s.accuracy()).field("bias", s.bias()).field("mase", s.mase());
            s.vsPrevious().ifPresent(c -> j.field("vs", c.against()).field("fva_vs_prev", c.fva())
                    .field("fva_vs_placebo", s.fvaVsPlacebo()).field("avg_rel_mae_vs_prev", c.avgRelMae().value())
                    .field("avg_rel_mae_low", c.interval().map(i -> OptionalDouble.of(i.lower()))
                            .orElse(OptionalDouble.empty()))
                    .field("avg_rel_mae_high", c.interval().map(i -> OptionalDouble.of(i.upper()))
                            .orElse(OptionalDouble.empty()))
                    .field("items_left_out", c.avgRelMae().seriesLeftOut())
                    .field("gmr_vs_prev", c.ratio().value()).field("exact_hits", c.ratio().candidateExact())
                    .field("p_value", c.wilcoxon().pValue()).field("evidence", c.evidence().label().text()));
            j.close();
        }
        j.closeArray();
    }

    private static String clip(String s, int width) {
        return s.length() <= width ? s : s.substring(0, width - 1) + "~";
    }

    private static String num(OptionalDouble v, int decimals) {
        return v.isPresent() ? String.format(Locale.ROOT, "%." + decimals + "f", v.getAsDouble()) : "-";
    }

    private static String pct(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%.1f%%", 100 * v.getAsDouble()) : "-";
    }

    private static String points(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%+.1f pts", 100 * v.getAsDouble()) : "-";
    }

    /** Bias always in words, so nobody has to remember the sign convention. */
    private static String bias(OptionalDouble v) {
        if (v.isEmpty()) {
            return "-";
        }
        double b = v.getAsDouble();
        return b == 0 ? "none" : String.format(Locale.ROOT, "%.1f%% %s", 100 * Math.abs(b), b > 0 ? "above" : "below");
    }

    private static String interval(Comparison c) {
        return c.interval().map(i -> String.format(Locale.ROOT, "[%.3f,%.3f]", i.lower(), i.upper())).orElse("-");
    }

    private static String pValue(OptionalDouble p) {
        if (p.isEmpty()) {
            return "-";
        }
        return p.getAsDouble() < 0.001 ? "<0.001" : String.format(Locale.ROOT, "%.3f", p.getAsDouble());
    }

    private static String raw(OptionalDouble v) {
        return v.isPresent() && Double.isFinite(v.getAsDouble()) ? Double.toString(v.getAsDouble()) : "";
    }

    private static String csvText(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }
}
