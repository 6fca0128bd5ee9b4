package kitwright.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads a whole input file, refusing one larger than {@link Limits#MAX_FILE_BYTES}: a kit's files are kilobytes,
 * and a path that names a device or a huge file by mistake must become a clear problem, not an out-of-memory error.
 */
final class InputBytes {
    private InputBytes() {
    }

    /** Thrown when the file holds more than {@link Limits#MAX_FILE_BYTES} bytes. */
    static final class TooLargeException extends IOException {
        private static final long serialVersionUID = 1L;

        TooLargeException(Path file) {
            super(file + " is larger than " + (Limits.MAX_FILE_BYTES >> 20) + " MB");
        }
    }

    /** The file's bytes; reads at most one byte past the limit, so devices and growing files end too. */
    static byte[] read(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            byte[] bytes = in.readNBytes(Limits.MAX_FILE_BYTES + 1);
            if (bytes.length > Limits.MAX_FILE_BYTES) {
                throw new TooLargeException(file);
            }
            return bytes;
        }
    }

    /** The problem to report for a file above the limit. */
    static Problem tooLarge(Path file, String expected) {
        return Problem.ofFile(file, "the file is larger than " + (Limits.MAX_FILE_BYTES >> 20) + " MB (expected "
                + expected + ")");
    }
}
