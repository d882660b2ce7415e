package org.plenum.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.score.Comparison;
import org.plenum.score.LensGroup;
import org.plenum.score.Placebo;
import org.plenum.score.StepScore;

/**
 * Sanity check, not a proof: the demo scenario in {@code demo-data/} is invented, and its generator
 * builds in a known direction — a statistical forecast better than the naive, upward meeting
 * decisions that tend to damage accuracy and downward ones that tend to help (the optimism pattern
 * of Fildes et al. 2009). The scorecard on the demo workspace should show that direction.
 */
class DemoScorecardTest {
    @TempDir
    static Path dir;
    static Score.Report report;

    @BeforeAll
    static void buildTheDemoAndScoreItAtLagOne() {
        Workspaces workspaces = new Workspaces(Map.of());
        Path db = dir.resolve("demo.db");
        Demo.build(workspaces, Path.of("demo-data"), db);
        report = Score.run(workspaces, db, 1, Placebo.NAIVE, null, 200);
    }

    private static StepScore step(String name) {
        return report.all().steps().stream().filter(s -> s.step().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void scoresEveryDefaultStepAfterTheNaivePlacebo() {
        assertEquals(java.util.List.of("naive", "stat", "meeting", "final"),
                report.all().steps().stream().map(StepScore::step).toList());
        assertTrue(report.all().pairs() >= 30, "pairs: " + report.all().pairs());
    }

    @Test
    void statBeatsTheNaivePlacebo() {
        Comparison c = step("stat").vsPrevious().orElseThrow();
        assertEquals("naive", c.against());
        double r = c.avgRelMae().value().getAsDouble();
        assertTrue(r < 1, "AvgRelMAE stat vs naive = " + r);
        assertTrue(step("stat").fvaVsPlacebo().getAsDouble() > 0, step("stat").toString());
    }

    @Test
    void upwardDecisionsDamageAndDownwardOnesHelp() {
        Map<String, LensGroup> byDirection = report.lens().directions().stream()
                .collect(Collectors.toMap(LensGroup::key, Function.identity()));
        LensGroup up = byDirection.get("up");
        LensGroup down = byDirection.get("down");
        assertTrue(up != null && down != null, "directions: " + byDirection.keySet());
        double upRatio = up.ratio().value().getAsDouble();
        double downRatio = down.ratio().value().getAsDouble();
        assertTrue(upRatio > 1, "geometric-mean |e_new|/|e_prior| of upward decisions = " + upRatio);
        assertTrue(downRatio < 1, "geometric-mean |e_new|/|e_prior| of downward decisions = " + downRatio);
    }
}
