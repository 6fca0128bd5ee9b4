package kitwright.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ThreadLocalRandom;

/**
 * A result folder that appears whole or not at all. Files are written into a hidden temporary folder beside the
 * target (same parent, so the same file system); {@link #commit} then moves it into place with an atomic rename
 * where the file system allows. An existing target is replaced only after the new folder is complete, and only
 * when it is empty or kitwright wrote it: its marker file {@value #MARKER} lists the files kitwright wrote and the
 * folder holds nothing else ({@link OutputMarker}), so that a mistyped {@code --out} never wipes a folder of the
 * user's. Closing without commit deletes the temporary folder; temporary and old folders that a killed run left
 * beside the target are deleted by the next run into it.
 *
 * <pre>{@code
 * try (OutputFolder out = OutputFolder.create(dir)) {
 *     out.write("summary.json", PrettyJson.write(summary));
 *     out.commit();
 * }
 * }</pre>
 */
public final class OutputFolder implements AutoCloseable {
    /** Marks a folder as kitwright's output, which the next run may replace whole. */
    public static final String MARKER = OutputMarker.NAME;
    private static final String PARTIAL = ".partial-";
    private static final String OLD = ".old-";

    private final Path target;
    private final Path temporary;
    private boolean committed;

    private OutputFolder(Path target, Path temporary) {
        this.target = target;
        this.temporary = temporary;
    }

    /**
     * Starts a result folder for {@code target}; throws InvalidInputException when the target is a file, a folder
     * kitwright did not write, or a place that cannot be written (see {@link #check}).
     */
    public static OutputFolder create(Path target) throws InvalidInputException, IOException {
        check(target);
        Path absolute = target.toAbsolutePath().normalize();
        Path parent = absolute.getParent();
        Path temporary;
        try {
            Files.createDirectories(parent);
            removeLeftovers(absolute);
            temporary = newFolder(parent, "." + absolute.getFileName() + PARTIAL);
        } catch (FileSystemException e) {
            throw new InvalidInputException(cannotWrite(target, e));
        }
        OutputFolder folder = new OutputFolder(absolute, temporary);
        try {
            // a marker from the start, so that a run killed midway leaves a folder the next run knows as its own
            Files.writeString(temporary.resolve(MARKER), OutputMarker.text(Set.of()), StandardCharsets.UTF_8);
        } catch (IOException e) {
            folder.close(); // leave no empty temporary folder behind
            throw e;
        }
        return folder;
    }

    /**
     * Throws when {@code target} cannot become a result folder: it is a file, a folder kitwright did not write, the
     * file system root, under a file, or under a folder that is not writable. Commands call it before planning so
     * that a bad {@code --out} costs no work; {@link #create} checks again.
     */
    public static void check(Path target) throws InvalidInputException, IOException {
        Path absolute = target.toAbsolutePath().normalize();
        if (absolute.getParent() == null) {
            throw new InvalidInputException(Problem.ofFile(target, "the root of the file system cannot be replaced"
                    + " (expected a new or empty folder, or one kitwright wrote before)"));
        }
        if (Files.isSymbolicLink(absolute) && !Files.exists(absolute)) {
            throw new InvalidInputException(Problem.ofFile(target, "this is a symbolic link to "
                    + Files.readSymbolicLink(absolute) + ", which does not exist (expected a folder, or a link to"
                    + " one; remove the link or make its folder)"));
        }
        if (Files.exists(absolute)) {
            Optional<String> refusal = Files.isDirectory(absolute) ? OutputMarker.refusal(absolute)
                    : Optional.of("this is a file, not a folder");
            if (refusal.isPresent()) {
                throw new InvalidInputException(Problem.ofFile(target, refusal.get() + " (expected a new or empty"
                        + " folder, or one kitwright wrote before holding only its files, which is then replaced)"));
            }
        }
        Optional<Problem> parent = parentProblem(target, absolute);
        if (parent.isPresent()) {
            throw new InvalidInputException(parent.get());
        }
    }

