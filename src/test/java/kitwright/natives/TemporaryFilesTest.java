package kitwright.natives;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Real runs of kitwright in separate JVMs, each with {@code -Djava.io.tmpdir} on a fresh folder and
 * {@code XDG_CACHE_HOME} on a fresh cache: the temporary folder must stay empty, even after a {@code kill -9}, and
 * the cache is written once.
 */
class TemporaryFilesTest {
    private static final String KIT = "sample-kits/cinema-6";

    @TempDir
    Path work;

    @Test
    @DisplayName("A run leaves nothing in java.io.tmpdir; the second run reuses the cache without rewriting it")
    void runLeavesNothingAndReusesTheCache() throws Exception {
        Path tmp = folder("tmp");
        Path cache = folder("cache");
        assertThat(run(tmp, cache, "kitwright.cli.Main", "cut", KIT, "--out", work.resolve("out1").toString()))
                .as("exit code").isZero();
        assertThat(entries(tmp)).as("left in the temporary folder").isEmpty();
        Path natives = onlyCacheFolder(cache);
        Map<String, String> first = identities(natives);
        assertThat(first).as("files unpacked").isNotEmpty();

        assertThat(run(tmp, cache, "kitwright.cli.Main", "cut", KIT, "--out", work.resolve("out2").toString()))
                .as("exit code").isZero();
        assertThat(entries(tmp)).as("left in the temporary folder").isEmpty();
        assertThat(identities(onlyCacheFolder(cache))).as("same files, same inodes and times").isEqualTo(first);
    }

    @Test
    @DisplayName("Two runs starting together on an empty cache: both finish, one copy, no unpacking folder left")
    void twoRunsTogether() throws Exception {
        Path tmp = folder("tmp");
        Path cache = folder("cache");
        Process first = process(tmp, cache, "kitwright.cli.Main", "cut", KIT, "--out", work.resolve("a").toString())
                .redirectOutput(work.resolve("a.log").toFile()).start();
        Process second = process(tmp, cache, "kitwright.cli.Main", "cut", KIT, "--out", work.resolve("b").toString())
                .redirectOutput(work.resolve("b.log").toFile()).start();
        assertThat(first.waitFor(5, TimeUnit.MINUTES) && second.waitFor(5, TimeUnit.MINUTES)).isTrue();
        assertThat(first.exitValue()).as("first exit code").isZero();
        assertThat(second.exitValue()).as("second exit code").isZero();
        assertThat(entries(tmp)).as("left in the temporary folder").isEmpty();
        onlyCacheFolder(cache);
    }

    @Test
    @DisplayName("A run killed while unpacking leaves nothing in java.io.tmpdir; the next run cleans the cache up")
    void killedRunLeavesNothing() throws Exception {
        Path tmp = folder("tmp");
        Path cache = folder("cache");
        Process p = start(tmp, cache, "kitwright.cli.Main", "plan", "sample-kits/cinema-20", "--out",
                work.resolve("killed").toString());
        Path root = cache.resolve("kitwright");
        // kill -9 as soon as the unpacking has begun (or, on a fast disk, as soon as the copy is in place), wherever
        while (p.isAlive() && !hasEntry(root, NativeCache.UNPACKING_PREFIX) && !hasEntry(root, "ortools-")
                && entries(tmp).isEmpty()) {
            Thread.sleep(5);
        }
        p.destroyForcibly().waitFor(1, TimeUnit.MINUTES);
        assertThat(entries(tmp)).as("left in the temporary folder by the killed run").isEmpty();

        assertThat(run(tmp, cache, "kitwright.cli.Main", "cut", KIT, "--out", work.resolve("out").toString()))
                .as("exit code").isZero();
        assertThat(entries(tmp)).as("left in the temporary folder").isEmpty();
        onlyCacheFolder(cache);
    }

    @Test
    @DisplayName("Stale Loader folders of killed programs are removed on start; one in use, or not the Loader's, stays")
    void staleLoaderCopiesAreRemoved() throws Exception {
        Path tmp = folder("tmp");
        Path cache = folder("cache");
        Process alive = start(tmp, cache, LoaderHolder.class.getName());
        awaitLoaded(alive);
        List<Path> aliveFolders = entries(tmp);
        Process killed = start(tmp, cache, LoaderHolder.class.getName());
        awaitLoaded(killed);
        killed.destroyForcibly().waitFor(1, TimeUnit.MINUTES);
        List<Path> all = entries(tmp);
        assertThat(all).hasSize(2);
        Path stale = all.stream().filter(f -> !aliveFolders.contains(f)).findFirst().orElseThrow();
        Path notTheLoaders = Files.createDirectories(tmp.resolve(StaleCopies.LOADER_PREFIX + "42"));
        Files.writeString(notTheLoaders.resolve("notes.txt"), "someone else's");
        Path otherName = Files.createDirectories(tmp.resolve("ortools-javafx-cache"));
        for (Path f : entries(tmp)) {
            age(f); // older than the ten minutes a folder gets to settle
        }
        try {
            assertThat(run(tmp, cache, "kitwright.cli.Main", "cut", KIT, "--out", work.resolve("out").toString()))
                    .as("exit code").isZero();
            assertThat(entries(tmp)).as("what is left").doesNotContain(stale)
                    .containsAll(aliveFolders).contains(notTheLoaders, otherName).hasSize(3);
        } finally {
            alive.getOutputStream().close();
            alive.waitFor(1, TimeUnit.MINUTES);
            alive.destroyForcibly();
        }
    }

