package org.holdover.testing;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * The worksheet functions a workbook of ours may use: each one is proven by {@code SafeFunctionsTest}
 * to give the same result in LibreOffice Calc 7.4 (recalculated on load) as in Apache POI 5.5's
 * evaluator, which the workbook writer uses to cache values, and the value the function's definition
 * gives.
 *
 * <h2>Functions</h2>
 * Write these plainly (no prefix): {@link #SAFE}.
 * <ul>
 *   <li>Arithmetic: ABS, INT, TRUNC, MOD, QUOTIENT, ROUND, ROUNDUP, ROUNDDOWN, MROUND, CEILING, FLOOR,
 *       SQRT, POWER, EXP, LN, LOG, LOG10, SIGN, PI, FACT, COMBIN, PRODUCT, SUMSQ.</li>
 *   <li>Angles: SIN, COS, TAN, ASIN, ACOS, ATAN, ATAN2 (x first, then y: {@code ATAN2(x, y)} is Java's
 *       {@code Math.atan2(y, x)}), RADIANS, DEGREES.</li>
 *   <li>Aggregates: SUM, SUMIF, SUMIFS, SUMPRODUCT, COUNT, COUNTA, COUNTBLANK, COUNTIF, COUNTIFS,
 *       AVERAGE, AVERAGEIF, AVERAGEIFS, MIN, MAX, MEDIAN, LARGE, SMALL, PERCENTILE, STDEV, STDEVP, VAR,
 *       SUBTOTAL.</li>
 *   <li>Lookup: INDEX, MATCH, VLOOKUP, HLOOKUP, LOOKUP, CHOOSE, ROW, ROWS, COLUMN, COLUMNS.</li>
 *   <li>Logic: IF, IFERROR, AND, OR, NOT, NA, ISNUMBER, ISTEXT, ISBLANK, ISERROR, ISNA.</li>
 *   <li>Dates (1900 date system): DATE, YEAR, MONTH, DAY, WEEKDAY, EDATE, EOMONTH, HOUR, TIME.</li>
 *   <li>Text: TEXT, CONCATENATE, LEFT, RIGHT, MID, LEN, UPPER, LOWER, TRIM, SUBSTITUTE, REPT, FIXED,
 *       VALUE, FIND, SEARCH, EXACT.</li>
 * </ul>
 * Operators {@code + - * / ^ & = <> < > <= >= %}, references to other sheets (quoted names with spaces
 * work), whole-column references and defined names are safe too.
 *
 * <p>Functions added to the file format after its first edition must be stored with the
 * {@code _xlfn.} prefix, and the library writes formula text as given: {@code IFS(...)} goes into the
 * file unprefixed and is {@code #NAME?} in the spreadsheet application, while {@code _xlfn.IFS(...)}
 * evaluates. These work when written with the prefix, and only so: {@link #SAFE_WITH_PREFIX}
 * ({@code _xlfn.IFS, _xlfn.MAXIFS, _xlfn.MINIFS, _xlfn.IFNA, _xlfn.SWITCH, _xlfn.CONCAT,
 * _xlfn.TEXTJOIN, _xlfn.CEILING.MATH, _xlfn.FLOOR.MATH, _xlfn.STDEV.S, _xlfn.DAYS}). Prefer the plain
 * list. Not available at all: {@code XLOOKUP}, {@code LET} (unknown to Calc 7.4 even with the prefix),
 * {@code XOR} (the library cannot evaluate it), {@code TODAY}, {@code NOW}, {@code RAND},
 * {@code OFFSET}, {@code INDIRECT} (volatile: a cached value cannot be checked).
 *
 * <h2>Rules (each one shown by {@code SafeFunctionsTest}'s pitfall cases)</h2>
 * <ol>
 *   <li><b>Unary minus before a power.</b> {@code -2^2} is 4 in the spreadsheet application (negation
 *       binds tighter than {@code ^}) but -4 in the library. Write {@code -(A1^2)} or {@code (-A1)^2}.</li>
 *   <li><b>No array expressions.</b> {@code SUMPRODUCT((A1:A5>2)*B1:B5)}, {@code SUMPRODUCT(--(...),...)}
 *       and arithmetic on ranges or on array constants ({@code {1,2,3}}) fail or give other values in the
 *       library. SUMPRODUCT takes plain ranges only; use SUMIFS/COUNTIFS/AVERAGEIFS for conditions, or a
 *       helper column.</li>
 *   <li><b>Step functions near a step.</b> The spreadsheet application snaps a value that is very close
 *       to a step before ROUNDUP and ROUNDDOWN (within about 1e-12, relative), INT, MOD and exact
 *       comparisons (about 1e-15); the library and Java do not. {@code ROUNDUP(2000+1E-9,0)} is 2000
 *       there and 2001 in the library; {@code ROUNDDOWN(2.99999999999999,0)} is 3 there and 2 in the
 *       library; {@code MOD(2.3,0.1)} is 0 there and 0.1 in the library; {@code INT(LOG10(1000))} is 3
 *       there and 2 in the library. Round a computed argument first, {@code ROUNDUP(ROUND(x,6),0)} for
 *       |x| &lt; 1e5 (so that what is left is at least 1e-11 of x), and have the engine round the same
 *       way before it takes a ceiling; give MOD integer arguments.</li>
 *   <li><b>Exact matches and comparisons of computed numbers.</b> {@code MATCH(1-0.7, range, 0)} finds
 *       0.3 in the spreadsheet application and nothing ({@code #N/A}) in the library, and
 *       {@code 0.3<0.3+1E-15} is FALSE there and TRUE in the library. Look up integer or text keys (or
 *       ROUNDed numbers), and compare against a limit with a margin or after ROUND when a value can land
 *       on it. Approximate match (sorted table, match type 1 / TRUE) is safe.</li>
 *   <li><b>CEILING and FLOOR with positive arguments only</b>; the two evaluators agree on negative
 *       numbers (Excel 2010 semantics, {@code CEILING(-2.5,2) = -2}) but the first edition of the
 *       standard defines an error there (from memory), so other readers may differ.</li>
 *   <li><b>No formula should produce an error</b> other than {@code #N/A} from NA() and {@code #DIV/0!}:
 *       domain errors differ in kind ({@code SQRT(-1)} is {@code #NUM!} in the library and
 *       {@code #VALUE!} in the spreadsheet application). Guard with IF; IFERROR is safe.</li>
 *   <li><b>TEXT</b> only with the number formats proven: {@code "0.0"}, {@code "0.00"}, {@code "#,##0"},
 *       {@code "0.0%"}, {@code "yyyy-mm-dd"}. Numbers joined to text with {@code &} show 15 significant
 *       digits in both.</li>
 *   <li><b>Dates</b> on or after 1900-03-01 (serial 61): the two differ before, over the 1900 leap day.</li>
 *   <li><b>Differences below 1e-9</b> are expected and not errors: the spreadsheet application rounds
 *       results near a round number (it shows {@code SIN(PI()/6)} as 0.5, the library as
 *       0.49999999999999956, and {@code 0.1+0.2-0.3} as 0, the library as 5.55e-17); see
 *       {@link Tolerance#DEFAULT}.</li>
 * </ol>
 *
 * <p>{@link #unsafeFunctions(String)} and {@link #unsafeFunctionUses(Path)} list the functions a
 * formula or a workbook uses outside these lists, so a writer's test can assert there are none.
 */
public final class SafeFunctions {

    /** Functions proven safe when written without a prefix, in upper case. */
    public static final Set<String> SAFE = Set.of(
            "ABS", "INT", "TRUNC", "MOD", "QUOTIENT", "ROUND", "ROUNDUP", "ROUNDDOWN", "MROUND", "CEILING",
            "FLOOR", "SQRT", "POWER", "EXP", "LN", "LOG", "LOG10", "SIGN", "PI", "FACT", "COMBIN", "PRODUCT",
            "SUMSQ",
            "SIN", "COS", "TAN", "ASIN", "ACOS", "ATAN", "ATAN2", "RADIANS", "DEGREES",
            "SUM", "SUMIF", "SUMIFS", "SUMPRODUCT", "COUNT", "COUNTA", "COUNTBLANK", "COUNTIF", "COUNTIFS",
            "AVERAGE", "AVERAGEIF", "AVERAGEIFS", "MIN", "MAX", "MEDIAN", "LARGE", "SMALL", "PERCENTILE",
            "STDEV", "STDEVP", "VAR", "SUBTOTAL",
            "INDEX", "MATCH", "VLOOKUP", "HLOOKUP", "LOOKUP", "CHOOSE", "ROW", "ROWS", "COLUMN", "COLUMNS",
            "IF", "IFERROR", "AND", "OR", "NOT", "NA", "ISNUMBER", "ISTEXT", "ISBLANK", "ISERROR", "ISNA",
            "DATE", "YEAR", "MONTH", "DAY", "WEEKDAY", "EDATE", "EOMONTH", "HOUR", "TIME",
            "TEXT", "CONCATENATE", "LEFT", "RIGHT", "MID", "LEN", "UPPER", "LOWER", "TRIM", "SUBSTITUTE",
            "REPT", "FIXED", "VALUE", "FIND", "SEARCH", "EXACT");

    /** Functions proven safe only when written with the {@code _xlfn.} prefix, in upper case with the prefix. */
    public static final Set<String> SAFE_WITH_PREFIX = Set.of(
            "_XLFN.IFS", "_XLFN.MAXIFS", "_XLFN.MINIFS", "_XLFN.IFNA", "_XLFN.SWITCH", "_XLFN.CONCAT",
            "_XLFN.TEXTJOIN", "_XLFN.CEILING.MATH", "_XLFN.FLOOR.MATH", "_XLFN.STDEV.S", "_XLFN.DAYS");

    /** The TEXT number formats proven to give the same string in both evaluators. */
    public static final Set<String> SAFE_TEXT_FORMATS = Set.of("0.0", "0.00", "#,##0", "0.0%", "yyyy-mm-dd");

    /** A function name followed by an opening parenthesis; string literals are removed first. */
    private static final Pattern FUNCTION_CALL = Pattern.compile("(?<![A-Za-z0-9_.!$])([A-Za-z_][A-Za-z0-9_.]*)\\s*\\(");
    private static final Pattern STRING_LITERAL = Pattern.compile("\"(?:[^\"]|\"\")*\"");
    private static final Pattern QUOTED_SHEET = Pattern.compile("'(?:[^']|'')*'");

    private SafeFunctions() {
    }

    /**
     * The functions a formula calls, in order of first use, upper case, prefix kept.
     *
     * @param formula a formula, with or without the leading {@code =}
     * @return function names such as {@code SUM} or {@code _XLFN.IFS}
     */
    public static Set<String> functionsIn(String formula) {
        String code = QUOTED_SHEET.matcher(STRING_LITERAL.matcher(formula).replaceAll("\"\"")).replaceAll("''");
        Set<String> names = new LinkedHashSet<>();
        Matcher m = FUNCTION_CALL.matcher(code);
        while (m.find()) {
            names.add(m.group(1).toUpperCase(Locale.ROOT));
        }
        return names;
    }

    /**
     * @param formula a formula
     * @return the functions it calls that are in neither {@link #SAFE} nor {@link #SAFE_WITH_PREFIX}
     */
    public static Set<String> unsafeFunctions(String formula) {
        Set<String> unsafe = new LinkedHashSet<>(functionsIn(formula));
        unsafe.removeIf(name -> SAFE.contains(name) || SAFE_WITH_PREFIX.contains(name));
        return unsafe;
    }

    /**
     * Every formula cell of a workbook that calls a function outside the safe lists.
     *
     * @param workbook an .xlsx file
     * @return one line per offending cell: {@code 'Sheet'!B7 =FORMULA uses [NAME, ...]}; empty when all
     *     formulas are safe
     */
    public static List<String> unsafeFunctionUses(Path workbook) {
        List<String> uses = new ArrayList<>();
        try (XSSFWorkbook book = WorkbookCells.open(workbook)) {
            for (Cell cell : WorkbookCells.formulaCells(book)) {
                Set<String> unsafe = unsafeFunctions(cell.getCellFormula());
                if (!unsafe.isEmpty()) {
                    uses.add("'" + cell.getSheet().getSheetName() + "'!" + cell.getAddress() + " ="
                            + cell.getCellFormula() + " uses " + unsafe);
                }
            }
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException("cannot close " + workbook, e);
        }
        return uses;
    }
}
