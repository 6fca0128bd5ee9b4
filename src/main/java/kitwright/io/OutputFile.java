package kitwright.io;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * A single result file (e.g. {@code --json FILE}) that appears whole or not at all: the text is written to a
 * hidden file beside the target (same folder, so the same file system) and renamed into place, replacing an older
 * file. {@link #check} tells before any work whether the target can be written, so a command can refuse a bad path
 * before it plans anything; a path that turns out unusable while writing is reported the same way (exit code 2),
 * never as an internal error. {@link #checkReplaceable} keeps a result file from replacing a file of the user's.
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

    /**
     * Throws when {@code file} exists and is not a JSON document kitwright wrote, unless {@code force}: a file is
     * kitwright's when it is a regular file (not a link) holding a JSON object in kitwright's layout (it reads back
     * and writes again to the same bytes, {@link PrettyJson}) whose keys are those of one of {@code documents}.
     */
    public static void checkReplaceable(Path file, List<Set<String>> documents, boolean force)
            throws InvalidInputException, IOException {
        Path absolute = file.toAbsolutePath().normalize();
        if (force || !Files.exists(absolute, LinkOption.NOFOLLOW_LINKS) || Files.isDirectory(absolute)) {
            return;
        }
        if (!writtenByKitwright(absolute, documents)) {
            String what = Files.isSymbolicLink(absolute) ? "this is a symbolic link" : "the file exists";
            throw new InvalidInputException(Problem.ofFile(file, what + " and was not written by kitwright, so it"
                    + " is left alone (expected a new file, or a JSON file kitwright wrote; give --force to replace"
                    + " it)"));
        }
    }

    private static boolean writtenByKitwright(Path file, List<Set<String>> documents) throws IOException {
        if (!Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS) || Files.size(file) > Limits.MAX_FILE_BYTES) {
            return false;
        }
        String text = Files.readString(file, StandardCharsets.ISO_8859_1); // any bytes; compared as bytes below
        JsonNode root;
        try {
            root = PrettyJson.mapper().readTree(Files.readAllBytes(file));
        } catch (JacksonException e) {
            return false;
        }
        if (root == null || !root.isObject()) {
            return false;
        }
        Set<String> keys = new HashSet<>();
        root.fieldNames().forEachRemaining(keys::add);
        byte[] again = PrettyJson.write(root).getBytes(StandardCharsets.UTF_8);
        return documents.contains(keys) && new String(again, StandardCharsets.ISO_8859_1).equals(text);
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
            try {
                Files.writeString(temporary, text, StandardCharsets.UTF_8);
            } catch (FileSystemException e) {
                throw e;
            } catch (IOException e) {
                throw new FileSystemException(file.toString(), null, e.getMessage()); // name the file, not the temporary
            }
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
