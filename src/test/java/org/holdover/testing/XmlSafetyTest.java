package org.holdover.testing;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.assertj.core.api.Assertions.assertThat;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * XML and external entities. The tool reads no XML: project files are YAML or JSON, profiles and weather
 * files are CSV or EPW text; it writes the workbook (OOXML) through the spreadsheet library. Only the
 * tests read XML, by opening workbooks with that library. So: (1) no class, main or test, parses XML
 * itself (a JAXP, StAX, SAX or DOM dependency would need its own hardening and a test like the next), and
 * (2) the library's reader, as the tests use it, refuses a workbook whose XML declares an external entity
 * (OWASP XML External Entity Prevention Cheat Sheet: disallow DOCTYPE declarations).
 */
class XmlSafetyTest {

    private static final JavaClasses ALL = new ClassFileImporter().importPackages("org.holdover");

    @Test
    void noCodeOfOursParsesXml() {
        noClasses().should().dependOnClassesThat().resideInAnyPackage("javax.xml.parsers..", "javax.xml.stream..",
                "javax.xml.transform..", "javax.xml.validation..", "org.xml.sax..", "org.w3c.dom..")
                .because("XML parsing would need DTDs and external entities disabled, and a test of it")
                .check(ALL);
    }

    @Test
    void aWorkbookWithAnExternalEntityIsRefusedAndLeaksNothing(@TempDir Path dir) throws IOException {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "TOP-SECRET-7d1f", StandardCharsets.UTF_8);
        Path plain = dir.resolve("plain.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook()) {
            wb.createSheet("Inputs").createRow(0).createCell(0).setCellValue("placeholder");
            try (OutputStream out = Files.newOutputStream(plain)) {
                wb.write(out);
            }
        }
        String sheet = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<!DOCTYPE worksheet [<!ENTITY xxe SYSTEM \"" + secret.toUri() + "\">]>\n"
                + "<worksheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"><sheetData>"
                + "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>&xxe;</t></is></c></row></sheetData></worksheet>";
        Path hostile = dir.resolve("hostile.xlsx");
        replaceEntry(plain, hostile, "xl/worksheets/sheet1.xml", sheet.getBytes(StandardCharsets.UTF_8));

        String seen;
        try (XSSFWorkbook wb = WorkbookCells.open(hostile)) {
            StringBuilder b = new StringBuilder();
            for (Sheet s : wb) {
                for (Row row : s) {
                    for (Cell cell : row) {
                        b.append(cell).append('\n');
                    }
                }
            }
            seen = b.toString();
        } catch (RuntimeException e) {
            seen = "refused: " + e + (e.getCause() == null ? "" : " / " + e.getCause());
        }
        System.out.println("workbook with an external entity: " + seen.lines().findFirst().orElse(""));
        assertThat(seen).as("what the reader made of it").doesNotContain("TOP-SECRET-7d1f");
        assertThat(seen).as("the reader refuses the DOCTYPE outright").startsWith("refused:");
    }

    private static void replaceEntry(Path from, Path to, String name, byte[] content) throws IOException {
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(from));
             ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(to))) {
            ZipEntry e;
            while ((e = in.getNextEntry()) != null) {
                out.putNextEntry(new ZipEntry(e.getName()));
                out.write(e.getName().equals(name) ? content : in.readAllBytes());
                out.closeEntry();
            }
        }
    }
}
