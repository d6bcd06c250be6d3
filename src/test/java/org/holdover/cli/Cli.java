package org.holdover.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the command line in-process, capturing what it prints. */
final class Cli {

    final int exit;
    final String out;
    final String err;

    private Cli(int exit, String out, String err) {
        this.exit = exit;
        this.out = out;
        this.err = err;
    }

    static Cli run(String... args) {
        Main.quietLibraryLogging();
        CommandLine cl = Main.newCommandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int exit = cl.execute(args);
        return new Cli(exit, out.toString(), err.toString());
    }
}
