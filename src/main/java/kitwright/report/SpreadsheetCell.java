package kitwright.report;

import java.util.Arrays;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Every cell of every CSV file kitwright writes passes through here, so that no spreadsheet opening the file runs a
 * cell as a formula: a cell starting with {@code =}, {@code +}, {@code -}, {@code @}, a tab or a carriage return
 * gets a leading single quote, which spreadsheets show as text (OWASP, "CSV Injection", the mitigation it gives).
 * A negative number is left as it is, so it stays a number. The readers refuse such names already
 * ({@code kitwright.io.Names}); this is the second guard, for names from elsewhere (a folder name).
 */
public final class SpreadsheetCell {
    private static final String FORMULA_STARTS = "=+-@\t\r";
    private static final Pattern NEGATIVE_NUMBER = Pattern.compile("-\\d+(\\.\\d+)?([eE][-+]?\\d+)?");

    private SpreadsheetCell() {
    }

    /** The cell as it is safe to write: unchanged, or with a leading single quote. Null stays null (empty). */
    public static String safe(String cell) {
        if (cell == null || cell.isEmpty() || FORMULA_STARTS.indexOf(cell.charAt(0)) < 0
                || NEGATIVE_NUMBER.matcher(cell).matches()) {
            return cell;
        }
        return "'" + cell;
    }

    /** A row of values ({@code toString}, null as empty), each made safe. */
    public static List<String> row(Object... cells) {
        return row(Arrays.asList(cells));
    }

    /** A row of values ({@code toString}, null as empty), each made safe. */
    public static List<String> row(List<?> cells) {
        return cells.stream().map(c -> c == null ? "" : safe(c.toString())).toList();
    }
}
