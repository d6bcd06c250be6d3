package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.holdover.testing.FailingOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code holdover init} loses nothing when writing fails part way: a project file already at the target
 * (replaced only with {@code --force}) stays byte for byte as it was, and no partial or temporary file is
 * left. The failure is injected through the command's stream seam.
 */
class InitNothingLostTest {

    /** The user's own project, which must survive (demo data). */
    private static final byte[] MINE = "# my project, hours of work (demo data)\nname: Mine\n".getBytes(StandardCharsets.UTF_8);

    private record Result(int exit, String out, String err) {
    }

    /** Runs {@code init} in-process with the file stream wrapped. */
    private static Result init(UnaryOperator<OutputStream> wrap, String... args) {
        Main.quietLibraryLogging();
        CommandLine cl = Main.newCommandLine();
        InitCommand command = cl.getSubcommands().get("init").getCommand();
        command.wrap = wrap;
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        String[] all = new String[args.length + 1];
        all[0] = "init";
        System.arraycopy(args, 0, all, 1, args.length);
        int exit = cl.execute(all);
        return new Result(exit, out.toString(), err.toString());
    }

    @Test
    void aFailedForcedInitLeavesTheUsersProjectAndNoOtherFile(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("project.yaml");
        Files.write(file, MINE);
        for (long n : new long[] {0, 1, 100, 1000}) {
            for (boolean unchecked : new boolean[] {false, true}) {
                Result r = init(FailingOutputStream.after(n, unchecked), file.toString(), "--force");
                assertThat(r.exit()).as(r.err()).isEqualTo(unchecked ? Main.INTERNAL : Main.BAD_INPUT);
                if (!unchecked) {
                    assertThat(r.err().strip()).isEqualTo("holdover: cannot write " + file + ": " + FailingOutputStream.MESSAGE);
                }
                assertThat(Files.readAllBytes(file)).as("the user's project after a failure at %d bytes", n).isEqualTo(MINE);
                assertThat(names(dir)).containsExactly("project.yaml");
            }
        }
    }

    @Test
    void aFailedFirstInitLeavesNothing(@TempDir Path dir) {
        Path file = dir.resolve("new").resolve("project.yaml");
        Result r = init(FailingOutputStream.after(500, false), file.toString());
        assertThat(r.exit()).isEqualTo(Main.BAD_INPUT);
        assertThat(names(file.getParent())).isEmpty();
    }

    @Test
    void withoutForceTheUsersProjectIsNotTouched(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("project.yaml");
        Files.write(file, MINE);
        Result r = init(UnaryOperator.identity(), file.toString(), "--mode", "off_grid");
        assertThat(r.exit()).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err()).contains("already exists; add --force to replace it");
        assertThat(Files.readAllBytes(file)).isEqualTo(MINE);
        assertThat(names(dir)).containsExactly("project.yaml");
    }

    @Test
    void theSeamPassesAGoodWriteThrough(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("project.yaml");
        Result r = init(FailingOutputStream.after(Long.MAX_VALUE, false), file.toString());
        assertThat(r.exit()).as(r.err()).isEqualTo(Main.OK);
        try (var in = InitCommand.class.getResourceAsStream("starter-backup.yaml")) {
            assertThat(Files.readAllBytes(file)).isEqualTo(in.readAllBytes());
        }
        assertThat(names(dir)).containsExactly("project.yaml");
    }

    private static List<String> names(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
