package kitwright.io;

import java.nio.file.Path;

/**
 * One thing wrong with the input, printed as {@code FILE:LINE: COLUMN: what is wrong (what was expected)}, or
 * {@code FILE:SHEET:ROW: COLUMN: ...} for a sheet of a workbook ({@code kit.xlsx:bars:3: length_mm: ...}).
 * LINE counts a CSV header as line 1, ROW is the spreadsheet's row number; 0 means the whole file (or sheet).
 * SHEET is null for text files. COLUMN is a CSV column or a kit.json key, or empty.
 * A problem with a command-line option has no file and prints as {@code command line: --option: what is wrong}.
 * Control characters quoted from the input are printed escaped ({@code \n}, {@code \t}), so each problem is one line.
 */
public record Problem(Path file, String sheet, int line, String column, String message) {

    /** A problem in a text file (no sheet). */
    public Problem(Path file, int line, String column, String message) {
        this(file, null, line, column, message);
    }

    public static Problem ofFile(Path file, String message) {
        return new Problem(file, 0, "", message);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(file == null ? "command line" : file.toString());
        if (sheet != null) {
            sb.append(':').append(sheet);
        }
        if (line > 0) {
            sb.append(':').append(line);
        }
        sb.append(": ");
        if (column != null && !column.isEmpty()) {
            sb.append(column).append(": ");
        }
        return oneLine(sb.append(message).toString());
    }

    /** Control characters from the input (a line break in a header, a tab in a name) shown escaped: one line each. */
    private static String oneLine(String text) {
        if (text.chars().noneMatch(Character::isISOControl)) {
            return text;
        }
        StringBuilder sb = new StringBuilder(text.length() + 8);
        for (char c : text.toCharArray()) {
            switch (c) {
                case '\n' -> sb.append("\\n");
                case '\r' -> sb.append("\\r");
                case '\t' -> sb.append("\\t");
                default -> {
                    if (Character.isISOControl(c)) {
                        sb.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.toString();
    }
}
