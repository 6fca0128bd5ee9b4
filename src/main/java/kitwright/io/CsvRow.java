package kitwright.io;

import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * One data row of a {@link CsvTable}, with typed access to its values. A value that is wrong adds a problem naming
 * the file, line and column, and reads as null; a blank value reads as null without a problem (the reader decides
 * whether blank is allowed, see {@link #required}).
 */
public final class CsvRow {
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)");
    private static final Pattern DECIMAL_COMMA = Pattern.compile("[+-]?\\d+,\\d+");

    private final Path file;
    private final String sheet;
    private final int line;
    private final Map<String, String> values;
    private final Problems problems;
    private int problemCount;

    private final boolean decimalComma;

    CsvRow(Path file, int line, Map<String, String> values, Problems problems) {
        this(file, line, values, problems, false);
    }

    /** A row whose numbers are written with a decimal comma ({@code 1200,5}) when {@code decimalComma}. */
    CsvRow(Path file, int line, Map<String, String> values, Problems problems, boolean decimalComma) {
        this(file, null, line, values, problems, decimalComma);
    }

    /** A row of a sheet of a workbook ({@code sheet} null for a CSV file), {@code line} its row number. */
    CsvRow(Path file, String sheet, int line, Map<String, String> values, Problems problems, boolean decimalComma) {
        this.file = file;
        this.sheet = sheet;
        this.line = line;
        this.values = Map.copyOf(values);
        this.problems = problems;
        this.decimalComma = decimalComma;
    }

    /** The text of a number with a point as decimal sign: a decimal comma of this file's rows becomes a point. */
    private String numeral(String text) {
        return decimalComma && DECIMAL_COMMA.matcher(text).matches() ? text.replace(',', '.') : text;
    }

    public Path file() {
        return file;
    }

    /** The sheet of the workbook the row is on, or null for a CSV file. */
    public String sheet() {
        return sheet;
    }

    /** The line the row starts on; the header is line 1 (in a sheet, the spreadsheet's row number). */
    public int line() {
        return line;
    }

    /** Another line of the same table as messages name it: "line 3" in a CSV file, "row 3" in a sheet. */
    public String at(int otherLine) {
        return (sheet == null ? "line " : "row ") + otherLine;
    }

    /** True when no value of this row has been found wrong so far. */
    public boolean clean() {
        return problemCount == 0;
    }

    /** Reports a problem on this row. */
    public void problem(String column, String message) {
        problemCount++;
        problems.add(file, sheet, line, column, message);
    }

    /** A row-located value, for checks that run after reading. */
    public <T> Sourced<T> sourced(T value) {
        return new Sourced<>(value, file, sheet, line);
    }

    /** The trimmed text of a column, empty when blank or when the file has no such column. */
    public String text(String column) {
        return values.getOrDefault(column, "");
    }

    public boolean blank(String column) {
        return text(column).isEmpty();
    }

    /** The text of a column that names something: not blank, no control characters; or null after reporting it. */
    public String required(String column, String expected) {
        String text = text(column);
        if (text.isEmpty()) {
            problem(column, "the value is blank (expected " + expected + ")");
            return null;
        }
        Optional<String> unsafe = Names.problem(text, expected);
        if (unsafe.isPresent()) {
            problem(column, unsafe.get());
            return null;
        }
        return text;
    }

    /**
     * A number at least {@code minimum} (above it when {@code minimumAllowed} is false), or null when blank or
     * wrong.
     */
    public Double number(String column, double minimum, boolean minimumAllowed, String expected) {
        return number(column, minimum, minimumAllowed, Limits.MAX_NUMBER, expected);
    }

    /**
     * A number at least {@code minimum} (above it when {@code minimumAllowed} is false) and at most {@code maximum},
     * or null when blank or wrong.
     */
    public Double number(String column, double minimum, boolean minimumAllowed, double maximum, String expected) {
        String text = text(column);
        if (text.isEmpty()) {
            return null;
        }
        if (!NUMBER.matcher(numeral(text)).matches()) {
            String hint = DECIMAL_COMMA.matcher(text).matches() ? "; use a point for decimals" : "";
            problem(column, "'" + text + "' is not a number (expected " + expected + hint + ")");
            return null;
        }
        double value = Double.parseDouble(numeral(text));
        if (value < minimum || (!minimumAllowed && value == minimum)) {
            String wrong = value < 0 && minimum >= 0 ? "is negative" : value == 0 ? "is zero" : "is too small";
            problem(column, text + " " + wrong + " (expected " + expected + ")");
            return null;
        }
        if (!(value <= maximum)) {
            problem(column, tooLarge(text, expected, maximum));
            return null;
        }
        return value;
    }

    /** A length in millimetres above zero and at most {@link Limits#MAX_LENGTH_MM}, or null when blank or wrong. */
    public Double length(String column, String expected) {
        return number(column, 0, false, Limits.MAX_LENGTH_MM, expected);
    }

    /** A whole number at least {@code minimum}, or null when blank or wrong. */
    public Integer whole(String column, int minimum, String expected) {
        return whole(column, minimum, Integer.MAX_VALUE, expected);
    }

    /** A count of items, at least {@code minimum} and at most {@link Limits#MAX_COUNT}, or null when blank or wrong. */
    public Integer count(String column, int minimum, String expected) {
        return whole(column, minimum, Limits.MAX_COUNT, expected);
    }

    /** A whole number from {@code minimum} to {@code maximum}, or null when blank or wrong. */
    public Integer whole(String column, int minimum, int maximum, String expected) {
        String text = text(column);
        if (text.isEmpty()) {
            return null;
        }
        if (!NUMBER.matcher(numeral(text)).matches()) {
            problem(column, "'" + text + "' is not a number (expected " + expected + ")");
            return null;
        }
        BigDecimal value = new BigDecimal(numeral(text));
        if (value.stripTrailingZeros().scale() > 0) {
            problem(column, text + " is not a whole number (expected " + expected + ")");
            return null;
        }
        if (value.compareTo(BigDecimal.valueOf(maximum)) > 0) {
            problem(column, tooLarge(text, expected, maximum));
            return null;
        }
        int whole = value.intValueExact();
        if (whole < minimum) {
            String wrong = whole < 0 ? "is negative" : whole == 0 ? "is zero" : "is too small";
            problem(column, text + " " + wrong + " (expected " + expected + ")");
            return null;
        }
        return whole;
    }

    private static String tooLarge(String text, String expected, double maximum) {
        String wrong = maximum >= Integer.MAX_VALUE ? "is too large"
                : "is above the limit of " + Figures.plain(maximum);
        return text + " " + wrong + " (expected " + expected + ")";
    }

    /** A yes/no flag ({@code yes}, {@code no}, {@code true}, {@code false}), or null when blank or wrong. */
    public Boolean flag(String column) {
        String text = text(column).toLowerCase(Locale.ROOT);
        switch (text) {
            case "" -> {
                return null;
            }
            case "yes", "true" -> {
                return true;
            }
            case "no", "false" -> {
                return false;
            }
            default -> {
                problem(column, "'" + text(column) + "' is not yes or no (expected yes or no)");
                return null;
            }
        }
    }

    /** Reports each of the given columns that is blank. */
    public void requireValues(String... columns) {
        for (String column : columns) {
            if (blank(column)) {
                problem(column, "the value is blank (expected a number)");
            }
        }
    }
}
