package org.holdover.testing;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import org.holdover.project.InputException;
import org.holdover.project.Problem;

/**
 * A small mutation fuzzer for the readers of user files, with a fixed seed.
 *
 * <p>Each try takes a real input (a demo project, a starter template, a demo profile, ...), applies one to
 * four random mutations ({@link Mutator}) and hands the bytes to a reader. The property: the reader
 * either accepts the input or throws {@link InputException}, and every problem of that exception renders
 * as one line that starts with the file's name. Anything else that escapes — a runtime exception, a stack
 * overflow, an out-of-memory error — is a crash; the input is saved under
 * {@code target/holdover-testing/fuzz/} so that it can be replayed.
 *
 * <p>Budget. In the build every reader runs its {@code ciTries}; the system property
 * {@value #SCALE_PROPERTY} multiplies that for a longer run by hand, and {@value #SEED_PROPERTY} changes
 * the seed (default {@value #DEFAULT_SEED}), for example
 * {@code mvn -B -o test -Dtest='*FuzzTest' -Dholdover.fuzz.scale=100 -Dholdover.fuzz.seed=7}.
 */
public final class Fuzz {

    /** Multiplier of every reader's number of tries (default 1). */
    public static final String SCALE_PROPERTY = "holdover.fuzz.scale";
    /** Base seed (default {@value #DEFAULT_SEED}); each reader adds its own salt. */
    public static final String SEED_PROPERTY = "holdover.fuzz.seed";
    /** The seed of the build's runs. */
    public static final long DEFAULT_SEED = 20_251_202L;
    /** Crashes listed in a failure message; more are counted. */
    private static final int MAX_LISTED = 8;

    private final String reader;
    private final long seed;
    private final int tries;
    private int accepted;
    private int refused;
    private final Map<String, String> crashes = new LinkedHashMap<>();
    private int crashCount;

    private Fuzz(String reader, long seed, int tries) {
        this.reader = reader;
        this.seed = seed;
        this.tries = tries;
    }

    /**
     * A fuzz run.
     *
     * @param reader  a name for messages and saved inputs (a single path element)
     * @param salt    added to the base seed, so readers do not share their random sequences
     * @param ciTries tries in the build; multiplied by {@value #SCALE_PROPERTY}
     */
    public static Fuzz of(String reader, long salt, int ciTries) {
        double scale = Double.parseDouble(System.getProperty(SCALE_PROPERTY, "1"));
        long base = Long.parseLong(System.getProperty(SEED_PROPERTY, Long.toString(DEFAULT_SEED)));
        return new Fuzz(reader, base + salt, (int) Math.max(1, Math.round(ciTries * scale)));
    }

    /** What one try does with its input. */
    @FunctionalInterface
    public interface Target {
        /**
         * Reads the input.
         *
         * @param input the mutated bytes
         * @param random the try's random source, for choices other than the input (options, file names)
         */
        void read(byte[] input, SplittableRandom random) throws Exception;
    }

    /**
     * Thrown by a target that checked a refusal itself (e.g. the command line's exit code 2 and its
     * lines), so that the try counts as refused rather than accepted.
     */
    public static final class Refused extends RuntimeException {
        public Refused() {
            super(null, null, false, false);
        }
    }

    /** How a try's input is made from its random source. */
    @FunctionalInterface
    public interface Source {
        byte[] next(SplittableRandom random);
    }

    /**
     * Runs every try and fails with the crashes found, if any.
     *
     * @param display the file name the reader is given, which every problem must start with
     * @param source  makes each try's input
     * @param target  reads it
     * @return the number of executions
     */
    public int run(String display, Source source, Target target) {
        SplittableRandom master = new SplittableRandom(seed);
        for (int i = 0; i < tries; i++) {
            long trySeed = master.nextLong();
            SplittableRandom random = new SplittableRandom(trySeed);
            byte[] input = source.next(random);
            try {
                target.read(input, random);
                accepted++;
            } catch (Refused e) {
                refused++;
            } catch (InputException e) {
                String bad = badRendering(e, display);
                if (bad != null) {
                    crash(i, trySeed, input, "problem does not render as one line naming " + display + ": " + bad);
                } else {
                    refused++;
                }
            } catch (Throwable t) {
                if (t instanceof VirtualMachineError && !(t instanceof StackOverflowError)) {
                    crash(i, trySeed, input, t.toString());
                    break;
                }
                crash(i, trySeed, input, stackTop(t));
            }
        }
        System.out.println(summary());
        if (crashCount > 0) {
            StringBuilder b = new StringBuilder(summary()).append('\n');
            crashes.forEach((k, v) -> b.append("  ").append(k).append("\n    input: ").append(v).append('\n'));
            throw new AssertionError(b.toString());
        }
        return tries;
    }

    /** One line: what ran and what came of it. */
    public String summary() {
        return String.format(Locale.ROOT, "fuzz %s: %d executions (seed %d), %d accepted, %d refused with one-line problems,"
                + " %d crashes", reader, tries, seed, accepted, refused, crashCount);
    }

    /** Executions so far. */
    public int executions() {
        return accepted + refused + crashCount;
    }

    /**
     * Why an input exception does not render as the command line promises, or null when it does: each
     * problem is one line that starts with the file name, with no line breaks, no control characters other
     * than a tab (a terminal escape could move the cursor or recolour the line) and no bidirectional
     * overrides (which reorder what is shown).
     */
    public static String badRendering(InputException e, String display) {
        if (e.problems().isEmpty()) {
            return "no problems";
        }
        for (Problem p : e.problems()) {
            String line = p.oneLine();
            for (int k = 0; k < line.length(); k++) {
                char c = line.charAt(k);
                if (Character.isISOControl(c) && c != '\t' || c == '\u2028' || c == '\u2029'
                        || c >= '\u202A' && c <= '\u202E' || c >= '\u2066' && c <= '\u2069') {
                    return String.format(Locale.ROOT, "control character U+%04X at %d in: %s", (int) c, k,
                            line.replaceAll("\\p{Cntrl}", "?"));
                }
            }
            if (!(line.startsWith(display + ":") || line.equals(display)) || !p.where().file().equals(display)) {
                return "does not start with the file name: " + line;
            }
        }
        return null;
    }

    private void crash(int index, long trySeed, byte[] input, String what) {
        crashCount++;
        String key = what.lines().findFirst().orElse(what);
        if (crashes.size() < MAX_LISTED && !crashes.containsKey(key)) {
            Path saved = save(index, trySeed, input);
            crashes.put(what, saved.toString());
        }
    }

    private Path save(int index, long trySeed, byte[] input) {
        try {
            Path dir = Artifacts.dir("fuzz");
            Path file = dir.resolve(reader + "-try" + index + "-seed" + trySeed + ".bin");
            Files.write(file, input);
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String stackTop(Throwable t) {
        StringWriter w = new StringWriter();
        t.printStackTrace(new PrintWriter(w));
        List<String> lines = w.toString().lines().limit(12).toList();
        return String.join("\n      ", new ArrayList<>(lines));
    }

    /** UTF-8 bytes of a text. */
    public static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }
}
