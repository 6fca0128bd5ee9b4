package kitwright.natives;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.Field;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.List;

/**
 * Loads the OR-Tools native libraries once per JVM, the one way kitwright does so (instead of
 * {@code kitwright.natives.SolverLibraries.load()}, which unpacks about 69 MB into the temporary folder on
 * every run and leaves them there when the run is killed).
 *
 * <p>Method: remove stale copies earlier runs left in {@code java.io.tmpdir} ({@link StaleCopies}); take the
 * libraries from the per-user cache, unpacking them there once per OR-Tools version and platform
 * ({@link NativeCache}); load {@code jniortools} from there with {@code System.load}, its dependencies found beside
 * it (its ELF RUNPATH is {@code $ORIGIN}), or on Windows the chain in the order OR-Tools' Loader uses. If the
 * cache cannot be written, one line on standard error says so and the libraries go to a temporary folder that is
 * deleted at exit. Guarantee: a run writes nothing else to the temporary folder, and only the fallback writes
 * there at all.
 */
public final class SolverLibraries {
    /** Windows: the libraries in load order, each with whether it must load (as OR-Tools 9.15's Loader has them). */
    private static final List<Object[]> WINDOWS_CHAIN = List.of(new Object[] {"zlib1", true},
            new Object[] {"bz2", true}, new Object[] {"abseil_dll", true}, new Object[] {"re2", true},
            new Object[] {"libutf8_validity", true}, new Object[] {"libprotobuf", true},
            new Object[] {"highs", false}, new Object[] {"libscip", false}, new Object[] {"ortools", true},
            new Object[] {"jniortools", true});

    private static boolean loaded;
    /** The fallback folder's lock, held until the JVM ends so that no other run takes the folder for stale. */
    private static FileChannel fallbackLock;

    private SolverLibraries() {
    }

    /** Makes the OR-Tools classes usable; cheap after the first call. */
    public static synchronized void load() {
        if (loaded) {
            return;
        }
        if (loaderAlreadyLoaded()) {
            loaded = true;
            return;
        }
        Path tmp = Path.of(System.getProperty("java.io.tmpdir"));
        StaleCopies.clean(tmp, Instant.now(), StaleCopies::mappedFolders);
        try {
            String platform = NativePlatform.current();
            NativeFiles files = NativeFiles.find(platform);
            Path root = NativeCache.root(System.getenv(), System.getProperty("user.home"));
            Path dir;
            try {
                dir = NativeCache.ensure(root, files);
            } catch (IOException e) {
                System.err.println("kitwright: cannot write the solver cache " + root + " (" + reason(e)
                        + "); unpacking the solver libraries to a temporary folder deleted at exit");
                dir = fallback(tmp, files);
            }
            loadFrom(dir, platform.startsWith("win32"));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot load the OR-Tools solver libraries: " + reason(e), e);
        }
        tellLoader();
        loaded = true;
    }

    private static void loadFrom(Path dir, boolean windows) {
        if (!windows) {
            System.load(dir.resolve(System.mapLibraryName("jniortools")).toAbsolutePath().toString());
            return;
        }
        for (Object[] library : WINDOWS_CHAIN) {
            try {
                System.load(dir.resolve(System.mapLibraryName((String) library[0])).toAbsolutePath().toString());
            } catch (UnsatisfiedLinkError e) {
                if ((Boolean) library[1]) {
                    throw e;
                }
            }
        }
    }

    /** A fresh folder in {@code tmp}, locked for this run's life and deleted at exit. */
    private static Path fallback(Path tmp, NativeFiles files) throws IOException {
        Path dir = Files.createTempDirectory(tmp, StaleCopies.FALLBACK_PREFIX);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            try {
                StaleCopies.deleteTree(dir);
            } catch (IOException e) {
                // the next run's clean-up removes it: its lock dies with this process
            }
        }, "kitwright-solver-libraries-cleanup"));
        fallbackLock = FileChannel.open(dir.resolve(StaleCopies.LOCK_FILE), StandardOpenOption.CREATE,
                StandardOpenOption.WRITE);
        fallbackLock.lock();
        files.copyTo(dir);
        return dir;
    }

    /** Whether OR-Tools' own Loader already loaded the libraries in this JVM (its private flag). */
    private static boolean loaderAlreadyLoaded() {
        Field flag = loaderFlag();
        try {
            return flag != null && flag.getBoolean(null);
        } catch (IllegalAccessException e) {
            return false;
        }
    }

    /** Sets the Loader's flag, so a stray {@code SolverLibraries.load()} does not unpack a second copy. */
    private static void tellLoader() {
        Field flag = loaderFlag();
        try {
            if (flag != null) {
                flag.setBoolean(null, true);
            }
        } catch (IllegalAccessException e) {
            // best effort: kitwright's own code never calls the Loader
        }
    }

    private static Field loaderFlag() {
        try {
            Field flag = com.google.ortools.Loader.class.getDeclaredField("loaded");
            flag.setAccessible(true);
            return flag;
        } catch (ReflectiveOperationException | RuntimeException e) {
            return null;
        }
    }

    private static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }
}