    /** What stops a file or folder being made at {@code absolute}: a file where a folder should be, or no rights. */
    static Optional<Problem> parentProblem(Path shown, Path absolute) {
        Path existing = absolute.getParent();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            return Optional.empty();
        }
        if (!Files.isDirectory(existing)) {
            return Optional.of(Problem.ofFile(shown, existing + " is a file, so nothing can be written under it"
                    + " (expected a path under a folder)"));
        }
        if (!Files.isWritable(existing)) {
            return Optional.of(Problem.ofFile(shown, "the folder " + existing + " is not writable (expected a place"
                    + " you may write to)"));
        }
        return Optional.empty();
    }

    /** The problem to show when the file system refuses to make a result's folder. */
    static Problem cannotWrite(Path shown, FileSystemException e) {
        String reason = e.getReason() != null ? e.getReason()
                : e instanceof FileAlreadyExistsException ? "a file is in the way"
                : e instanceof AccessDeniedException ? "permission denied"
                : e instanceof NoSuchFileException ? "no such folder, and it cannot be made"
                : "the file system refused";
        String where = e.getFile() != null ? e.getFile() : shown.toString();
        return Problem.ofFile(shown, "cannot write " + where + ": " + reason + " (expected a place you may write"
                + " to)");
    }

    /** The final location. */
    public Path target() {
        return target;
    }

    /** Where a file of the result is being written now (inside the temporary folder). */
    public Path resolve(String name) {
        if (committed) {
            throw new IllegalStateException("the output folder is already in place: " + target);
        }
        Path file = temporary.resolve(name).normalize();
        if (!file.startsWith(temporary)) {
            throw new IllegalArgumentException("not a name inside the output folder: " + name);
        }
        return file;
    }

    /** Writes a UTF-8 text file of the result, creating sub-folders as needed. */
    public Path write(String name, String text) throws IOException {
        return write(name, text.getBytes(StandardCharsets.UTF_8));
    }

    /** Writes a file of the result (e.g. a workbook), creating sub-folders as needed. */
    public Path write(String name, byte[] content) throws IOException {
        Path file = resolve(name);
        try {
            Files.createDirectories(file.getParent());
            return Files.write(file, content);
        } catch (FileSystemException e) {
            throw e;
        } catch (IOException e) {
            // a full disk says only "No space left on device": name the file the user asked for
            throw new FileSystemException(target.resolve(name).toString(), null, e.getMessage());
        }
    }

    /** Moves the complete folder into place, replacing a previous kitwright result. */
    public void commit() throws IOException {
        if (committed) {
            return;
        }
        Files.writeString(temporary.resolve(MARKER), OutputMarker.text(OutputMarker.files(temporary)),
                StandardCharsets.UTF_8);
        Path old = null;
        if (Files.exists(target)) {
            old = target.resolveSibling(temporary.getFileName().toString().replace(PARTIAL, OLD));
            move(target, old);
        }
        try {
            move(temporary, target);
        } catch (IOException e) {
            if (old != null) {
                move(old, target);
            }
            throw e;
        }
        committed = true;
        if (old != null) {
            deleteTree(old);
        }
    }

    /** Deletes the temporary folder unless the result was committed. */
    @Override
    public void close() throws IOException {
        if (!committed) {
            deleteTree(temporary);
        }
    }

    /** A new folder with a unique name; unlike a temp directory it gets the usual permissions (umask). */
    private static Path newFolder(Path parent, String prefix) throws IOException {
        return newEntry(parent, prefix, true);
    }

    /**
     * A new empty folder or file in {@code parent}, named {@code prefix} and a random suffix; unlike a temporary
     * file or folder of the JDK it gets the usual permissions (umask), so the result is readable as any other file.
     */
    static Path newEntry(Path parent, String prefix, boolean folder) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path entry = parent.resolve(prefix + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36));
            try {
                return folder ? Files.createDirectory(entry) : Files.createFile(entry);
            } catch (FileAlreadyExistsException e) {
                if (attempt > 100) {
                    throw e;
                }
            }
        }
    }

    /**
     * Deletes the temporary ({@code .NAME.partial-*}) and old ({@code .NAME.old-*}) folders a killed run left
     * beside {@code target}: only folders of exactly that name form that hold a kitwright marker. Two runs into the
     * same target at the same time are not supported (the second would delete the first one's temporary folder).
     */
    static void removeLeftovers(Path target) throws IOException {
        String base = "." + target.getFileName();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(target.getParent(),
                entry -> leftover(entry.getFileName().toString(), base))) {
            for (Path entry : entries) {
                if (Files.isDirectory(entry, LinkOption.NOFOLLOW_LINKS) && OutputMarker.listed(entry).isPresent()) {
                    deleteTree(entry);
                }
            }
        }
    }

    /** A name {@link #newEntry} gives: the base, {@code .partial-} or {@code .old-}, then a base-36 number. */
    static boolean leftover(String name, String base) {
        for (String kind : new String[] {PARTIAL, OLD}) {
            if (name.startsWith(base + kind) && name.substring((base + kind).length()).matches("[0-9a-z]{1,13}")) {
                return true;
            }
        }
        return false;
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attributes) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException failure) throws IOException {
                if (failure != null) {
                    throw failure;
                }
                Files.delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
