package org.holdover.report;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.function.UnaryOperator;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.holdover.sizing.SizingResult;

/**
 * Writes the sizing workbook. Every computed number is a formula over visible inputs with the engine's
 * value cached. The file is written to a temporary file beside the target and moved into place, so a
 * failure never leaves a partial workbook and an existing one is only replaced when asked.
 */
public final class WorkbookWriter {

    private WorkbookWriter() {
    }

    /** Thrown when the target exists and overwriting was not allowed. */
    public static final class TargetExistsException extends IOException {
        public TargetExistsException(Path target) {
            super(target + " already exists");
        }
    }

    /**
     * @param result    the sizing result
     * @param target    the workbook to write
     * @param overwrite replace an existing file
     */
    public static void write(SizingResult result, Path target, boolean overwrite) throws IOException {
        write(result, target, overwrite, UnaryOperator.identity());
    }

    /**
     * {@link #write(SizingResult, Path, boolean)} with the temporary file's stream passed through
     * {@code wrap}: a seam for tests that make the write fail part way.
     */
    static void write(SizingResult result, Path target, boolean overwrite, UnaryOperator<OutputStream> wrap)
            throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        if (!overwrite && Files.exists(target)) {
            throw new TargetExistsException(target);
        }
        Path tmp = Files.createTempFile(dir, ".holdover-", ".xlsx.part");
        try {
            try (OutputStream out = wrap.apply(Files.newOutputStream(tmp))) {
                write(result, out);
            }
            if (overwrite) {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } else {
                try {
                    Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE);
                } catch (FileAlreadyExistsException e) {
                    throw new TargetExistsException(target);
                }
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** Writes the workbook to a stream. */
    public static void write(SizingResult result, OutputStream out) throws IOException {
        SXSSFWorkbook wb = new SXSSFWorkbook(200);
        try {
            Context ctx = new Context(wb, result);
            InputsSheet.write(ctx);
            TablesSheet.write(ctx);
            ConductorTablesSheet.write(ctx);
            LoadsSheet.writeTable(ctx);
            MotorsSheet.write(ctx);
            DayGridSheet.write(ctx);
            List<CurvesSheet.Block> blocks = CurvesSheet.write(ctx);
            HourlySheet.write(ctx);
            LoadsSheet.writeFigures(ctx);
            MotorsSheet.writeSurge(ctx);
            InvertersSheet.write(ctx, blocks);
            BusSheet.write(ctx);
            int bankRow = BatterySheet.write(ctx);
            WiringSheet.write(ctx, bankRow, chosenDc(result));
            PvHourlySheet.write(ctx);
            PvSheet.write(ctx, bankRow);
            SimulationSheet.write(ctx, result.year());
            MonthlySheet.write(ctx, result.year());
            AlternativesSheet.write(ctx);
            SummarySheet.write(ctx, bankRow);
            CautionsSheet.write(ctx);
            printSetup(ctx);
            wb.getXSSFWorkbook().getProperties().getCoreProperties().setTitle("holdover sizing: " + result.input().name());
            wb.getXSSFWorkbook().getProperties().getCoreProperties().setCreator("holdover");
            wb.write(out);
        } finally {
            wb.close();
        }
    }

    private static org.holdover.sizing.DcDesign chosenDc(SizingResult r) {
        if (r.chosen() == null) {
            return null;
        }
        return r.chosen().banks().stream().filter(b -> b.design() == r.bank()).findFirst().orElseThrow().dc();
    }

    private static void printSetup(Context ctx) {
        boolean a4 = ctx.r.input().frequencyHz() == 50.0;
        for (String name : Context.ORDER) {
            Sheet s = ctx.raw(name);
            s.setFitToPage(true);
            s.setAutobreaks(true);
            PrintSetup p = s.getPrintSetup();
            p.setFitWidth((short) (name.equals(Context.ALTERNATIVES) ? 2 : 1));
            p.setFitHeight((short) 0);
            p.setLandscape(!name.equals(Context.CAUTIONS));
            p.setPaperSize(a4 ? PrintSetup.A4_PAPERSIZE : PrintSetup.LETTER_PAPERSIZE);
            s.setMargin(Sheet.LeftMargin, 0.5);
            s.setMargin(Sheet.RightMargin, 0.5);
            s.setMargin(Sheet.TopMargin, 0.6);
            s.setMargin(Sheet.BottomMargin, 0.6);
            s.getFooter().setLeft("holdover - " + name);
            s.getFooter().setRight("page &P of &N");
        }
    }
}
