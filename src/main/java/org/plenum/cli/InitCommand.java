package org.plenum.cli;

import java.util.List;
import java.util.concurrent.Callable;
import org.plenum.app.Init;
import org.plenum.app.Workspaces;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

@Command(name = "init", mixinStandardHelpOptions = true, description = "Create an empty workspace database.")
final class InitCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Option(names = "--steps", split = ",", paramLabel = "STEP", defaultValue = "stat,meeting,final",
            description = "The process steps in order, the statistical forecast first (default: ${DEFAULT-VALUE}).")
    List<String> steps;

    @Option(names = "--ledger-step", paramLabel = "STEP", defaultValue = Workspaces.DEFAULT_LEDGER_STEP,
            description = "The step the meeting's decisions make (default: ${DEFAULT-VALUE}).")
    String ledgerStep;

    @Override
    public Integer call() {
        Init.run(root.workspaces, db.path, steps, ledgerStep);
        root.spec.commandLine().getOut().println("created workspace " + db.path + " with steps " + String.join(" → ", steps));
        return ExitCodes.OK;
    }
}
