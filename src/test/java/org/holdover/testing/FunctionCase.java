package org.holdover.testing;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.List;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;

/**
 * One formula with the value its function's definition gives, for {@code SafeFunctionsTest}.
 *
 * <p>Expected values follow the function definitions of ECMA-376 Part 1 (ISO/IEC 29500-1:2016)
 * §18.17.7 "Predefined Function Definitions" (from memory; the examples are worked by hand or, for
 * transcendental functions, computed here with {@link Math}). They are independent of both evaluators.
 *
 * @param function the function the case proves, as listed in {@link SafeFunctions}
 * @param formula the formula, referring to the sheet {@value #DATA_SHEET} laid out by {@link #writeData}
 * @param expected the value by the function's definition
 */
record FunctionCase(String function, String formula, CellResult expected) {

    static final String DATA_SHEET = "Input data";

    /** Serial day number of a date in the 1900 date system, valid from 1900-03-01 on. */
    static double serial(LocalDate date) {
        return ChronoUnit.DAYS.between(LocalDate.of(1899, 12, 30), date);
    }

    static final LocalDate F2_DATE = LocalDate.of(2023, 4, 24);

    /**
     * Fills the data sheet the cases refer to:
     * <pre>
     *      A  B   C    D    E        F (date)     G
     *   1  1  10  a    0    none     2023-03-15   2.5
     *   2  2  20  b    100  small    2023-04-24   -2.5
     *   3  3  30  c    200  medium   2023-06-03   0.125
     *   4  4  40  b    400  large    2023-07-13   -7.3
     *   5  5  50  a    800  huge     2023-08-22   1234.5678
     *   I1:I3 = 0.1, 0.2, 0.3;  J7:N7 = 1..5,  J8:N8 = 100..500;  column H empty;
     *   defined name Rate = 'Input data'!$B$2
     * </pre>
     */
    static void writeData(Workbook workbook) {
        Sheet data = workbook.createSheet(DATA_SHEET);
        String[] letters = {"a", "b", "c", "b", "a"};
        double[] steps = {0, 100, 200, 400, 800};
        String[] labels = {"none", "small", "medium", "large", "huge"};
        double[] mixed = {2.5, -2.5, 0.125, -7.3, 1234.5678};
        for (int i = 0; i < 5; i++) {
            Row row = data.createRow(i);
            row.createCell(0).setCellValue(i + 1);
            row.createCell(1).setCellValue(10 * (i + 1));
            row.createCell(2).setCellValue(letters[i]);
            row.createCell(3).setCellValue(steps[i]);
            row.createCell(4).setCellValue(labels[i]);
            row.createCell(5).setCellValue(serial(LocalDate.of(2023, 3, 15).plusDays(40L * i)));
            row.createCell(6).setCellValue(mixed[i]);
            if (i < 3) {
                row.createCell(8).setCellValue((i + 1) / 10.0);
            }
        }
        Row keys = data.createRow(6);
        Row values = data.createRow(7);
        for (int j = 0; j < 5; j++) {
            keys.createCell(9 + j).setCellValue(j + 1);
            values.createCell(9 + j).setCellValue(100 * (j + 1));
        }
        Name rate = workbook.createName();
        rate.setNameName("Rate");
        rate.setRefersToFormula("'" + DATA_SHEET + "'!$B$2");
    }

    private static FunctionCase num(String function, String formula, double expected) {
        return new FunctionCase(function, formula, new CellResult.Numeric(expected));
    }

    private static FunctionCase text(String function, String formula, String expected) {
        return new FunctionCase(function, formula, new CellResult.Text(expected));
    }

    private static FunctionCase bool(String function, String formula, boolean expected) {
        return new FunctionCase(function, formula, new CellResult.Logical(expected));
    }

    private static FunctionCase error(String function, String formula, String code) {
        return new FunctionCase(function, formula, new CellResult.ErrorCode(code));
    }

    private static final String D = "'" + DATA_SHEET + "'!";

