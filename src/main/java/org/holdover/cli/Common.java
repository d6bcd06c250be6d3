package org.holdover.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.holdover.project.InputException;
import org.holdover.project.Project;
import org.holdover.project.ProjectReader;
import org.holdover.sizing.ProjectAssembler;
import org.holdover.sizing.Sizing;
import org.holdover.sizing.SizingResult;
import org.holdover.sizing.SystemSearch;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Options shared by commands that read a project. */
final class Common {

    /** How long an interrupted run may take to finish writing what it found, s. */
    static final long STOP_GRACE_S = 60;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "the project file (YAML, or JSON ending in .json)")
    Path project;

    @Option(names = "--debug", description = "show a stack trace on an internal error")
    boolean debug;

    @Option(names = "--quiet", description = "no progress line while the system search runs")
    boolean quiet;

    /** Set when Ctrl-C asks the search to stop; the command then finishes with the best system found so far. */
    final AtomicBoolean stopAsked = new AtomicBoolean();
    /** Counted down when the command has finished (the interrupt waits for it). */
    final CountDownLatch finished = new CountDownLatch(1);

    SizingResult size() throws InputException {
        Project p = ProjectReader.read(project, project.toString());
        Thread hook = new Thread(() -> {
            stopAsked.set(true);
            try {
                finished.await(STOP_GRACE_S, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "holdover-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        this.hook = hook;
        ProgressLine line = !quiet && System.console() != null ? new ProgressLine(System.err) : null;
        SystemSearch.Options o = ProjectAssembler.searchOptions(p.input(), stopAsked::get, line == null ? null : line::report);
        try {
            SizingResult r = Sizing.run(ProjectAssembler.assemble(p), o);
            if (line != null) {
                line.clear();
            }
            return r;
        } catch (RuntimeException | InputException e) {
            done();
            throw e;
        }
    }

    private Thread hook;

    /** The command has finished: an interrupt need not wait any longer. */
    void done() {
        finished.countDown();
        if (hook != null && !stopAsked.get()) {
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException shuttingDown) {
                // the JVM is already stopping; the hook returns at once now
            }
            hook = null;
        }
    }

    /** A one-line progress display on a terminal: candidates done, rate and time left. */
    static final class ProgressLine {
        private final PrintStream err;
        private final long start = System.nanoTime();
        private long lastPrint;

        ProgressLine(PrintStream err) {
            this.err = err;
        }

        synchronized void report(long done, long total) {
            long now = System.nanoTime();
            if (now - lastPrint < 200_000_000L && done < total) {
                return;
            }
            lastPrint = now;
            double s = (now - start) / 1e9;
            double rate = s > 0 ? done / s : 0;
            double left = rate > 0 ? (total - done) / rate : 0;
            err.print(String.format(Locale.ROOT, "\rsearching: %,d of %,d candidates in cost order, %,.0f/s, at most %.0f s left ",
                    done, total, rate, left));
            err.flush();
        }

        synchronized void clear() {
            err.print("\r" + " ".repeat(100) + "\r");
            err.flush();
        }
    }
}
