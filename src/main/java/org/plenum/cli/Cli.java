package org.plenum.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Map;
import org.plenum.app.UsageException;
import org.plenum.core.BadInputException;
import org.plenum.store.NoWorkspaceException;
import org.plenum.store.StoreBusyException;
import picocli.CommandLine;

/** Builds the configured command line for {@code main} and for tests alike. */
public final class Cli {
    private Cli() {}

    /** The command line with every subcommand. */
    public static CommandLine create(PrintWriter out, PrintWriter err, Map<String, String> env) {
        return create(out, err, env, new String[0]);
    }

    /**
     * The command line for {@code args}: when they start with a subcommand's name, with that
     * subcommand only. picocli reads every option of every subcommand it is given, by
     * reflection, which is most of a command's start; help and mistakes still get them all.
     */
    public static CommandLine create(PrintWriter out, PrintWriter err, Map<String, String> env, String[] args) {
        CommandLine cl = new CommandLine(new PlenumCommand(env));
        List<Class<?>> named = PlenumCommand.SUBCOMMANDS.stream()
                .filter(c -> args.length > 0 && c.getAnnotation(CommandLine.Command.class).name().equals(args[0]))
                .toList();
        (named.isEmpty() ? PlenumCommand.SUBCOMMANDS : named).forEach(cl::addSubcommand);
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setParameterExceptionHandler(Cli::usageError);
        cl.setExecutionExceptionHandler((e, cmd, parsed) -> failure(e, cmd, env));
        return cl;
    }

    private static int usageError(CommandLine.ParameterException e, String[] args) {
        PrintWriter err = e.getCommandLine().getErr();
        err.println("plenum: " + e.getMessage());
        err.println("see: plenum " + e.getCommandLine().getCommandSpec().qualifiedName(" ").replaceFirst("^plenum ?", "")
                + (e.getCommandLine().getCommandSpec().name().equals("plenum") ? "" : " ") + "--help");
        return ExitCodes.USAGE;
    }

    /** One line per problem, never a stack trace unless PLENUM_DEBUG is set. */
    private static int failure(Exception e, CommandLine cmd, Map<String, String> env) {
        PrintWriter err = cmd.getErr();
        if (e instanceof BadInputException bad) {
            bad.problems().forEach(p -> err.println(p));
            return ExitCodes.BAD_INPUT;
        }
        if (e instanceof StoreBusyException) {
            err.println("plenum: " + e.getMessage());
            return ExitCodes.BUSY;
        }
        if (e instanceof UsageException || e instanceof NoWorkspaceException) {
            err.println("plenum: " + e.getMessage());
            return ExitCodes.USAGE;
        }
        err.println("plenum: " + e.getClass().getSimpleName() + ": " + e.getMessage());
        if (env.get("PLENUM_DEBUG") != null) {
            e.printStackTrace(err);
        } else {
            err.println("(set PLENUM_DEBUG=1 to see where it happened)");
        }
        return ExitCodes.USAGE;
    }
}
