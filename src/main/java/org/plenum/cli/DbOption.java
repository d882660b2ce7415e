package org.plenum.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/** The {@code --db} option every command takes. */
final class DbOption {
    @Option(names = "--db", paramLabel = "PATH", defaultValue = "${env:PLENUM_DB:-meetings/plenum.db}",
            description = "Workspace database (default: ${DEFAULT-VALUE}; env PLENUM_DB).")
    Path path;
}
