package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.plenum.score.Comparison;
import org.plenum.score.Scorecard;
import org.plenum.score.StepScore;

/**
 * The process scorecard over every scored cycle: each step against the one before it and the
 * placebo, with its evidence in words. Computed in the background the first time it is shown.
 */
final class ScorecardView implements View {
    private final Room room;

    ScorecardView(Room room) {
        this.room = room;
        room.wantScorecard();
    }

    @Override
    public String name() {
        return "scorecard";
    }

    @Override
    public boolean handle(KeyStroke key) {
        return false;
    }

    @Override
    public void draw(Painter body) {
        if (room.scorecard == null) {
            body.text(1, 1, room.scorecardProblem != null ? "no scorecard: " + room.scorecardProblem
                    : "scoring every step" + room.look.ellipsis(), room.scorecardProblem != null ? Look.Role.BAD
                            : Look.Role.DIM);
            return;
        }
        Scorecard card = room.scorecard.all();
        body.text(0, 0, String.format(Locale.ROOT, "process scorecard, lag %d, against the %s placebo: %,d pairs"
                + " (%,d left out)", card.lag(), card.placebo().stepName(), card.pairs(), card.leftOut()), Look.Role.TITLE);
        body.text(0, 1, String.format(Locale.ROOT, "%-10s %8s %6s %6s %-12s %6s %7s %6s  %s", "step", "MAE", "WAPE",
                "acc", "bias", "FVA", "AvgRel", "p", "evidence vs previous"), Look.Role.DIM);
        int y = 2;
        for (StepScore s : card.steps()) {
            Comparison c = s.vsPrevious().orElse(null);
            String line = String.format(Locale.ROOT, "%-10s %8s %6s %6s %-12s %6s %7s %6s  %s",
                    Text.fit(s.step(), 10, room.look), Text.amount(s.mae()), Text.percent(s.wape()),
                    Text.percent(s.accuracy()), bias(s.bias()), c == null ? "" : Text.points(c.fva()),
                    c == null ? "" : Text.ratio(c.avgRelMae().value()),
                    c == null ? "" : p(c.wilcoxon().pValue()), c == null ? "(placebo)" : c.evidence().label().text());
            Look.Role role = c == null ? Look.Role.PLAIN : switch (c.evidence().label()) {
                case BETTER -> Look.Role.GOOD;
                case WORSE -> Look.Role.BAD;
                default -> Look.Role.PLAIN;
            };
            body.text(0, y++, line, role);
        }
        y++;
        body.text(0, y++, "FVA: accuracy points gained over the previous step; AvgRel below 1: the step helped.",
                Look.Role.DIM);
        body.text(0, y, "p: two-sided Wilcoxon signed-rank on paired absolute errors; under 30 pairs: too few to tell.",
                Look.Role.DIM);
    }

    private static String bias(OptionalDouble v) {
        if (v.isEmpty()) {
            return "-";
        }
        double b = v.getAsDouble();
        return b == 0 ? "none" : String.format(Locale.ROOT, "%.1f%% %s", 100 * Math.abs(b), b > 0 ? "above" : "below");
    }

    private static String p(OptionalDouble p) {
        if (p.isEmpty()) {
            return "-";
        }
        return p.getAsDouble() < 0.001 ? "<0.001" : String.format(Locale.ROOT, "%.3f", p.getAsDouble());
    }

    @Override
    public String hints() {
        return "1 agenda  2 ledger";
    }

    @Override
    public List<String[]> help() {
        return List.<String[]>of(new String[] {"1 2", "agenda, ledger"});
    }
}
