package org.holdover.cli;

import java.nio.file.Path;
import org.holdover.project.InputException;
import org.holdover.project.Project;
import org.holdover.project.ProjectReader;
import org.holdover.sizing.ProjectAssembler;
import org.holdover.sizing.Sizing;
import org.holdover.sizing.SizingResult;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Options shared by commands that read a project. */
final class Common {

    @Parameters(index = "0", paramLabel = "PROJECT", description = "the project file (YAML, or JSON ending in .json)")
    Path project;

    @Option(names = "--debug", description = "show a stack trace on an internal error")
    boolean debug;

    SizingResult size() throws InputException {
        Project p = ProjectReader.read(project, project.toString());
        return Sizing.run(ProjectAssembler.assemble(p));
    }
}
