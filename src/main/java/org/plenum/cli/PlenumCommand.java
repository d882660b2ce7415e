package org.plenum.cli;

import java.util.List;
import java.util.Map;
import org.plenum.app.Workspaces;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The root command: only lists the subcommands. */
@Command(name = "plenum", mixinStandardHelpOptions = true, version = "plenum 0.1.0",
        description = "Runs the demand review meeting and scores every decision against a naive benchmark.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:usage error", "2:bad input data (nothing was changed)",
            "3:the workspace stayed busy (locked by another process) past the timeout"})
final class PlenumCommand implements Runnable {
    /** The subcommands, in the order help lists them; {@link Cli} adds them. */
    static final List<Class<?>> SUBCOMMANDS = List.of(InitCommand.class, ImportCommand.class, AgendaCommand.class,
            MeetCommand.class, DecideCommand.class, ScoreCommand.class, ExportCommand.class, TagsCommand.class,
            DemoCommand.class, BenchCommand.class);

    final Map<String, String> env;
    final Workspaces workspaces;

    @Spec
    CommandSpec spec;

    PlenumCommand(Map<String, String> env) {
        this.env = env;
        this.workspaces = new Workspaces(env);
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
