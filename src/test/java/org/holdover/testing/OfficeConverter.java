package org.holdover.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * Runs LibreOffice headless once over several files, with a fresh throw-away profile.
 *
 * <p>The profile's {@code user/registrymodifications.xcu} is seeded before the start: Calc's
 * recalculation-on-load mode for OOXML files (and for ODF files) is set to "always"
 * ({@code /org.openoffice.Office.Calc/Formula/Load}, {@code OOXMLRecalcMode = 0}; without it Calc
 * trusts the cached values of an .xlsx file and ignores the file's full-calculation-on-load flag), and
 * the locale is pinned to en-US so that number formats and function names do not follow the machine.
 * {@code soffice} exits 0 even when a conversion failed, so every expected output file is checked.
 */
final class OfficeConverter {

    /** Start-up of soffice takes about 4-6 s on a 2-core machine; the rest is per file. */
    private static final Duration BASE_TIMEOUT = Duration.ofSeconds(180);
    private static final Duration TIMEOUT_PER_FILE = Duration.ofSeconds(60);

    private static final String REGISTRY = """
            <?xml version="1.0" encoding="UTF-8"?>
            <oor:items xmlns:oor="http://openoffice.org/2001/registry" \
            xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">
            <item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>%1$d</value></prop></item>
            <item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="ODFRecalcMode" oor:op="fuse"><value>%1$d</value></prop></item>
            <item oor:path="/org.openoffice.Setup/L10N"><prop oor:name="ooLocale" oor:op="fuse"><value>en-US</value></prop></item>
            <item oor:path="/org.openoffice.Setup/L10N"><prop oor:name="ooSetupSystemLocale" oor:op="fuse"><value>en-US</value></prop></item>
            <item oor:path="/org.openoffice.Office.Linguistic/General"><prop oor:name="DefaultLocale" oor:op="fuse"><value>en-US</value></prop></item>
            </oor:items>
            """;

    /** Recalculation on load: 0 = always, 1 = never (values as cached), 2 = ask (never when headless). */
    enum Recalc {
        ALWAYS(0), NEVER(1);

        final int registryValue;

        Recalc(int registryValue) {
            this.registryValue = registryValue;
        }
    }

    /**
     * The files one run produced, in the order of its inputs.
     *
     * @param outputs converted files, one per input, same order
     * @param runDir the run's folder (inputs copied to {@code in/}, outputs in {@code out/}, {@code soffice.log})
     * @param elapsed wall time of the soffice process
     */
    record Conversion(List<Path> outputs, Path runDir, Duration elapsed) {
        Conversion {
            outputs = List.copyOf(outputs);
        }
    }

    private OfficeConverter() {
    }

    /**
     * Converts files in one soffice run.
     *
     * @param inputs files to convert; copied first into the run's {@code in/} folder under unique names,
     *     so inputs may share a file name and are never overwritten
     * @param convertTo soffice's {@code --convert-to} argument, for example {@code xlsx} or
     *     {@code pdf:calc_pdf_Export:{...}}
     * @param outputExtension extension of the produced files, for example {@code xlsx} or {@code pdf}
     * @param kind a short word naming the run's folder
     * @param recalc whether formulas are recalculated on load
     * @return the produced files and where the run left its log
     */
    static Conversion convert(List<Path> inputs, String convertTo, String outputExtension, String kind, Recalc recalc) {
        if (inputs.isEmpty()) {
            throw new IllegalArgumentException("no files to convert");
        }
        Path office = ExternalTools.requireOffice();
        Path runDir = Artifacts.newRunDir(kind);
        Path in = Artifacts.createDirectories(runDir.resolve("in"));
        Path out = Artifacts.createDirectories(runDir.resolve("out"));
        Path profile = runDir.resolve("profile");
        Path log = runDir.resolve("soffice.log");
        List<String> command = new ArrayList<>(List.of(office.toString(),
                "-env:UserInstallation=" + profile.toUri(),
                "--headless", "--norestore", "--nologo", "--nodefault", "--nolockcheck",
                "--convert-to", convertTo, "--outdir", out.toString()));
        List<Path> expected = new ArrayList<>();
        try {
            writeProfile(profile, recalc);
            for (int i = 0; i < inputs.size(); i++) {
                Path source = inputs.get(i);
                if (!Files.isRegularFile(source)) {
                    throw new IllegalArgumentException("no such file: " + source);
                }
                String name = String.format("%03d-%s", i, source.getFileName());
                Path staged = in.resolve(name);
                Files.copy(source, staged, StandardCopyOption.REPLACE_EXISTING);
                command.add(staged.toString());
                expected.add(out.resolve(stem(name) + "." + outputExtension));
            }
            Duration timeout = BASE_TIMEOUT.plus(TIMEOUT_PER_FILE.multipliedBy(inputs.size()));
            long start = System.nanoTime();
            int exit = ExternalTools.run(command, log, timeout);
            Duration elapsed = Duration.ofNanos(System.nanoTime() - start);
            Files.writeString(runDir.resolve("timing.txt"), "soffice --convert-to " + convertTo + ": "
                    + elapsed.toMillis() + " ms wall time for " + inputs.size() + " file(s), exit " + exit + "\n");
            List<Path> missing = expected.stream().filter(p -> !isNonEmptyFile(p)).toList();
            if (exit != 0 || !missing.isEmpty()) {
                throw new IllegalStateException("soffice --convert-to " + convertTo + " exited with " + exit
                        + "; missing outputs " + missing + "; its output:\n" + ExternalTools.tail(log));
            }
            return new Conversion(expected, runDir, elapsed);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot prepare the soffice run in " + runDir, e);
        } finally {
            deleteTree(profile);
        }
    }

    private static void writeProfile(Path profile, Recalc recalc) throws IOException {
        Path user = Files.createDirectories(profile.resolve("user"));
        Files.writeString(user.resolve("registrymodifications.xcu"),
                String.format(REGISTRY, recalc.registryValue), StandardCharsets.UTF_8);
    }

    private static String stem(String fileName) {
        int dot = fileName.lastIndexOf('.');
        return dot < 0 ? fileName : fileName.substring(0, dot);
    }

    private static boolean isNonEmptyFile(Path path) {
        try {
            return Files.isRegularFile(path) && Files.size(path) > 0;
        } catch (IOException e) {
            return false;
        }
    }

    private static void deleteTree(Path root) {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException ignored) {
            // the profile is under target/ and goes with the next clean
        }
    }
}
