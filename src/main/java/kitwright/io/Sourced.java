package kitwright.io;

import java.nio.file.Path;

/**
 * A value read from a file, with the file and line it came from, so that checks across files can point back at
 * the row to fix.
 */
public record Sourced<T>(T value, Path file, int line) {

    /** A problem on this value's line. */
    public Problem problem(String column, String message) {
        return new Problem(file, line, column, message);
    }
}
