package org.plenum.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.Callable;
import org.plenum.app.ExportLedger;
import org.plenum.app.UsageException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

@Command(name = "export", mixinStandardHelpOptions = true,
        description = "Export the decision ledger as CSV (RFC 4180), one row per decision.")
final class ExportCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "WHAT", description = "ledger")
    String what;

    @Option(names = "--cycle", paramLabel = "C", description = "Only this cycle's decisions.")
    String cycle;

    @Option(names = "--out", paramLabel = "FILE", description = "Write here instead of standard output.")
    Path out;

    @Override
    public Integer call() throws IOException {
        if (!what.equals("ledger")) {
            throw new UsageException("export: expected ledger, found \"" + what + "\"");
        }
        if (out == null) {
            PrintWriter stdout = root.spec.commandLine().getOut();
            ExportLedger.run(root.workspaces, db.path, cycle, stdout);
            stdout.flush();
            return ExitCodes.OK;
        }
        int rows = writeAtomically(out, w -> ExportLedger.run(root.workspaces, db.path, cycle, w));
        root.spec.commandLine().getOut().println("exported " + rows + " decisions to " + out);
        return ExitCodes.OK;
    }

    /** Writes beside the target and renames, so a failed export never leaves half a file. */
    static int writeAtomically(Path target, java.util.function.ToIntFunction<Writer> body) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, ".plenum-export-", ".csv");
        try {
            int rows;
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                rows = body.applyAsInt(w);
            }
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return rows;
        } catch (UncheckedIOException e) {
            Files.deleteIfExists(tmp);
            throw e.getCause();
        } catch (IOException | RuntimeException e) {
            Files.deleteIfExists(tmp);
            throw e;
        }
    }
}
