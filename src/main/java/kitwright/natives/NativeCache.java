package kitwright.natives;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Map;
import java.util.stream.Stream;

/**
 * The per-user cache of unpacked native libraries: {@code <root>/ortools-<version>-<platform>/}, where root is
 * {@code $XDG_CACHE_HOME/kitwright} or {@code ~/.cache/kitwright} (XDG Base Directory Specification: a relative
 * {@code XDG_CACHE_HOME} is ignored).
 *
 * <p>Method: a complete copy is used as it is. Otherwise, holding an exclusive lock on {@code <root>/.lock} (so
 * that two runs starting together unpack once), the files are copied into {@code <root>/.unpacking-<random>/}
 * and that folder is renamed to its final name in one step, so no run ever sees a half-written copy. A run
 * killed while unpacking leaves only its {@code .unpacking-} folder, which the next run removes under the lock
 * (the lock dies with its process, so under the lock no such folder belongs to a live run).
 */
final class NativeCache {
    static final String UNPACKING_PREFIX = ".unpacking-";
    private static final String LOCK_FILE = ".lock";

    private NativeCache() {
    }

    /** The cache root for this user, from the environment and {@code user.home}. */
    static Path root(Map<String, String> environment, String userHome) {
        String xdg = environment.getOrDefault("XDG_CACHE_HOME", "");
        if (!xdg.isBlank() && Path.of(xdg).isAbsolute()) {
            return Path.of(xdg, "kitwright");
        }
        return Path.of(userHome, ".cache", "kitwright");
    }

    /** A folder under {@code root} holding a complete copy of {@code files}, unpacked now if needed. */
    static Path ensure(Path root, NativeFiles files) throws IOException {
        Path target = root.resolve(files.cacheName());
        if (files.isCompleteIn(target)) {
            return target;
        }
        Files.createDirectories(root);
        try (FileChannel channel = FileChannel.open(root.resolve(LOCK_FILE), StandardOpenOption.CREATE,
                StandardOpenOption.WRITE); FileLock lock = channel.lock()) {
            removeUnpacking(root);
            if (files.isCompleteIn(target)) {
                return target; // another run unpacked it while this one waited for the lock
            }
            Path unpacking = Files.createTempDirectory(root, UNPACKING_PREFIX);
            files.copyTo(unpacking);
            if (Files.exists(target)) {
                // an incomplete copy (files removed by hand): move it out of the way in one step, then delete it
                Path old = Files.createTempDirectory(root, UNPACKING_PREFIX);
                Files.move(target, old.resolve("old"), StandardCopyOption.ATOMIC_MOVE);
                StaleCopies.deleteTree(old);
            }
            Files.move(unpacking, target, StandardCopyOption.ATOMIC_MOVE);
            return target;
        }
    }

    /** Removes {@code .unpacking-} folders; called under the lock, when none of them belongs to a live run. */
    private static void removeUnpacking(Path root) throws IOException {
        try (Stream<Path> entries = Files.list(root)) {
            for (Path p : (Iterable<Path>) entries::iterator) {
                if (p.getFileName().toString().startsWith(UNPACKING_PREFIX) && Files.isDirectory(p)) {
                    StaleCopies.deleteTree(p);
                }
            }
        }
    }
}
