package org.plenum.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.plenum.app.Score;
import org.plenum.score.BootstrapInterval;
import org.plenum.score.Placebo;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

@Command(name = "score", mixinStandardHelpOptions = true,
        description = "Score every process step at one lag against a naive placebo, on the same (item, period)"
                + " pairs, with the evidence for each difference.")
final class ScoreCommand implements Callable<Integer> {
    enum Format { table, csv, json }

    enum PlaceboOption { naive, seasonal }

    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Option(names = "--lag", defaultValue = "1", paramLabel = "L",
            description = "Periods between cycle and target period (default: ${DEFAULT-VALUE}).")
    int lag;

    @Option(names = "--placebo", defaultValue = "naive", paramLabel = "P",
            description = "naive (last actual known) or seasonal (same period a season earlier); default ${DEFAULT-VALUE}.")
    PlaceboOption placebo;

    @Option(names = "--by", paramLabel = "FIELD", description = "Break down by group, region, item, cycle, an item"
            + " attribute, or (decisions only) author, tag, reason, direction, size; may be repeated.")
    java.util.List<String> by = new java.util.ArrayList<>();

    @Option(names = "--format", defaultValue = "table", description = "table, csv or json (default: ${DEFAULT-VALUE}).")
    Format format;

    @Option(names = "--draws", defaultValue = "" + BootstrapInterval.DEFAULT_DRAWS, paramLabel = "N",
            description = "Bootstrap draws for the AvgRelMAE interval (default: ${DEFAULT-VALUE}).")
    int draws;

    @Override
    public Integer call() {
        Score.Report report = Score.run(root.workspaces, db.path, lag,
                placebo == PlaceboOption.naive ? Placebo.NAIVE : Placebo.SEASONAL, by, draws);
        PrintWriter out = root.spec.commandLine().getOut();
        switch (format) {
            case table -> ScoreFormats.table(report, out);
            case csv -> ScoreFormats.csv(report, out);
            case json -> ScoreFormats.json(report, out);
        }
        return ExitCodes.OK;
    }
}
