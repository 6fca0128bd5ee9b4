package kitwright.io;

import java.nio.file.Path;

/**
 * One thing wrong with the input, printed as {@code FILE:LINE: COLUMN: what is wrong (what was expected)}.
 * LINE counts a CSV header as line 1; 0 means the whole file. COLUMN is a CSV column or a kit.json key, or empty.
 */
public record Problem(Path file, int line, String column, String message) {

    public static Problem ofFile(Path file, String message) {
        return new Problem(file, 0, "", message);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(file == null ? "(arguments)" : file.toString());
        if (line > 0) {
            sb.append(':').append(line);
        }
        sb.append(": ");
        if (column != null && !column.isEmpty()) {
            sb.append(column).append(": ");
        }
        return sb.append(message).toString();
    }
}