    /** Every case; each function of {@link SafeFunctions#SAFE} and {@link SafeFunctions#SAFE_WITH_PREFIX} appears. */
    static final List<FunctionCase> ALL = List.of(
            // aggregates
            num("SUM", "SUM(" + D + "A1:A5)", 15),
            num("SUM", "SUM(" + D + "A1:A5,10," + D + "B1)", 35),
            num("SUM", "SUM(" + D + "A:A)", 15),
            num("SUMIF", "SUMIF(" + D + "A1:A5,\">2\"," + D + "B1:B5)", 30 + 40 + 50),
            num("SUMIF", "SUMIF(" + D + "C1:C5,\"b\"," + D + "B1:B5)", 20 + 40),
            num("SUMIF", "SUMIF(" + D + "A1:A5,\">=\"&" + D + "A3," + D + "B1:B5)", 30 + 40 + 50),
            num("SUMIFS", "SUMIFS(" + D + "B1:B5," + D + "A1:A5,\">=2\"," + D + "C1:C5,\"b\")", 20 + 40),
            num("SUMPRODUCT", "SUMPRODUCT(" + D + "A1:A5," + D + "B1:B5)", 10 + 40 + 90 + 160 + 250),
            num("COUNT", "COUNT(" + D + "A1:C5)", 10),
            num("COUNTA", "COUNTA(" + D + "C1:C5)", 5),
            num("COUNTBLANK", "COUNTBLANK(" + D + "H1:H5)", 5),
            num("COUNTIF", "COUNTIF(" + D + "C1:C5,\"a\")", 2),
            num("COUNTIF", "COUNTIF(" + D + "E1:E5,\"s*\")", 1),
            num("COUNTIFS", "COUNTIFS(" + D + "A1:A5,\">1\"," + D + "C1:C5,\"<>a\")", 3),
            num("AVERAGE", "AVERAGE(" + D + "B1:B5)", 30),
            error("AVERAGE", "AVERAGE(" + D + "H1:H5)", "#DIV/0!"),
            num("AVERAGEIF", "AVERAGEIF(" + D + "C1:C5,\"b\"," + D + "B1:B5)", 30),
            num("AVERAGEIFS", "AVERAGEIFS(" + D + "B1:B5," + D + "A1:A5,\">2\")", 40),
            num("MIN", "MIN(" + D + "G1:G5)", -7.3),
            num("MAX", "MAX(" + D + "G1:G5)", 1234.5678),
            num("MAX", "MAX(0,MIN(1," + D + "G1))", 1),
            num("MEDIAN", "MEDIAN(" + D + "G1:G5)", 0.125),
            num("LARGE", "LARGE(" + D + "B1:B5,2)", 40),
            num("SMALL", "SMALL(" + D + "B1:B5,2)", 20),
            num("PERCENTILE", "PERCENTILE(" + D + "A1:A5,0.3)", 1 + 0.3 * 4),
            num("STDEV", "STDEV(" + D + "A1:A5)", Math.sqrt(2.5)),
            num("STDEVP", "STDEVP(" + D + "A1:A5)", Math.sqrt(2)),
            num("VAR", "VAR(" + D + "A1:A5)", 2.5),
            num("SUBTOTAL", "SUBTOTAL(9," + D + "B1:B5)", 150),
            num("PRODUCT", "PRODUCT(" + D + "A1:A5)", 120),
            num("SUMSQ", "SUMSQ(" + D + "A1:A5)", 55),
            // lookup
            num("INDEX", "INDEX(" + D + "B1:B5,3)", 30),
            num("INDEX", "INDEX(" + D + "A1:B5,2,2)", 20),
            text("INDEX", "INDEX(" + D + "E1:E5,MATCH(MAX(" + D + "B1:B5)," + D + "B1:B5,0))", "huge"),
            num("MATCH", "MATCH(\"c\"," + D + "C1:C5,0)", 3),
            num("MATCH", "MATCH(250," + D + "D1:D5,1)", 3),
            num("VLOOKUP", "VLOOKUP(3," + D + "A1:B5,2,FALSE)", 30),
            text("VLOOKUP", "VLOOKUP(250," + D + "D1:E5,2,TRUE)", "medium"),
            num("HLOOKUP", "HLOOKUP(3," + D + "J7:N8,2,FALSE)", 300),
            text("LOOKUP", "LOOKUP(450," + D + "D1:D5," + D + "E1:E5)", "large"),
            text("CHOOSE", "CHOOSE(2,\"x\",\"y\",\"z\")", "y"),
            num("ROWS", "ROWS(" + D + "A1:B5)", 5),
            num("COLUMNS", "COLUMNS(" + D + "A1:B5)", 2),
            num("ROW", "ROW(" + D + "C4)", 4),
            num("COLUMN", "COLUMN(" + D + "C4)", 3),
            num("(defined name)", "Rate*2", 40),
            num("(reference to a blank cell)", D + "H1", 0),
            // logic
            text("IF", "IF(" + D + "A3>2,\"big\",\"small\")", "big"),
            num("IFERROR", "IFERROR(1/0,-1)", -1),
            bool("AND", "AND(" + D + "A1>0," + D + "A2>1)", true),
            bool("OR", "OR(" + D + "A1>5," + D + "A2>5)", false),
            bool("NOT", "NOT(" + D + "A1>5)", true),
            error("NA", "NA()", "#N/A"),
            error("(division by zero)", "1/0", "#DIV/0!"),
            bool("ISNUMBER", "ISNUMBER(" + D + "A1)", true),
            bool("ISTEXT", "ISTEXT(" + D + "C1)", true),
            bool("ISBLANK", "ISBLANK(" + D + "H1)", true),
            bool("ISERROR", "ISERROR(1/0)", true),
            bool("ISNA", "ISNA(NA())", true),
            bool("(comparison)", "\"a\"=\"A\"", true),
            bool("(comparison)", "0.1*3=0.3", true),
            // arithmetic
            num("ABS", "ABS(-3.5)", 3.5),
            num("INT", "INT(8.9)", 8),
            num("INT", "INT(-8.9)", -9),
            num("TRUNC", "TRUNC(-8.9)", -8),
            num("TRUNC", "TRUNC(8.987,2)", 8.98),
            num("MOD", "MOD(10,3)", 1),
            num("MOD", "MOD(-3,2)", 1),
            num("MOD", "MOD(3,-2)", -1),
            num("QUOTIENT", "QUOTIENT(7,2)", 3),
            num("ROUND", "ROUND(2.5,0)", 3),
            num("ROUND", "ROUND(-2.5,0)", -3),
            num("ROUND", "ROUND(2.15,1)", 2.2),
            num("ROUND", "ROUND(-1.475,2)", -1.48),
            num("ROUND", "ROUND(21.5,-1)", 20),
            num("ROUND", "ROUND(1.005,2)", 1.01),
            num("ROUNDUP", "ROUNDUP(3.2,0)", 4),
            num("ROUNDUP", "ROUNDUP(-3.14159,1)", -3.2),
            num("ROUNDUP", "ROUNDUP(31415.92654,-2)", 31500),
            num("ROUNDUP", "ROUNDUP(ROUND(0.1*3/0.1,6),0)", 3),
            num("ROUNDUP", "ROUNDUP(ROUND(2000+1E-9,6),0)", 2000),
            num("ROUNDUP", "ROUNDUP(ROUND(2000+1E-6,6),0)", 2001),
            num("ROUNDUP", "ROUNDUP(10.2/0.6,0)", 17),
            num("ROUNDDOWN", "ROUNDDOWN(3.14159,3)", 3.141),
            num("ROUNDDOWN", "ROUNDDOWN(-3.14159,1)", -3.1),
            num("MROUND", "MROUND(10,3)", 9),
            num("MROUND", "MROUND(1.3,0.2)", 1.4),
            num("CEILING", "CEILING(2.5,1)", 3),
            num("CEILING", "CEILING(4.42,0.05)", 4.45),
            num("CEILING", "CEILING(0.3,0.1)", 0.3),
            num("FLOOR", "FLOOR(3.7,2)", 2),
            num("FLOOR", "FLOOR(1.58,0.1)", 1.5),
            num("SQRT", "SQRT(2)", Math.sqrt(2)),
            num("POWER", "POWER(2,0.5)", Math.sqrt(2)),
            num("POWER", "POWER(10,-3)", 0.001),
            num("(operator ^)", "2^10", 1024),
            num("(operator ^)", "2^-1", 0.5),
            num("(operator %)", "50%*4", 2),
            num("EXP", "EXP(1.5)", Math.exp(1.5)),
            num("LN", "LN(10)", Math.log(10)),
            num("LOG", "LOG(8,2)", 3),
            num("LOG", "LOG(100)", 2),
            num("LOG10", "LOG10(1000)", 3),
            num("SIGN", "SIGN(-2)", -1),
            num("PI", "PI()", Math.PI),
            num("FACT", "FACT(5)", 120),
            num("COMBIN", "COMBIN(5,2)", 10),
            // angles
            num("SIN", "SIN(PI()/6)", 0.5),
            num("COS", "COS(RADIANS(60))", 0.5),
            num("TAN", "TAN(1)", Math.tan(1)),
            num("ASIN", "ASIN(0.5)", Math.PI / 6),
            num("ACOS", "ACOS(0.5)", Math.PI / 3),
            num("ATAN", "ATAN(1)", Math.PI / 4),
            num("ATAN2", "ATAN2(1,2)", Math.atan2(2, 1)),
            num("RADIANS", "RADIANS(180)", Math.PI),
            num("DEGREES", "DEGREES(PI())", 180),
            // dates
            num("DATE", "DATE(2024,2,29)", serial(LocalDate.of(2024, 2, 29))),
            num("YEAR", "YEAR(" + D + "F2)", F2_DATE.getYear()),
            num("MONTH", "MONTH(" + D + "F2)", F2_DATE.getMonthValue()),
            num("DAY", "DAY(" + D + "F2)", F2_DATE.getDayOfMonth()),
            num("WEEKDAY", "WEEKDAY(" + D + "F2)", F2_DATE.getDayOfWeek().getValue() % 7 + 1),
            num("WEEKDAY", "WEEKDAY(" + D + "F2,2)", F2_DATE.getDayOfWeek().getValue()),
            num("EDATE", "EDATE(DATE(2023,1,31),1)", serial(LocalDate.of(2023, 2, 28))),
            num("EOMONTH", "EOMONTH(DATE(2024,1,15),1)", serial(LocalDate.of(2024, 2, 29))),
            num("HOUR", "HOUR(7/24+0.1/1440)", 7),
            num("TIME", "TIME(18,30,0)", (18 * 60 + 30) / 1440.0),
            // text
            text("TEXT", "TEXT(1234.5,\"0.00\")", "1234.50"),
            text("TEXT", "TEXT(1234.5678,\"0.0\")", "1234.6"),
            text("TEXT", "TEXT(-1.25,\"0.0\")", "-1.3"),
            text("TEXT", "TEXT(1234.5,\"#,##0\")", "1,235"),
            text("TEXT", "TEXT(0.256,\"0.0%\")", "25.6%"),
            text("TEXT", "TEXT(DATE(2023,3,15),\"yyyy-mm-dd\")", "2023-03-15"),
            text("CONCATENATE", "CONCATENATE(\"a\",1,\"b\")", "a1b"),
            text("(operator &)", "\"x\"&1/3", "x0.333333333333333"),
            text("(operator &)", "\"x\"&" + D + "G5", "x1234.5678"),
            text("(operator &)", D + "H1&\"\"", ""),
            text("LEFT", "LEFT(\"hello\",2)", "he"),
            text("RIGHT", "RIGHT(\"hello\",3)", "llo"),
            text("MID", "MID(\"hello\",2,3)", "ell"),
            num("LEN", "LEN(\"hello\")", 5),
            text("UPPER", "UPPER(\"ab\")", "AB"),
            text("LOWER", "LOWER(\"AB\")", "ab"),
            text("TRIM", "TRIM(\"  a  b \")", "a b"),
            text("SUBSTITUTE", "SUBSTITUTE(\"a-b-c\",\"-\",\"+\")", "a+b+c"),
            text("REPT", "REPT(\"-\",3)", "---"),
            text("FIXED", "FIXED(1234.567,1)", "1,234.6"),
            num("VALUE", "VALUE(\"12.5\")", 12.5),
            num("FIND", "FIND(\"l\",\"hello\")", 3),
            num("SEARCH", "SEARCH(\"L\",\"hello\")", 3),
            bool("EXACT", "EXACT(\"a\",\"A\")", false),
            // only with the _xlfn. prefix
            num("_XLFN.IFS", "_xlfn.IFS(" + D + "A1>2,1,TRUE,2)", 2),
            num("_XLFN.MAXIFS", "_xlfn.MAXIFS(" + D + "B1:B5," + D + "A1:A5,\">2\")", 50),
            num("_XLFN.MINIFS", "_xlfn.MINIFS(" + D + "B1:B5," + D + "A1:A5,\">2\")", 30),
            num("_XLFN.IFNA", "_xlfn.IFNA(NA(),7)", 7),
            text("_XLFN.SWITCH", "_xlfn.SWITCH(" + D + "A1,1,\"a\",\"b\")", "a"),
            text("_XLFN.CONCAT", "_xlfn.CONCAT(\"a\",\"b\")", "ab"),
            text("_XLFN.TEXTJOIN", "_xlfn.TEXTJOIN(\",\",TRUE," + D + "A1:A3)", "1,2,3"),
            num("_XLFN.CEILING.MATH", "_xlfn.CEILING.MATH(2.5)", 3),
            num("_XLFN.FLOOR.MATH", "_xlfn.FLOOR.MATH(2.5)", 2),
            num("_XLFN.STDEV.S", "_xlfn.STDEV.S(" + D + "A1:A5)", Math.sqrt(2.5)),
            num("_XLFN.DAYS", "_xlfn.DAYS(45010,45000)", 10));
}
