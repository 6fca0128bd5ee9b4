package kitwright.natives;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.Supplier;
import java.util.stream.Stream;

/**
 * Copies of the native libraries that earlier runs left in the temporary folder, and their removal.
 *
 * <p>Two kinds are recognised by name and content, nothing else is touched:
 * <ul>
 *   <li>{@code com.google.ortools.Loader}'s own: {@code Files.createTempDirectory("ortools-java")}, so
 *       {@code ortools-java<digits>/}, holding {@code ortools-<platform>/} with the {@code jniortools} library
 *       (read from the Loader's class in ortools-java 9.15). It deletes them at a normal exit only, so a killed
 *       run leaves about 69 MB. Such a folder is removed when no process maps a file inside it (Linux
 *       {@code /proc/<pid>/maps}; elsewhere they are left alone) and it has not changed for ten minutes (another
 *       program may be between unpacking and loading).</li>
 *   <li>kitwright's fallback folders {@code kitwright-ortools-<random>/} (used when the cache cannot be written):
 *       their run holds a lock on {@code .lock} inside for its whole life, so a folder whose lock can be taken is
 *       stale.</li>
 * </ul>
 */
final class StaleCopies {
    /** The prefix com.google.ortools.Loader gives its temporary folder. */
    static final String LOADER_PREFIX = "ortools-java";
    /** The prefix of kitwright's own fallback folders. */
    static final String FALLBACK_PREFIX = "kitwright-ortools-";
    static final String LOCK_FILE = ".lock";
    static final Duration SETTLE = Duration.ofMinutes(10);

    private StaleCopies() {
    }

    /**
     * Removes the stale copies in {@code tmp}; {@code mapped} gives the folders holding files that running processes
     * map (empty when unknown: then Loader folders are kept), asked only when a Loader folder is there. Returns the folders removed. Never throws: a folder
     * that cannot be removed (another user's, say) is skipped.
     */
    static List<Path> clean(Path tmp, Instant now, Supplier<Optional<Set<Path>>> mapped) {
        List<Path> removed = new ArrayList<>();
        Optional<Set<Path>> mappedNow = null;
        try (Stream<Path> entries = Files.list(tmp)) {
            for (Path p : (Iterable<Path>) entries::iterator) {
                String name = p.getFileName().toString();
                boolean stale = false;
                if (name.matches(LOADER_PREFIX + "[0-9]+") && isLoaderCopy(p) && settled(p, now)) {
                    mappedNow = mappedNow != null ? mappedNow : mapped.get();
                    stale = mappedNow.isPresent() && !inUse(p, mappedNow.get());
                } else if (name.startsWith(FALLBACK_PREFIX)) {
                    stale = isUnlocked(p, now);
                }
                if (stale && deleteQuietly(p)) {
                    removed.add(p);
                }
            }
        } catch (IOException | RuntimeException e) {
            // cleaning is a courtesy: a folder we cannot list or delete never stops a run
        }
        return removed;
    }

    /** The folders of every file mapped by a process we may inspect (Linux); empty when there is no /proc. */
    static Optional<Set<Path>> mappedFolders() {
        Path proc = Path.of("/proc");
        if (!Files.isReadable(proc.resolve("self").resolve("maps"))) {
            return Optional.empty();
        }
        Set<Path> folders = new HashSet<>();
        try (Stream<Path> pids = Files.list(proc)) {
            for (Path pid : (Iterable<Path>) pids::iterator) {
                if (!pid.getFileName().toString().matches("[0-9]+")) {
                    continue;
                }
                try (Stream<String> lines = Files.lines(pid.resolve("maps"))) {
                    lines.forEach(line -> {
                        int slash = line.indexOf('/');
                        if (slash >= 0) {
                            Path file = Path.of(line.substring(slash).replace(" (deleted)", ""));
                            if (file.getParent() != null) {
                                folders.add(file.getParent());
                            }
                        }
                    });
                } catch (IOException | RuntimeException e) {
                    // another user's process, or one that just ended
                }
            }
        } catch (IOException e) {
            return Optional.empty();
        }
        return Optional.of(folders);
    }

    /** Deletes a folder and everything in it. */
    static void deleteTree(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : (Iterable<Path>) walk.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(p);
            }
        }
    }

    private static boolean isLoaderCopy(Path dir) throws IOException {
        try (Stream<Path> sub = Files.list(dir)) {
            return sub.filter(Files::isDirectory).filter(d -> d.getFileName().toString().startsWith("ortools-"))
                    .anyMatch(d -> {
                        try (Stream<Path> libs = Files.list(d)) {
                            return libs.anyMatch(f -> f.getFileName().toString().contains("jniortools"));
                        } catch (IOException e) {
                            return false;
                        }
                    });
        }
    }

    private static boolean inUse(Path dir, Set<Path> mapped) {
        Path real = realPath(dir);
        return mapped.stream().anyMatch(m -> m.startsWith(dir) || m.startsWith(real));
    }

    /** True when the folder and the folders inside it have not changed for {@link #SETTLE}. */
    private static boolean settled(Path dir, Instant now) throws IOException {
        try (Stream<Path> walk = Files.walk(dir, 1)) {
            for (Path p : (Iterable<Path>) walk::iterator) {
                if (Files.getLastModifiedTime(p).toInstant().isAfter(now.minus(SETTLE))) {
                    return false;
                }
            }
        }
        return true;
    }

    private static boolean isUnlocked(Path dir, Instant now) throws IOException {
        Path lockFile = dir.resolve(LOCK_FILE);
        if (!Files.exists(lockFile)) {
            return settled(dir, now); // killed between creating the folder and its lock
        }
        try (FileChannel channel = FileChannel.open(lockFile, StandardOpenOption.WRITE)) {
            FileLock lock = channel.tryLock();
            if (lock == null) {
                return false;
            }
            lock.release();
            return true;
        } catch (OverlappingFileLockException e) {
            return false; // this run's own folder
        }
    }

    private static boolean deleteQuietly(Path dir) {
        try {
            deleteTree(dir);
            return true;
        } catch (IOException e) {
            return false;
        }
    }

    private static Path realPath(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            return p;
        }
    }
}
