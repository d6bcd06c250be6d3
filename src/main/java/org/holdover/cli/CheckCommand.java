package org.holdover.cli;

import java.util.concurrent.Callable;
import org.holdover.sizing.SizingResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** Validates a project and sizes it without writing anything. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Read PROJECT, report every input problem, size the system and print the summary.",
            "Writes no file. Exit code 1 when no system passes every check, 2 when the input is bad."})
final class CheckCommand implements Callable<Integer> {

    @Mixin
    Common common;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        try {
            SizingResult r = common.size();
            ConsoleSummary.print(r, spec.commandLine().getOut(), spec.commandLine().getErr());
            spec.commandLine().getOut().flush();
            return r.passes() ? Main.OK : Main.FAILS_CHECKS;
        } finally {
            common.done();
        }
    }
}
