package org.plenum.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;

/** Runs the real command line in-process and keeps what it printed. */
record CliRun(int code, String out, String err) {
    static CliRun of(Map<String, String> env, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.create(new PrintWriter(out, true), new PrintWriter(err, true), env, args).execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }

    static CliRun of(String... args) {
        return of(Map.of(), args);
    }
}
