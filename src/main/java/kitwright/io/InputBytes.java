package kitwright.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

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

    /**
     * Why a file could not be read, in words: "permission denied" (also for a folder at mode 000, which the
     * file system reports the same way), "a symbolic link loop", "this is a folder", else the system's reason.
     */
    static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied (expected a file you may read; check its permissions and its folder's)";
        }
        String reason = e instanceof FileSystemException f && f.getReason() != null ? f.getReason()
                : String.valueOf(e.getMessage());
        if (e instanceof FileSystemLoopException || reason.contains("Too many levels of symbolic links")) {
            return "a symbolic link loop: the link leads back to itself (expected a link to an existing file)";
        }
        if (reason.contains("Is a directory")) {
            return "this is a folder, not a file (expected a file)";
        }
        return reason;
    }

    /**
     * A problem with the bytes of a text file that decoding lets through: zero bytes (UTF-16 text saved without a
     * byte-order mark decodes as UTF-8 with a zero byte before or after every letter) or a byte-order mark inside
     * the file (two files joined), which would be an invisible character in a name.
     */
    static Optional<Problem> textProblem(Path file, byte[] bytes, String expected) {
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == 0) {
                return Optional.of(new Problem(file, lineOf(bytes, i), "", "the file holds zero bytes, as UTF-16"
                        + " text does, so it is not UTF-8 (expected " + expected + ")"));
            }
            if (i > 0 && i + 2 < bytes.length && bytes[i] == (byte) 0xEF && bytes[i + 1] == (byte) 0xBB
                    && bytes[i + 2] == (byte) 0xBF) {
                return Optional.of(new Problem(file, lineOf(bytes, i), "", "a byte-order mark (the invisible"
                        + " character U+FEFF) stands inside the file, as where two files were joined (expected it"
                        + " at the very start of the file only; delete it)"));
            }
        }
        return Optional.empty();
    }

    /** The line (from 1) holding byte {@code index}. */
    static int lineOf(byte[] bytes, int index) {
        int line = 1;
        for (int i = 0; i < index; i++) {
            line += bytes[i] == '\n' ? 1 : 0;
        }
        return line;
    }

    /** The problem to report for a file above the limit. */
    static Problem tooLarge(Path file, String expected) {
        return Problem.ofFile(file, "the file is larger than " + (Limits.MAX_FILE_BYTES >> 20) + " MB (expected "
                + expected + ")");
    }
}
