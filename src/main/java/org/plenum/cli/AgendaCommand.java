package org.plenum.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.plenum.agenda.AgendaSettings;
import org.plenum.app.Agenda;
import org.plenum.app.UsageException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

@Command(name = "agenda", mixinStandardHelpOptions = true,
        description = {"Rank the cycle's items for the meeting: where the statistical forecast stands to be most"
                + " wrong and review has helped, with a hands-off warning where review has made it worse.",
            "priority = stake x max(gain, floor), raised for items with an event tag in the window."})
final class AgendaCommand implements Callable<Integer> {
    enum Format { table, csv, json }

    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Option(names = "--cycle", required = true, paramLabel = "C", description = "The cycle to rank, e.g. 2026-12.")
    String cycle;

    @Option(names = "--lags", defaultValue = "1-3", paramLabel = "L",
            description = "Decision lags: a range like 1-3 or a list like 0,1,2 (default: ${DEFAULT-VALUE}).")
    String lags;

    @Option(names = "--limit", paramLabel = "N", description = "Show only the first N ranks (default: all).")
    Integer limit;

    @Option(names = "--budget", paramLabel = "MINUTES",
            description = "The meeting's time budget: draws the cut line (default: no cut line).")
    String budget;

    @Option(names = "--format", defaultValue = "table", description = "table, csv or json (default: ${DEFAULT-VALUE}).")
    Format format;

    @Option(names = "--event-factor", paramLabel = "F", defaultValue = "1.5",
            description = "Priority multiplier for an event tag in the window, at least 1 (default: ${DEFAULT-VALUE}).")
    String eventFactor;

    @Option(names = "--gain-floor", paramLabel = "G", defaultValue = "0.05",
            description = "Least gain credited to review, 0 to below 1 (default: ${DEFAULT-VALUE}).")
    String gainFloor;

    @Option(names = "--abc", paramLabel = "A,B", defaultValue = "80,95",
            description = "Cumulative shares in percent where A and B end (default: ${DEFAULT-VALUE}).")
    String abc;

    @Option(names = "--abc-by", paramLabel = "BASIS", defaultValue = "auto",
            description = "value, volume, or auto: value when every item has a unit value (default: ${DEFAULT-VALUE}).")
    AgendaSettings.AbcBasis abcBy;

    @Option(names = "--xyz", paramLabel = "X,Y", defaultValue = "0.5,1.0",
            description = "Coefficients of variation where X and Y end (default: ${DEFAULT-VALUE}).")
    String xyz;

    @Override
    public Integer call() {
        AgendaOptions options = new AgendaOptions();
        int[] lagList = options.lags(lags);
        AgendaSettings settings = options.settings(budget, eventFactor, gainFloor, abc, abcBy, xyz);
        if (limit != null && limit < 1) {
            throw new UsageException("--limit: expected a whole number of rows, at least 1, found " + limit);
        }
        Agenda.Report report = Agenda.run(root.workspaces, db.path, cycle, lagList, settings);
        PrintWriter out = root.spec.commandLine().getOut();
        AgendaFormats formats = new AgendaFormats(report, settings, limit == null ? Integer.MAX_VALUE : limit);
        switch (format) {
            case table -> formats.table(out);
            case csv -> formats.csv(out);
            case json -> formats.json(out);
        }
        out.flush();
        return ExitCodes.OK;
    }
}
