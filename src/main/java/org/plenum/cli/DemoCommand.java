package org.plenum.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.plenum.app.Demo;
import org.plenum.store.Summary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Build the demo workspace from the invented scenario in demo-data/ and show what it holds.")
final class DemoCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Option(names = "--no-tui", description = "Never open a screen: print what the workspace holds.")
    boolean noTui;

    /** The time box of the demo's meeting, so that its agenda shows a cut line. */
    static final int DEMO_BUDGET_MINUTES = 60;

    @Option(names = "--regenerate", description = "Write demo-data/*.csv afresh from the scenario generator (fixed"
            + " seed) before building.")
    boolean regenerate;

    @Option(names = "--data", paramLabel = "DIR", description = "The scenario's CSV files (default: demo-data in the"
            + " Plenum folder).")
    Path data;

    @Option(names = "--db", paramLabel = "PATH", description = "Where to build it (default: meetings/demo.db in the"
            + " Plenum folder).")
    Path db;

    @Override
    public Integer call() throws Exception {
        Path home = Path.of(root.env.getOrDefault("PLENUM_HOME", System.getProperty("plenum.home", ".")));
        Path dataDir = data != null ? data : home.resolve("demo-data");
        Path target = db != null ? db : home.resolve("meetings").resolve("demo.db");
        if (regenerate) {
            Demo.regenerate(dataDir);
            root.spec.commandLine().getOut().println("wrote the demo scenario to " + dataDir);
        }
        Demo.Built built = Demo.build(root.workspaces, dataDir, target);
        print(built, root.spec.commandLine().getOut());
        if (noTui || System.console() == null) {
            root.spec.commandLine().getOut().println("The meeting screen: plenum meet --db " + built.db()
                    + " --budget 60   (needs a terminal; planners join with the same command)");
            return ExitCodes.OK;
        }
        root.spec.commandLine().getOut().flush();
        return MeetCommand.meet(root, built.db(), null, DEMO_BUDGET_MINUTES, "1-3", false);
    }

    static void print(Demo.Built built, PrintWriter out) {
        Summary s = built.summary();
        out.println((built.rebuilt() ? "built " : "up to date: ") + built.db());
        out.printf("  items      %,d in %d groups and %d regions%n", s.items(), s.groups(), s.regions());
        out.printf("  actuals    %,d (%s periods %s to %s)%n", s.actuals(), s.frequency().word(), s.firstActual(),
                s.lastActual());
        out.printf("  forecasts  cycles %s to %s:%n", s.firstCycle(), s.lastCycle());
        for (Map.Entry<String, Integer> e : s.forecastsByStep().entrySet()) {
            if (e.getKey().equals(s.ledgerStep())) {
                out.printf("             %-8s from the decision ledger%n", e.getKey());
            } else {
                out.printf("             %-8s %,d%n", e.getKey(), e.getValue());
            }
        }
        out.printf("  events     %,d%n", s.events());
        out.printf("  ledger     %,d decisions over %d cycles%n", s.decisions(), s.decidedCycles());
        out.println("With --db " + built.db() + ":");
        if (s.lastCycle() != null) {
            out.printf("  plenum agenda --cycle %-9s the cycle's items ranked for the meeting%n", s.lastCycle());
        }
        out.println("  plenum score --by author        every step and decision against a naive placebo");
        out.println("  plenum decide ... / plenum export ledger");
    }
}
