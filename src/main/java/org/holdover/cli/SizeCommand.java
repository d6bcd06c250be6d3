package org.holdover.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.holdover.report.WorkbookWriter;
import org.holdover.sizing.SizingResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Sizes a project and writes the workbook. */
@Command(name = "size", mixinStandardHelpOptions = true,
        description = {"Search the catalog for the least-cost system that passes every check for PROJECT,",
            "then write the calculation workbook (.xlsx) and print a short summary with the next best systems.",
            "Ctrl-C stops the search and keeps the best system found so far.",
            "Exit code 1 when no system in the catalog passes every check (the workbook is still written: it",
            "shows why)."})
final class SizeCommand implements Callable<Integer> {

    @Mixin
    Common common;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "workbook to write (default: reports/<project name>.xlsx in the current folder)")
    Path output;

    @Option(names = "--force", description = "replace the workbook if it exists (default: never overwrite)")
    boolean force;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        try {
            SizingResult r = common.size();
            if (r.search() != null && r.search().stats().stoppedEarly() && r.chosen() == null) {
                spec.commandLine().getErr().println("holdover: stopped before the search found a system; nothing written");
                spec.commandLine().getErr().flush();
                return Main.STOPPED;
            }
            Path target = output != null ? output : defaultOutput(common.project);
            PrintWriter out = spec.commandLine().getOut();
            try {
                WorkbookWriter.write(r, target, force);
            } catch (WorkbookWriter.TargetExistsException e) {
                throw new Main.UserError(target + " already exists; add --force to replace it, or -o to write elsewhere");
            } catch (IOException e) {
                throw new Main.UserError("cannot write " + target + ": " + e.getMessage());
            }
            ConsoleSummary.print(r, out, spec.commandLine().getErr());
            out.println("Workbook: " + target);
            out.flush();
            return r.passes() ? Main.OK : Main.FAILS_CHECKS;
        } finally {
            common.done();
        }
    }

    static Path defaultOutput(Path project) {
        String name = project.getFileName().toString().replaceFirst("\\.(ya?ml|json)$", "");
        return Path.of("reports", name + ".xlsx");
    }
}
