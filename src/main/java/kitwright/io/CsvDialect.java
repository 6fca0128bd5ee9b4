package kitwright.io;

import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Which of the two conventions spreadsheets save CSV in a file follows: comma-separated with decimal points, or
 * semicolon-separated (as spreadsheet programs in locales that write a decimal comma save it) with decimal commas.
 * Method: the separator is the one of ',' and ';' that stands outside quotes on the header line; the decimal sign
 * of a ';' file is the one its plain numbers use ({@code 1200,5} or {@code 1200.5}). What kit.json states
 * ({@link CsvConvention}) replaces the detection. Guarantee: a file that holds both separators on its header line,
 * tabs only, or both decimal signs, a ';' file whose only decimals read either way ({@code 1.200}: 1.2 with a
 * decimal point, or 1200 with a point between thousands, as decimal-comma locales group them), and a file that
 * contradicts what kit.json states are refused with the line that shows it, never guessed.
 */
final class CsvDialect {
    private static final Pattern POINT_NUMBER = Pattern.compile("[+-]?\\d+\\.\\d+");
    private static final Pattern COMMA_NUMBER = Pattern.compile("[+-]?\\d+,\\d+");
    /** A decimal point or a point between thousands: 1.200 is 1.2 or 1200. */
    private static final Pattern POINT_OR_THOUSANDS = Pattern.compile("[+-]?\\d{1,3}\\.\\d{3}");

    private CsvDialect() {
    }

    /** The separator of the file's header line (its first non-blank line), or empty with a problem. */
    static Optional<Character> separator(Path file, String text, CsvColumns columns, CsvConvention stated,
                                         Problems problems) {
        int line = 1;
        int start = 0;
        while (start < text.length()) {
            int end = text.indexOf('\n', start);
            String candidate = text.substring(start, end < 0 ? text.length() : end);
            if (!candidate.isBlank()) {
                return separator(file, line, candidate, columns, stated, problems);
            }
            line++;
            start = end < 0 ? text.length() : end + 1;
        }
        return Optional.of(stated.delimiter() == null ? ',' : stated.delimiter());
    }

    private static Optional<Character> separator(Path file, int line, String header, CsvColumns columns,
                                                 CsvConvention stated, Problems problems) {
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
        if (stated.delimiter() != null) {
            char other = stated.delimiter() == ',' ? ';' : ',';
            if ((other == ',' ? commas : semicolons) > 0 && (other == ',' ? semicolons : commas) == 0) {
                problems.add(file, line, "", "the header is separated by '" + other + "', but "
                        + CsvConvention.stated("delimiter", stated.delimiter()) + " (expected "
                        + columns.header().replace(',', stated.delimiter()) + " as kit.json states, or change"
                        + " csv.delimiter in kit.json)");
                return Optional.empty();
            }
            if (commas == 0 && semicolons == 0 && tabs > 0) {
                problems.add(file, line, "", "the file uses tabs to separate columns (" + expected + ")");
                return Optional.empty();
            }
            return Optional.of(stated.delimiter());
        }
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
     * True when the rows write decimals with a comma, false with a point (or when no value shows either): a ','
     * file writes a point, a ';' file the sign kit.json states or the one its numbers show. Empty with a problem
     * when both signs appear (naming the first value of the sign met second), when the only decimals read either
     * way, or when a value contradicts the sign kit.json states.
     *
     * @param lines the file's records, header first
     */
    static Optional<Boolean> decimalComma(Path file, char separator, List<CsvTable.Line> lines, CsvConvention stated,
                                          Problems problems) {
        Character sign = stated.decimalSign();
        if (separator == ',') {
            if (sign != null && sign == ',') {
                problems.add(file, lines.isEmpty() ? 1 : lines.get(0).line(), "", "the file is separated by ',',"
                        + " but " + CsvConvention.stated("decimalSign", ',') + " (expected a file separated by ';',"
                        + " as spreadsheets save decimal commas, or change csv.decimalSign in kit.json)");
                return Optional.empty();
            }
            return Optional.of(false);
        }
        Seen point = null;
        Seen comma = null;
        Seen either = null;
        for (CsvTable.Line row : lines.subList(Math.min(1, lines.size()), lines.size())) {
            for (String value : row.values()) {
                String cell = value.trim();
                boolean isPoint = POINT_NUMBER.matcher(cell).matches();
                boolean isComma = COMMA_NUMBER.matcher(cell).matches();
                if (sign != null && (sign == ',' ? isPoint : isComma)) {
                    problems.add(file, row.line(), "", "'" + cell + "' is written with a decimal "
                            + (isPoint ? "point" : "comma") + ", but " + CsvConvention.stated("decimalSign", sign)
                            + " (expected numbers written with a decimal " + (sign == ',' ? "comma" : "point")
                            + " and without a thousands separator, or change csv.decimalSign in kit.json)");
                    return Optional.empty();
                }
                Seen seen = new Seen(cell, row.line());
                if (isPoint && POINT_OR_THOUSANDS.matcher(cell).matches()) {
                    either = either == null ? seen : either;
                } else if (isPoint) {
                    point = point == null ? seen : point;
                } else if (isComma) {
                    comma = comma == null ? seen : comma;
                }
                if ((point != null || either != null) && comma != null) {
                    problems.add(file, row.line(), "", "the file writes decimals both with a point ("
                            + (point != null ? point : either) + ") and with a comma (" + comma + "), so its"
                            + " numbers are unclear (expected one decimal sign throughout: a comma in a file"
                            + " separated by ';', or a point)");
                    return Optional.empty();
                }
            }
        }
        if (sign != null) {
            return Optional.of(sign == ',');
        }
        if (either != null && point == null) {
            String number = either.value();
            problems.add(file, either.line(), "", "'" + number + "' may be " + new BigDecimal(number)
                    .stripTrailingZeros().toPlainString() + " (a decimal point) or " + number.replace(".", "")
                    + " (a point between thousands, as files separated by ';' often group them), and no other"
                    + " number of the file tells which, so its numbers are unclear (expected numbers without a"
                    + " thousands separator, or the decimal sign stated in kit.json: \"csv\": {\"decimalSign\":"
                    + " \".\"})");
            return Optional.empty();
        }
        return Optional.of(comma != null);
    }

    /** A value met in the file and its line, as messages quote it: {@code '1200.5' on line 3}. */
    private record Seen(String value, int line) {
        @Override
        public String toString() {
            return "'" + value + "' on line " + line;
        }
    }
}
