package org.plenum.cli;

import java.io.PrintWriter;
import java.math.BigDecimal;
import java.util.List;
import java.util.concurrent.Callable;
import org.plenum.app.Decide;
import org.plenum.app.DecisionRequest;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

@Command(name = "decide", mixinStandardHelpOptions = true,
        description = "Log a decision without the meeting screen; the author is the operating-system user.")
final class DecideCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "ITEM")
    String item;

    @Option(names = "--cycle", required = true, paramLabel = "C", description = "The cycle decided, e.g. 2026-12.")
    String cycle;

    @Option(names = "--period", required = true, split = ",", paramLabel = "P",
            description = "Target period(s) of the cycle, comma-separated.")
    List<String> periods;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Change change;

    static final class Change {
        @Option(names = "--qty", paramLabel = "Q", description = "New absolute quantity.")
        String quantity;

        @Option(names = "--pct", paramLabel = "X", description = "Relative change in percent, e.g. 12 or -30.")
        BigDecimal percent;

        @Option(names = "--keep", description = "Reviewed, no change.")
        boolean keep;
    }

    @Option(names = "--reason", required = true, paramLabel = "TEXT", description = "Why (required).")
    String reason;

    @Option(names = "--tag", required = true, paramLabel = "TAG", description = "Event tag (see: plenum tags).")
    String tag;

    @Option(names = "--minutes", paramLabel = "M", description = "Minutes spent on it.")
    String minutes;

    @Option(names = "--step", paramLabel = "S", description = "The step decided (default: the workspace's ledger step).")
    String step;

    @Override
    public Integer call() {
        DecisionRequest request = new DecisionRequest(item, cycle, periods, change.quantity, change.percent,
                change.keep, reason, tag, minutes, step, System.getProperty("user.name"));
        List<Decide.Recorded> recorded = Decide.run(root.workspaces, db.path, request);
        PrintWriter out = root.spec.commandLine().getOut();
        for (Decide.Recorded r : recorded) {
            out.println("decision " + r.id() + ": " + item + " " + r.period() + " " + r.prior() + " -> " + r.quantity()
                    + (r.kept() ? " (kept)" : ""));
        }
        return ExitCodes.OK;
    }
}
