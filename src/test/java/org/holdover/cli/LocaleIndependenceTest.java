package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TimeZone;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The same project gives the same workbook and console output whatever the machine's default locale and
 * time zone: a demo is sized under en-US and UTC, then under a decimal-comma locale (and others with
 * their own digits or case rules) and a time zone with a 45-minute or half-hour offset, and every cell
 * of the two workbooks — type, cached value bit for bit, text, formula, number format — and every
 * defined name must be equal, and so must standard output and standard error.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class LocaleIndependenceTest {

    private record Run(String out, String err, List<String> cells) {
    }

    /** The en-US / UTC run of each demo, made once. */
    private final Map<String, Run> references = new HashMap<>();

    @ParameterizedTest(name = "{0} under {1} / {2}")
    @CsvSource({
        "examples/farm-shop-backup.yaml, de-DE, Asia/Kathmandu",
        "examples/ridge-cabin-offgrid.yaml, de-DE, Asia/Kathmandu",
        "examples/farm-shop-backup.yaml, ar-EG, America/St_Johns",
        "examples/ridge-cabin-offgrid.yaml, tr-TR, Pacific/Chatham"})
    void sameWorkbookAndConsoleOutput(String demo, String languageTag, String zone, @TempDir Path dir) throws IOException {
        Run reference = references.get(demo);
        if (reference == null) {
            reference = run(demo, Locale.US, "UTC", dir.resolve("a"));
            references.put(demo, reference);
        }
        Run other = run(demo, Locale.forLanguageTag(languageTag), zone, dir.resolve("b"));
        System.out.println(demo + ": " + reference.cells().size() + " cells and names compared under " + languageTag + " / " + zone);
        assertThat(reference.cells()).hasSizeGreaterThan(100_000);
        assertThat(other.out()).isEqualTo(reference.out());
        assertThat(other.err()).isEqualTo(reference.err());
        List<String> diff = new ArrayList<>();
        for (int i = 0; i < reference.cells().size() && diff.size() < 20; i++) {
            if (i >= other.cells().size() || !reference.cells().get(i).equals(other.cells().get(i))) {
                diff.add(reference.cells().get(i) + "  vs  " + (i < other.cells().size() ? other.cells().get(i) : "(none)"));
            }
        }
        assertThat(diff).isEmpty();
        assertThat(other.cells()).hasSameSizeAs(reference.cells());
    }

    /** Sizes the demo with the given defaults and reads the workbook back as one line per cell. */
    private static Run run(String demo, Locale locale, String zone, Path dir) throws IOException {
        Locale savedLocale = Locale.getDefault();
        TimeZone savedZone = TimeZone.getDefault();
        Cli r;
        try {
            Locale.setDefault(locale);
            TimeZone.setDefault(TimeZone.getTimeZone(zone));
            Files.createDirectories(dir);
            r = Cli.run("size", demo, "-o", dir.resolve("out.xlsx").toString());
        } finally {
            Locale.setDefault(savedLocale);
            TimeZone.setDefault(savedZone);
        }
        assertThat(r.exit).as(r.err).isEqualTo(Main.OK);
        return new Run(r.out.replace(dir.toString(), "<dir>"), r.err, cells(dir.resolve("out.xlsx")));
    }

    /** Every cell as "sheet!A1 type value formula format", then every defined name. */
    static List<String> cells(Path file) throws IOException {
        List<String> out = new ArrayList<>();
        try (InputStream in = Files.newInputStream(file); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            for (Sheet sheet : wb) {
                for (Row row : sheet) {
                    for (Cell cell : row) {
                        out.add(describe(sheet, cell));
                    }
                }
            }
            for (Name n : wb.getAllNames()) {
                out.add("name " + n.getNameName() + " = " + n.getRefersToFormula());
            }
        }
        return out;
    }

    private static String describe(Sheet sheet, Cell cell) {
        CellType type = cell.getCellType();
        String formula = type == CellType.FORMULA ? cell.getCellFormula() : "";
        CellType valueType = type == CellType.FORMULA ? cell.getCachedFormulaResultType() : type;
        String value = switch (valueType) {
            case NUMERIC -> Long.toHexString(Double.doubleToRawLongBits(cell.getNumericCellValue()));
            case STRING -> cell.getStringCellValue();
            case BOOLEAN -> Boolean.toString(cell.getBooleanCellValue());
            case ERROR -> "error " + cell.getErrorCellValue();
            default -> "";
        };
        return sheet.getSheetName() + "!" + cell.getAddress() + " " + type + "/" + valueType + " [" + value + "] ="
                + formula + " fmt " + cell.getCellStyle().getDataFormatString();
    }
}
