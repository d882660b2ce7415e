package org.plenum.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.plenum.app.Imports;
import org.plenum.io.ImportKind;
import org.plenum.io.ImportResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

@Command(name = "import", mixinStandardHelpOptions = true,
        description = "Import a CSV file of items, actuals, forecasts or events in one transaction: a file with any"
                + " bad row changes nothing.")
final class ImportCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "KIND", description = "One of: ${COMPLETION-CANDIDATES}.")
    ImportKind kind;

    @Parameters(index = "1", paramLabel = "FILE", description = "UTF-8 CSV with a header row.")
    Path file;

    @Option(names = "--replace", description = "Overwrite values whose key the workspace already holds.")
    boolean replace;

    @Override
    public Integer call() {
        PrintWriter out = root.spec.commandLine().getOut();
        ImportResult result;
        try (ProgressBarReporter progress = ProgressBarReporter.forStderr("import " + kind.word())) {
            result = Imports.run(root.workspaces, db.path, kind, file, replace, progress);
        }
        out.println(summary(result));
        return ExitCodes.OK;
    }

    static String summary(ImportResult r) {
        return String.format(Locale.ROOT, "imported %,d rows of %s from %s in %.1f s", r.rows(), r.kind().word(), r.file(),
                r.elapsed().toMillis() / 1000.0);
    }
}
