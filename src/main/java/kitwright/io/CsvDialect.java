package kitwright.io;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.ToIntFunction;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVRecord;

/**
 * Which of the two conventions spreadsheets save CSV in a file follows: comma-separated with decimal points, or
 * semicolon-separated (as spreadsheet programs in locales that write a decimal comma save it) with decimal commas.
 * Method: the separator is the one of ',' and ';' that stands outside quotes on the header line; the decimal sign
 * of a ';' file is the one its plain numbers use ({@code 1200,5} or {@code 1200.5}). Guarantee: a file that holds
 * both separators on its header line, tabs only, or both decimal signs is refused with the line that shows it,
 * never guessed.
 */
final class CsvDialect {
    private static final Pattern POINT_NUMBER = Pattern.compile("[+-]?\\d+\\.\\d+");
    private static final Pattern COMMA_NUMBER = Pattern.compile("[+-]?\\d+,\\d+");

    private CsvDialect() {
    }

    /** The separator of the file's header line (its first non-blank line), or empty with a problem. */
    static Optional<Character> separator(Path file, String text, CsvColumns columns, Problems problems) {
        int line = 1;
        int start = 0;
        while (start < text.length()) {
            int end = text.indexOf('\n', start);
            String candidate = text.substring(start, end < 0 ? text.length() : end);
            if (!candidate.isBlank()) {
                return separator(file, line, candidate, columns, problems);
            }
            line++;
            start = end < 0 ? text.length() : end + 1;
        }
        return Optional.of(',');
    }

    private static Optional<Character> separator(Path file, int line, String header, CsvColumns columns,
                                                 Problems problems) {
        int commas = 0;
        int semicolons = 0;
        int tabs = 0;
        boolean quoted = false;
        for (char c : header.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted) {
                commas += c == ',' ? 1 : 0;
                semicolons += c == ';' ? 1 : 0;
                tabs += c == '\t' ? 1 : 0;
            }
        }
        String expected = "expected " + columns.header() + ", or " + columns.header().replace(',', ';')
                + " as saved with decimal commas";
        if (commas > 0 && semicolons > 0) {
            problems.add(file, line, "", "the header holds both ',' and ';' between names, so the column separator"
                    + " is unclear (" + expected + ")");
            return Optional.empty();
        }
        if (commas == 0 && semicolons == 0 && tabs > 0) {
            problems.add(file, line, "", "the file uses tabs to separate columns (" + expected + ")");
            return Optional.empty();
        }
        return Optional.of(semicolons > 0 ? ';' : ',');
    }

    /**
     * True when the rows of a ';' file write decimals with a comma, false with a point (or when no value shows
     * either); empty with a problem when both signs appear, naming the first value of the sign met second.
     */
    static Optional<Boolean> decimalComma(Path file, List<CSVRecord> rows, ToIntFunction<CSVRecord> lineOf,
                                          Problems problems) {
        String point = null;
        String comma = null;
        for (CSVRecord row : rows) {
            for (String value : row) {
                String cell = value.trim();
                if (point == null && POINT_NUMBER.matcher(cell).matches()) {
                    point = cell + "' on line " + lineOf.applyAsInt(row);
                } else if (comma == null && COMMA_NUMBER.matcher(cell).matches()) {
                    comma = cell + "' on line " + lineOf.applyAsInt(row);
                }
                if (point != null && comma != null) {
                    problems.add(file, lineOf.applyAsInt(row), "", "the file writes decimals both with a point ('"
                            + point + ") and with a comma ('" + comma + "), so its numbers are unclear (expected"
                            + " one decimal sign throughout: a comma in a file separated by ';', or a point)");
                    return Optional.empty();
                }
            }
        }
        return Optional.of(comma != null);
    }
}
