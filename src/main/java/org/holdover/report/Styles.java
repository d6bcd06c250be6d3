package org.holdover.report;

import java.util.HashMap;
import java.util.Map;
import org.apache.poi.ss.usermodel.BorderStyle;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.HorizontalAlignment;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.VerticalAlignment;
import org.apache.poi.ss.usermodel.Workbook;

/**
 * Cell styles. Inputs (values typed in or taken from the project and catalog) have a pale yellow fill
 * and a blue font so they stand apart from results, which are plain black on white.
 */
final class Styles {

    /** Number formats by name. */
    static final String INT = "#,##0";
    static final String D1 = "#,##0.0";
    static final String D2 = "#,##0.00";
    static final String D3 = "0.000";
    static final String D4 = "0.0000";
    static final String PCT = "0.0%";
    static final String TEXT = "@";
    static final String GENERAL = "General";

    private final Workbook wb;
    private final Map<String, CellStyle> cache = new HashMap<>();
    final CellStyle title;
    final CellStyle subtitle;
    final CellStyle header;
    final CellStyle text;
    final CellStyle wrap;
    final CellStyle note;
    final CellStyle noteWrap;
    final CellStyle inputText;
    final CellStyle bold;

    Styles(Workbook wb) {
        this.wb = wb;
        Font titleFont = wb.createFont();
        titleFont.setBold(true);
        titleFont.setFontHeightInPoints((short) 14);
        title = wb.createCellStyle();
        title.setFont(titleFont);
        Font boldFont = wb.createFont();
        boldFont.setBold(true);
        subtitle = wb.createCellStyle();
        subtitle.setFont(boldFont);
        bold = wb.createCellStyle();
        bold.setFont(boldFont);
        header = wb.createCellStyle();
        header.setFont(boldFont);
        header.setFillForegroundColor(IndexedColors.GREY_25_PERCENT.getIndex());
        header.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        header.setWrapText(true);
        header.setVerticalAlignment(VerticalAlignment.TOP);
        header.setBorderBottom(BorderStyle.THIN);
        text = wb.createCellStyle();
        text.setVerticalAlignment(VerticalAlignment.TOP);
        wrap = wb.createCellStyle();
        wrap.setWrapText(true);
        wrap.setVerticalAlignment(VerticalAlignment.TOP);
        Font noteFont = wb.createFont();
        noteFont.setItalic(true);
        noteFont.setColor(IndexedColors.GREY_80_PERCENT.getIndex());
        note = wb.createCellStyle();
        note.setFont(noteFont);
        note.setWrapText(false);
        noteWrap = wb.createCellStyle();
        noteWrap.setFont(noteFont);
        noteWrap.setWrapText(true);
        noteWrap.setVerticalAlignment(VerticalAlignment.TOP);
        inputText = wb.createCellStyle();
        inputText.cloneStyleFrom(text);
        inputText.setFont(inputFont());
        inputText.setFillForegroundColor(IndexedColors.LIGHT_YELLOW.getIndex());
        inputText.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        inputText.setDataFormat(wb.createDataFormat().getFormat(TEXT));
    }

    private Font inputFont;

    private Font inputFont() {
        if (inputFont == null) {
            inputFont = wb.createFont();
            inputFont.setColor(IndexedColors.DARK_BLUE.getIndex());
        }
        return inputFont;
    }

    /** Style of an input number with a format. */
    CellStyle input(String format) {
        return cache.computeIfAbsent("in:" + format, k -> {
            CellStyle s = wb.createCellStyle();
            s.setFont(inputFont());
            s.setFillForegroundColor(IndexedColors.LIGHT_YELLOW.getIndex());
            s.setFillPattern(FillPatternType.SOLID_FOREGROUND);
            s.setDataFormat(wb.createDataFormat().getFormat(format));
            s.setVerticalAlignment(VerticalAlignment.TOP);
            return s;
        });
    }

    /** Style of a computed number with a format. */
    CellStyle result(String format) {
        return cache.computeIfAbsent("out:" + format, k -> {
            CellStyle s = wb.createCellStyle();
            s.setDataFormat(wb.createDataFormat().getFormat(format));
            s.setVerticalAlignment(VerticalAlignment.TOP);
            return s;
        });
    }

    /** Style of a computed pass/fail word. */
    CellStyle verdict() {
        return cache.computeIfAbsent("verdict", k -> {
            CellStyle s = wb.createCellStyle();
            Font f = wb.createFont();
            f.setBold(true);
            s.setFont(f);
            s.setAlignment(HorizontalAlignment.CENTER);
            s.setVerticalAlignment(VerticalAlignment.TOP);
            return s;
        });
    }
}
