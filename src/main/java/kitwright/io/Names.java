package kitwright.io;

import java.util.Optional;

/**
 * The rules every name read from the input obeys (marks, sections, materials, structures, crate and vehicle types,
 * the kit's name): one line, at most {@value #MAX_LENGTH} characters, and not starting with a character that makes
 * a spreadsheet run the cell as a formula when it opens one of kitwright's CSV files ({@code = + - @}; OWASP, "CSV
 * Injection"). The CSV writers neutralise such cells too ({@code kitwright.report.SpreadsheetCell}); refusing them
 * at input tells the user at once.
 */
final class Names {
    /** Longest name: far beyond a mark or section, short enough for a saw sheet's column. */
    static final int MAX_LENGTH = 200;
    private static final String FORMULA_STARTS = "=+-@";

    private Names() {
    }

    /** What is wrong with {@code name} (not blank), or empty when it is a good name. */
    static Optional<String> problem(String name, String expected) {
        if (name.chars().anyMatch(Character::isISOControl)) {
            return Optional.of("the name '" + name + "' holds a line break, tab or other control character"
                    + " (expected " + expected + ", on one line)");
        }
        if (name.length() > MAX_LENGTH) {
            return Optional.of("the name is " + name.length() + " characters long, '" + name.substring(0, 20)
                    + "...' (expected " + expected + ", at most " + MAX_LENGTH + " characters)");
        }
        if (FORMULA_STARTS.indexOf(name.charAt(0)) >= 0) {
            return Optional.of("the name '" + name + "' starts with '" + name.charAt(0) + "', which a spreadsheet"
                    + " would run as a formula (expected " + expected + ", starting with a letter or digit)");
        }
        return Optional.empty();
    }
}
