package org.holdover.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.Callable;
import java.util.function.UnaryOperator;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Writes a commented starter project. */
@Command(name = "init", mixinStandardHelpOptions = true,
        description = {"Write a commented starter project file to fill in (it sizes as it is, with example loads)."})
final class InitCommand implements Callable<Integer> {

    /** Kinds of starter project. */
    enum Kind { backup, off_grid }

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "file to create (default: project.yaml)")
    Path file = Path.of("project.yaml");

    @Option(names = "--mode", paramLabel = "MODE", description = "backup or off_grid (default: ${DEFAULT-VALUE})")
    Kind mode = Kind.backup;

    @Option(names = "--force", description = "replace FILE if it exists")
    boolean force;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Wraps the temporary file's stream: a seam for tests that make the write fail part way. */
    UnaryOperator<OutputStream> wrap = UnaryOperator.identity();

    @Override
    public Integer call() throws Exception {
        String resource = mode == Kind.backup ? "starter-backup.yaml" : "starter-off-grid.yaml";
        byte[] text;
        try (InputStream in = InitCommand.class.getResourceAsStream(resource)) {
            text = in.readAllBytes();
        }
        Path dir = file.toAbsolutePath().getParent();
        try {
            Files.createDirectories(dir);
            Path tmp = Files.createTempFile(dir, ".holdover-", ".yaml.part");
            try {
                try (OutputStream out = wrap.apply(Files.newOutputStream(tmp))) {
                    out.write(text);
                }
                if (force) {
                    Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                } else {
                    if (Files.exists(file)) {
                        throw new FileAlreadyExistsException(file.toString());
                    }
                    Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE);
                }
            } finally {
                Files.deleteIfExists(tmp);
            }
        } catch (FileAlreadyExistsException e) {
            throw new Main.UserError(file + " already exists; add --force to replace it");
        } catch (IOException e) {
            throw new Main.UserError("cannot write " + file + ": " + e.getMessage());
        }
        spec.commandLine().getOut().println("Wrote " + file + ". Fill in the site, loads and outage, then run: holdover size " + file);
        spec.commandLine().getOut().flush();
        return Main.OK;
    }
}
