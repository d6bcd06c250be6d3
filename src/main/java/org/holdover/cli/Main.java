package org.holdover.cli;

import java.io.PrintWriter;
import org.holdover.project.InputException;
import org.holdover.project.Problem;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The holdover command line. Exit codes: 0 success; 1 the sizing found no system that passes every
 * check; 2 bad input (one line per problem on stderr); 3 internal error (stack trace with --debug).
 */
@Command(name = "holdover", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = {"Sizes solar off-grid and battery-backup power systems: inverter, DC bus voltage and battery bank,",
            "from a project file of loads, and writes an Excel workbook whose every number is a live formula."},
        subcommands = {SizeCommand.class, CheckCommand.class, InitCommand.class, CommandLine.HelpCommand.class},
        footer = {"", "Exit codes: 0 done; 1 no system passes every check; 2 bad input; 3 internal error.",
            "This tool sizes equipment that can burn and shock: a qualified installer and local codes decide."})
public final class Main implements Runnable {

    /** Exit codes. */
    public static final int OK = 0;
    public static final int FAILS_CHECKS = 1;
    public static final int BAD_INPUT = 2;
    public static final int INTERNAL = 3;
    /** Stopped by the user (Ctrl-C) before the search found any system: nothing written (128 + SIGINT). */
    public static final int STOPPED = 130;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "name a command: size, check or init (see --help)");
    }

    public static void main(String[] args) {
        quietLibraryLogging();
        System.exit(newCommandLine().execute(args));
    }

    /** The spreadsheet library logs through Log4j's API; without a provider it complains on stderr. */
    static void quietLibraryLogging() {
        System.setProperty("log4j2.loggerContextFactory", "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
        System.setProperty("org.apache.logging.log4j.simplelog.level", "OFF");
        System.setProperty("log4j2.statusLoggerLevel", "OFF");
    }

    /** A configured command line (used by main and by in-process tests). */
    public static CommandLine newCommandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExecutionExceptionHandler(Main::handle);
        cl.setParameterExceptionHandler((ex, args) -> {
            PrintWriter err = ex.getCommandLine().getErr();
            err.println("holdover: " + ex.getMessage());
            err.println("try: holdover " + ex.getCommandLine().getCommandName().replace("holdover", "").strip() + " --help");
            err.flush();
            return BAD_INPUT;
        });
        cl.setExitCodeExceptionMapper(t -> t instanceof InputException ? BAD_INPUT : INTERNAL);
        return cl;
    }

    private static int handle(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        PrintWriter err = cl.getErr();
        if (ex instanceof InputException ie) {
            for (Problem p : ie.problems()) {
                err.println(p.oneLine());
            }
            err.flush();
            return BAD_INPUT;
        }
        if (ex instanceof UserError ue) {
            err.println("holdover: " + ue.getMessage());
            err.flush();
            return BAD_INPUT;
        }
        boolean debug = parsed.subcommand() != null && parsed.subcommand().hasMatchedOption("--debug");
        err.println("holdover: internal error: " + ex + (debug ? "" : " (run again with --debug for details, and please report it)"));
        if (debug) {
            ex.printStackTrace(err);
        }
        err.flush();
        return INTERNAL;
    }

    /** A user mistake that is not about a file's content (e.g. an output file that exists). */
    static final class UserError extends Exception {
        UserError(String message) {
            super(message);
        }
    }

    /** Reads the version from the jar manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"holdover " + (v == null ? "(development build)" : v)};
        }
    }
}