    @Test
    @DisplayName("A cache that cannot be written: one line says so, a temporary folder is used and deleted at exit")
    void unwritableCacheFallsBack() throws Exception {
        Path tmp = folder("tmp");
        Path notAFolder = Files.writeString(work.resolve("cache-is-a-file"), "x");
        Path log = work.resolve("fallback.log");
        assertThat(run(tmp, notAFolder, log, "kitwright.cli.Main", "cut", KIT, "--out",
                work.resolve("out").toString())).as("exit code").isZero();
        List<String> lines = Files.readAllLines(log).stream().filter(l -> l.contains("solver cache")).toList();
        assertThat(lines).hasSize(1);
        assertThat(lines.get(0)).contains(notAFolder.toString()).contains("temporary folder deleted at exit");
        assertThat(entries(tmp)).as("left in the temporary folder").isEmpty();
    }

    @Test
    @DisplayName("Cache root: $XDG_CACHE_HOME/kitwright when absolute, else ~/.cache/kitwright (XDG Base Directory Specification)")
    void cacheRoot() {
        assertThat(NativeCache.root(Map.of("XDG_CACHE_HOME", "/var/cache/u"), "/home/u"))
                .isEqualTo(Path.of("/var/cache/u/kitwright"));
        assertThat(NativeCache.root(Map.of("XDG_CACHE_HOME", "relative/cache"), "/home/u"))
                .isEqualTo(Path.of("/home/u/.cache/kitwright"));
        assertThat(NativeCache.root(Map.of(), "/home/u")).isEqualTo(Path.of("/home/u/.cache/kitwright"));
    }

    private Path folder(String name) throws IOException {
        return Files.createDirectories(work.resolve(name));
    }

    private int run(Path tmp, Path cache, String main, String... args) throws Exception {
        return run(tmp, cache, work.resolve("run-" + System.nanoTime() + ".log"), main, args);
    }

    private int run(Path tmp, Path cache, Path log, String main, String... args) throws Exception {
        Process p = process(tmp, cache, main, args).redirectOutput(log.toFile()).start();
        if (!p.waitFor(5, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new AssertionError("run did not end: " + Files.readString(log));
        }
        return p.exitValue();
    }

    private Process start(Path tmp, Path cache, String main, String... args) throws IOException {
        return process(tmp, cache, main, args).start();
    }

    private ProcessBuilder process(Path tmp, Path cache, String main, String... args) {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString(), "-Djava.io.tmpdir=" + tmp, "-cp", System.getProperty("java.class.path"), main));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().put("XDG_CACHE_HOME", cache.toString());
        return pb;
    }

    private static void awaitLoaded(Process p) throws IOException {
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        String line;
        while ((line = out.readLine()) != null) {
            if (line.equals("loaded")) {
                return;
            }
        }
        throw new AssertionError("the Loader process ended without loading");
    }

    private static void age(Path folder) throws IOException {
        FileTime old = FileTime.from(Instant.now().minus(Duration.ofHours(1)));
        try (Stream<Path> walk = Files.walk(folder)) {
            for (Path p : (Iterable<Path>) walk::iterator) {
                Files.setLastModifiedTime(p, old);
            }
        }
    }

    /** The one complete cache folder, with no unpacking folder beside it. */
    private static Path onlyCacheFolder(Path cache) throws IOException {
        List<String> names = entries(cache.resolve("kitwright")).stream().map(p -> p.getFileName().toString())
                .filter(n -> !n.equals(".lock")).toList();
        assertThat(names).as("cache folders").hasSize(1);
        assertThat(names.get(0)).matches("ortools-[0-9.]+-.+");
        return cache.resolve("kitwright").resolve(names.get(0));
    }

    /** File name to inode and modification time: unchanged when the cache is reused, not rewritten. */
    private static Map<String, String> identities(Path folder) throws IOException {
        Map<String, String> ids = new TreeMap<>();
        for (Path f : entries(folder)) {
            ids.put(f.getFileName().toString(), Files.readAttributes(f,
                    java.nio.file.attribute.BasicFileAttributes.class).fileKey() + " "
                    + Files.getLastModifiedTime(f).toMillis());
        }
        return ids;
    }

    private static boolean hasEntry(Path folder, String prefix) throws IOException {
        return Files.isDirectory(folder) && entries(folder).stream()
                .anyMatch(p -> p.getFileName().toString().startsWith(prefix));
    }

    private static List<Path> entries(Path folder) throws IOException {
        try (Stream<Path> list = Files.list(folder)) {
            return list.sorted().toList();
        }
    }
}
