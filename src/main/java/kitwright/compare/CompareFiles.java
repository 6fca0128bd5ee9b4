package kitwright.compare;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

/**
 * Writes {@code compare.json}, {@code compare.csv} and {@code compare.html} into a folder without ever leaving half
 * a result: the files are written into a temporary folder beside the target and then moved into place. A new
 * target folder is moved in whole; into an existing one the three files are moved one by one (each move atomic
 * on the same file system), so other files already there are kept.
 */
public final class CompareFiles {
    public static final String JSON = "compare.json";
    public static final String CSV = "compare.csv";
    public static final String HTML = "compare.html";

    private CompareFiles() {
    }

    /** Writes the three files for the options into {@code out}. */
    public static void write(Path out, List<OptionSummary> options) throws IOException {
        Path target = out.toAbsolutePath().normalize();
        Path parent = target.getParent();
        Files.createDirectories(parent);
        if (Files.exists(target) && !Files.isDirectory(target)) {
            throw new IOException(target + " exists and is not a folder");
        }
        Path temp = Files.createTempDirectory(parent, "." + target.getFileName() + ".tmp-");
        try {
            Files.writeString(temp.resolve(JSON), CompareJson.toJson(options), StandardCharsets.UTF_8);
            try (Writer w = Files.newBufferedWriter(temp.resolve(CSV), StandardCharsets.UTF_8)) {
                CompareCsv.write(options, w);
            }
            try (Writer w = Files.newBufferedWriter(temp.resolve(HTML), StandardCharsets.UTF_8)) {
                CompareHtml.write(options, w);
            }
            if (!Files.exists(target)) {
                move(temp, target);
                return;
            }
            for (String name : List.of(JSON, CSV, HTML)) {
                move(temp.resolve(name), target.resolve(name));
            }
        } finally {
            deleteQuietly(temp);
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void deleteQuietly(Path dir) {
        if (!Files.exists(dir)) {
            return;
        }
        try (DirectoryStream<Path> files = Files.newDirectoryStream(dir)) {
            for (Path f : files) {
                Files.deleteIfExists(f);
            }
            Files.deleteIfExists(dir);
        } catch (IOException ignored) {
            // a leftover temporary folder is harmless; the target is complete or untouched
        }
    }
}
