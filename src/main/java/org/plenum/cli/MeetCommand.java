package org.plenum.cli;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.Callable;
import org.plenum.agenda.AgendaSettings;
import org.plenum.app.Agenda;
import org.plenum.app.MeetingAgenda;
import org.plenum.app.ChangeWatch;
import org.plenum.app.Meeting;
import org.plenum.app.Score;
import org.plenum.app.UsageException;
import org.plenum.app.Workspaces;
import org.plenum.score.BootstrapInterval;
import org.plenum.score.Placebo;
import org.plenum.tui.Look;
import org.plenum.tui.MeetingTerminal;
import org.plenum.tui.Sources;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

@Command(name = "meet", mixinStandardHelpOptions = true,
        description = {"The meeting screen. The first to open a cycle's meeting is its facilitator; later joiners"
                + " (on the same database, e.g. over SSH) are planners. The author of decisions is the"
                + " operating-system user."})
final class MeetCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Option(names = "--cycle", paramLabel = "C",
            description = "The cycle (default: the one open meeting, else the latest cycle with forecasts).")
    String cycle;

    @Option(names = "--budget", paramLabel = "MINUTES", description = "The meeting's time box, for the cut line.")
    Integer budget;

    @Option(names = "--lags", defaultValue = "1-3", paramLabel = "L",
            description = "Decision lags: a range like 1-3 or a list like 0,1,2 (default: ${DEFAULT-VALUE}); a"
                    + " meeting whose agenda is ranked keeps the lags it was ranked at.")
    String lags;

    @Option(names = "--ascii", description = "Plain ASCII: no block characters or box lines.")
    boolean ascii;

    @Override
    public Integer call() throws Exception {
        return meet(root, db.path, cycle, budget, lags, ascii);
    }

    /** Opens the meeting screen on {@code dbPath} (also the demo's last step). */
    static int meet(PlenumCommand root, java.nio.file.Path dbPath, String cycle, Integer budget, String lags,
            boolean ascii) throws Exception {
        int[] lagList = new AgendaOptions().lags(lags);
        if (System.console() == null) {
            throw new UsageException("plenum meet needs an interactive terminal (stdin and stdout a terminal)");
        }
        Look look = Look.fromEnvironment(root.env, ascii);
        try (Meeting meeting = Meeting.join(root.workspaces, dbPath, cycle, budget,
                Arrays.stream(lagList).boxed().toList(), System.getProperty("user.name"), java.time.Clock.systemUTC());
                ChangeWatch watch = ChangeWatch.open(root.workspaces, dbPath)) {
            MeetingTerminal.run(meeting, look, sources(root.workspaces, dbPath, meeting), watch::changed);
        }
        return ExitCodes.OK;
    }

    /** The screen's slow reads, each opening its own connection when it runs (also what {@code bench screen} uses). */
    static Sources sources(Workspaces workspaces, Path db, Meeting meeting) {
        // The meeting's lags: those its agenda was ranked at once it has one, so that every
        // screen ranks, preselects and scores alike.
        int[] lagList = meeting.lags().stream().mapToInt(Integer::intValue).toArray();
        Integer minutes = meeting.info().budgetMinutes();
        AgendaSettings settings = minutes == null ? AgendaSettings.defaults()
                : AgendaSettings.defaults().withBudget(minutes);
        long id = meeting.info().id();
        return new Sources(() -> MeetingAgenda.of(workspaces, db, id, meeting.cycle(), lagList, settings,
                java.time.Clock.systemUTC()),
                () -> MeetingAgenda.rankAgain(workspaces, db, id, meeting.cycle(), lagList, settings,
                        java.time.Clock.systemUTC()),
                () -> Agenda.guidance(workspaces, db),
                () -> Score.run(workspaces, db, lagList[0] == 0 && lagList.length > 1 ? lagList[1]
                        : lagList[0], Placebo.NAIVE, List.of(), BootstrapInterval.DEFAULT_DRAWS, false),
                () -> Meeting.recentActuals(workspaces, db, meeting.cycle(), 12));
    }
}
