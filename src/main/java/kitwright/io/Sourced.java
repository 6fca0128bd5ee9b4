package kitwright.io;

import java.nio.file.Path;

/**
 * A value read from a file, with the file (and sheet, for a workbook; else null) and line it came from, so that
 * checks across files can point back at the row to fix.
 */
public record Sourced<T>(T value, Path file, String sheet, int line) {

    /** A value read from a text file. */
    public Sourced(T value, Path file, int line) {
        this(value, file, null, line);
    }

    /** A problem on this value's line. */
    public Problem problem(String column, String message) {
        return new Problem(file, sheet, line, column, message);
    }
}
