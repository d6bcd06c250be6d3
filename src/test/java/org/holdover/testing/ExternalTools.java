package org.holdover.testing;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.opentest4j.AssertionFailedError;

/**
 * Finds and runs the external programs the workbook checks need.
 *
 * <p>When a program is missing, a test that needs it is skipped (a JUnit assumption) with a message
 * that says how to install it; when the environment variable {@code CI} is {@code true} the test fails
 * instead, so that a CI machine without the program cannot pass by skipping.
 */
public final class ExternalTools {

    /** The command that installs the spreadsheet application on Debian 12. */
    public static final String OFFICE_INSTALL = "apt-get install -y --no-install-recommends libreoffice-calc-nogui";

    /** The command that installs pdfinfo, pdftotext and pdftoppm on Debian 12. */
    public static final String PDF_TOOLS_INSTALL = "apt-get install -y --no-install-recommends poppler-utils";

    private static final List<Path> OFFICE_FALLBACKS = List.of(
            Path.of("/usr/bin/soffice"), Path.of("/usr/lib/libreoffice/program/soffice"),
            Path.of("/opt/libreoffice/program/soffice"));

    private ExternalTools() {
    }

    /**
     * The spreadsheet application's command ({@code soffice}), or a skipped/failed test when missing.
     *
     * @return the absolute path of {@code soffice}
     */
    public static Path requireOffice() {
        Optional<Path> office = onPath("soffice").or(() -> OFFICE_FALLBACKS.stream().filter(Files::isExecutable).findFirst());
        require(office.isPresent(), "LibreOffice Calc (soffice)", OFFICE_INSTALL, System.getenv());
        return office.orElseThrow();
    }

    /**
     * Checks that poppler's {@code pdfinfo}, {@code pdftotext} and {@code pdftoppm} are on the PATH, or
     * skips/fails the test.
     */
    public static void requirePdfTools() {
        boolean all = onPath("pdfinfo").isPresent() && onPath("pdftotext").isPresent() && onPath("pdftoppm").isPresent();
        require(all, "poppler-utils (pdfinfo, pdftotext, pdftoppm)", PDF_TOOLS_INSTALL, System.getenv());
    }

    /**
     * Skips the running test, or fails it on CI, when a program is missing.
     *
     * @param present whether the program was found
     * @param what the program's name for the message
     * @param install the command that installs it
     * @param environment the process environment; {@code CI=true} turns a skip into a failure
     */
    static void require(boolean present, String what, String install, Map<String, String> environment) {
        if (present) {
            return;
        }
        String message = what + " is not installed; install it with: " + install;
        if ("true".equalsIgnoreCase(environment.getOrDefault("CI", ""))) {
            throw new AssertionFailedError(message + " (CI=true, so this is a failure, not a skip)");
        }
        Assumptions.abort(message);
    }

    /**
     * Looks a program up on the PATH.
     *
     * @param name the program's file name
     * @return its path when an executable file of that name is on the PATH
     */
    static Optional<Path> onPath(String name) {
        String path = System.getenv("PATH");
        if (path == null) {
            return Optional.empty();
        }
        for (String dir : path.split(File.pathSeparator)) {
            if (dir.isEmpty()) {
                continue;
            }
            Path candidate = Path.of(dir, name);
            if (Files.isRegularFile(candidate) && Files.isExecutable(candidate)) {
                return Optional.of(candidate.toAbsolutePath());
            }
        }
        return Optional.empty();
    }

    /**
     * Runs a command, its standard output and error going to a log file, and waits for it.
     *
     * @param command the command and its arguments
     * @param log the file that receives standard output and error (overwritten)
     * @param timeout how long to wait before the command and its child processes are ended
     * @return the exit code
     * @throws IllegalStateException when the command does not finish in time or cannot start
     */
    static int run(List<String> command, Path log, Duration timeout) {
        ProcessBuilder builder = new ProcessBuilder(command)
                .redirectErrorStream(true)
                .redirectOutput(log.toFile())
                .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null")));
        Process process;
        try {
            process = builder.start();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot start " + command.get(0), e);
        }
        try {
            if (!process.waitFor(timeout.toMillis(), TimeUnit.MILLISECONDS)) {
                process.descendants().forEach(ProcessHandle::destroyForcibly);
                process.destroyForcibly();
                process.waitFor(10, TimeUnit.SECONDS);
                throw new IllegalStateException(command.get(0) + " did not finish within " + timeout.toSeconds()
                        + " s and was ended; its output:\n" + tail(log));
            }
            return process.exitValue();
        } catch (InterruptedException e) {
            process.descendants().forEach(ProcessHandle::destroyForcibly);
            process.destroyForcibly();
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for " + command.get(0), e);
        }
    }

    /**
     * Runs a command and returns its standard output; standard error goes to the log.
     *
     * @param command the command and its arguments
     * @param log the file that receives standard error
     * @param timeout how long to wait
     * @return standard output, decoded as UTF-8
     * @throws IllegalStateException when the command exits non-zero or does not finish in time
     */
    static String output(List<String> command, Path log, Duration timeout) {
        Path out = log.resolveSibling(log.getFileName() + ".out");
        ProcessBuilder builder = new ProcessBuilder(command)
                .redirectOutput(out.toFile())
                .redirectError(log.toFile())
                .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null")));
        try {
            Process process = builder.start();
            if (!process.waitFor(timeout.toMillis(), TimeUnit.MILLISECONDS)) {
                process.destroyForcibly();
                throw new IllegalStateException(String.join(" ", command) + " did not finish within "
                        + timeout.toSeconds() + " s");
            }
            if (process.exitValue() != 0) {
                throw new IllegalStateException(String.join(" ", command) + " exited with " + process.exitValue()
                        + ":\n" + tail(log));
            }
            return new String(Files.readAllBytes(out), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot run " + command.get(0), e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for " + command.get(0), e);
        } finally {
            try {
                Files.deleteIfExists(out);
            } catch (IOException ignored) {
                // a left-over file under target/ does no harm
            }
        }
    }

    /** The last 4,000 characters of a log file, for error messages. */
    static String tail(Path log) {
        try {
            String text = new String(Files.readAllBytes(log), StandardCharsets.UTF_8);
            return text.length() <= 4000 ? text : "..." + text.substring(text.length() - 4000);
        } catch (IOException e) {
            return "(no output: " + e.getMessage() + ")";
        }
    }
}
