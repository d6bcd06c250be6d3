package org.holdover.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.holdover.sizing.ProjectAssembler;
import org.holdover.sizing.Sizing;
import org.holdover.sizing.SizingResult;
import org.holdover.testing.FailingOutputStream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * Nothing the user has is lost when writing the workbook fails part way (a full disk, a pulled drive):
 * the workbook already at the target stays byte for byte as it was, and no partial or temporary file is
 * left in the folder. The failure is injected through {@link WorkbookWriter}'s stream seam.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class NothingLostTest {

    /** Failure points, bytes into the file: before anything, inside the zip header, mid-way, near the end. */
    private static final long[] FAIL_AFTER = {0, 1, 30_000, 200_000};

    private SizingResult result;
    private byte[] previous;

    @BeforeAll
    void sizeTheCabinAndKeepAPreviousWorkbook(@TempDir Path dir) throws IOException, InputException {
        String demo = "examples/ridge-cabin-offgrid.yaml";
        result = Sizing.run(ProjectAssembler.assemble(ProjectReader.read(Path.of(demo), demo)));
        Path first = dir.resolve("first.xlsx");
        WorkbookWriter.write(result, first, false);
        previous = Files.readAllBytes(first);
        assertThat((long) previous.length).as("the workbook is larger than every failure point").isGreaterThan(FAIL_AFTER[3] + 1);
    }

    @Test
    void aFailedOverwriteLeavesThePreviousWorkbookAndNoOtherFile(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("cabin.xlsx");
        Files.write(target, previous);
        for (int i = 0; i < FAIL_AFTER.length; i++) {
            long n = FAIL_AFTER[i];
            // An I/O error, and (once) a runtime exception, which the writer must clean up after as well.
            boolean unchecked = i == 1;
            assertThatThrownBy(() -> WorkbookWriter.write(result, target, true, FailingOutputStream.after(n, unchecked)))
                    .as("failing after %d bytes", n)
                    .satisfies(e -> assertThat(e).hasStackTraceContaining(FailingOutputStream.MESSAGE));
            assertThat(Files.readAllBytes(target)).as("previous workbook after a failure at %d bytes", n)
                    .isEqualTo(previous);
            assertThat(names(dir)).as("folder after a failure at %d bytes", n).containsExactly("cabin.xlsx");
        }
    }

    @Test
    void aFailedFirstWriteLeavesNothing(@TempDir Path dir) {
        Path target = dir.resolve("reports").resolve("cabin.xlsx");
        assertThatThrownBy(() -> WorkbookWriter.write(result, target, false, FailingOutputStream.after(FAIL_AFTER[2], false)))
                .isInstanceOf(IOException.class).hasMessage(FailingOutputStream.MESSAGE);
        assertThat(names(target.getParent())).isEmpty();
    }

    @Test
    void anExistingWorkbookIsNeverReplacedWithoutBeingAsked(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("cabin.xlsx");
        Files.write(target, previous);
        assertThatThrownBy(() -> WorkbookWriter.write(result, target, false))
                .isInstanceOf(WorkbookWriter.TargetExistsException.class);
        assertThat(Files.readAllBytes(target)).isEqualTo(previous);
        assertThat(names(dir)).containsExactly("cabin.xlsx");
    }

    @Test
    void theSeamPassesAGoodWriteThrough(@TempDir Path dir) throws IOException {
        // The same path with a stream that lets everything through gives a whole, readable workbook.
        Path target = dir.resolve("cabin.xlsx");
        Files.writeString(target, "an older file");
        WorkbookWriter.write(result, target, true, FailingOutputStream.after(Long.MAX_VALUE, false));
        List<String> entries;
        try (ZipFile zip = new ZipFile(target.toFile())) {
            entries = zip.stream().map(ZipEntry::getName).toList();
        }
        assertThat(entries).as("a whole workbook package").contains("[Content_Types].xml", "xl/workbook.xml",
                "xl/worksheets/sheet1.xml");
        assertThat(names(dir)).containsExactly("cabin.xlsx");
    }

    static List<String> names(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
