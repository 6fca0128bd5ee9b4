package kitwright.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Optional;

/**
 * A single result file (e.g. {@code --json FILE}) that appears whole or not at all: the text is written to a
 * hidden file beside the target (same folder, so the same file system) and renamed into place, replacing an older
 * file. {@link #check} tells before any work whether the target can be written, so a command can refuse a bad path
 * before it plans anything; a path that turns out unusable while writing is reported the same way (exit code 2),
 * never as an internal error.
 */
public final class OutputFile {
    private OutputFile() {
    }

    /**
     * Throws when {@code file} cannot be a result file: it is a folder, a file stands where one of its folders
     * should be, or the nearest existing folder is not writable.
     */
    public static void check(Path file) throws InvalidInputException {
        Path absolute = file.toAbsolutePath().normalize();
        if (Files.isDirectory(absolute)) {
            throw new InvalidInputException(Problem.ofFile(file, "this is a folder (expected a file name, e.g. "
                    + "plan.json)"));
        }
        Optional<Problem> parent = OutputFolder.parentProblem(file, absolute);
        if (parent.isPresent()) {
            throw new InvalidInputException(parent.get());
        }
    }

    /** Writes {@code text} as UTF-8 to {@code file}, creating its folders; the old file is replaced whole. */
    public static void write(Path file, String text) throws InvalidInputException, IOException {
        check(file);
        Path absolute = file.toAbsolutePath().normalize();
        Path temporary;
        try {
            Files.createDirectories(absolute.getParent());
            temporary = OutputFolder.newEntry(absolute.getParent(), "." + absolute.getFileName() + ".partial-", false);
        } catch (FileSystemException e) {
            throw new InvalidInputException(OutputFolder.cannotWrite(file, e));
        }
        try {
            Files.writeString(temporary, text, StandardCharsets.UTF_8);
            try {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
