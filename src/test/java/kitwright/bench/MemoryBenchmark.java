package kitwright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Peak memory of a whole plan (not a unit test): writes the large kit of {@link LargeKitGenerator} and runs
 * {@code java -XmxHEAP -jar JAR plan KIT --out DIR --date 2026-01-01} under {@code /usr/bin/time -v} several
 * times, one after the other ({@code --heap default}: without {@code -Xmx}, the JVM's default of a quarter of the
 * memory). Prints each run's exit status, maximum resident set size and wall time, and their
 * medians; stops when a run fails or when two runs write different files (timing.json aside).
 *
 * <pre>
 * mvn -q -B -o package -DskipTests &amp;&amp; mvn -q -B -o test-compile
 * java -cp target/classes:target/test-classes kitwright.bench.MemoryBenchmark [--heap 2g] [--runs 3]
 *     [--jar target/kitwright.jar]
 *     [--marks 2000] [--bars 20000]
 * </pre>
 * Run from the project root; needs GNU time ({@code /usr/bin/time}, Debian package {@code time}). The heavy kit
 * takes minutes per run on two cores.
 */
public final class MemoryBenchmark {
    private static final Pattern RSS = Pattern.compile("Maximum resident set size \\(kbytes\\): (\\d+)");
    private static final Pattern WALL = Pattern.compile("Elapsed \\(wall clock\\) time \\(h:mm:ss or m:ss\\): "
            + "(?:(\\d+):)?(\\d+):(\\d+(?:\\.\\d+)?)");
    private static final Pattern USER = Pattern.compile("User time \\(seconds\\): (\\d+(?:\\.\\d+)?)");
    private static final Pattern SYSTEM = Pattern.compile("System time \\(seconds\\): (\\d+(?:\\.\\d+)?)");

    private MemoryBenchmark() {
    }

    public static void main(String[] args) throws IOException, InterruptedException {
        String heap = "2g";
        int runs = 3;
        String jar = "target/kitwright.jar";
        int marks = 2000;
        int bars = 20000;
        for (int i = 0; i < args.length; i += 2) {
            switch (args[i]) {
                case "--heap" -> heap = args[i + 1];
                case "--runs" -> runs = Integer.parseInt(args[i + 1]);
                case "--jar" -> jar = args[i + 1];
                case "--marks" -> marks = Integer.parseInt(args[i + 1]);
                case "--bars" -> bars = Integer.parseInt(args[i + 1]);
                default -> throw new IllegalArgumentException("unknown option " + args[i]);
            }
        }
        Path kit = Path.of("target", "bench-kits", "large-" + marks + "-" + bars);
        LargeKitGenerator.write(kit, marks, bars, 17);
        double[] rssMb = new double[runs];
        double[] seconds = new double[runs];
        double[] cpu = new double[runs];
        Path first = null;
        for (int run = 0; run < runs; run++) {
            // one folder per jar, so that two jars (before and after a change) can be measured side by side
            Path work = Path.of("target", "bench-memory", Path.of(jar).getFileName().toString());
            Path out = work.resolve("run-" + (run + 1));
            Path log = work.resolve("run-" + (run + 1) + ".time");
            Files.createDirectories(log.getParent());
            delete(out);
            List<String> command = new ArrayList<>(List.of("/usr/bin/time", "-v", "java"));
            if (!heap.equals("default")) {
                command.add("-Xmx" + heap);
            }
            command.addAll(List.of("-jar", jar, "plan", kit.toString(), "--out", out.toString(), "--date",
                    "2026-01-01"));
            Process process = new ProcessBuilder(command).redirectOutput(ProcessBuilder.Redirect.DISCARD).redirectError(log.toFile()).start();
            int status = process.waitFor();
            String time = Files.readString(log);
            rssMb[run] = Long.parseLong(find(RSS, time).group(1)) / 1024.0;
            Matcher wall = find(WALL, time);
            seconds[run] = (wall.group(1) == null ? 0 : 3600 * Integer.parseInt(wall.group(1)))
                    + 60 * Integer.parseInt(wall.group(2)) + Double.parseDouble(wall.group(3));
            cpu[run] = Double.parseDouble(find(USER, time).group(1)) + Double.parseDouble(find(SYSTEM, time).group(1));
            System.out.printf(Locale.ROOT, "run %d: exit %d, peak RSS %.0f MB, wall %.1f s, CPU %.1f s, load %s%n",
                    run + 1, status, rssMb[run], seconds[run], cpu[run], CuttingBenchmark.loadAverage());
            if (status != 0) {
                throw new IllegalStateException("run " + (run + 1) + " failed, see " + log);
            }
            if (first == null) {
                first = out;
            } else if (!sameFiles(first, out)) {
                throw new IllegalStateException(out + " differs from " + first);
            }
        }
        System.out.printf(Locale.ROOT, "%d marks, %d bars, -Xmx%s, %d runs: median peak RSS %.0f MB, median wall"
                + " %.1f s, median CPU (user + system) %.1f s, %d cores%n", marks, bars, heap, runs, median(rssMb),
                median(seconds), median(cpu), Runtime.getRuntime().availableProcessors());
    }

    private static Matcher find(Pattern pattern, String text) {
        Matcher m = pattern.matcher(text);
        if (!m.find()) {
            throw new IllegalStateException("no '" + pattern + "' in the output of /usr/bin/time -v");
        }
        return m;
    }

    /** The same file names and bytes in both folders, timing.json aside. */
    private static boolean sameFiles(Path a, Path b) throws IOException {
        List<Path> names = files(a);
        if (!names.equals(files(b))) {
            return false;
        }
        for (Path name : names) {
            if (!Arrays.equals(Files.readAllBytes(a.resolve(name)), Files.readAllBytes(b.resolve(name)))) {
                return false;
            }
        }
        return true;
    }

    private static List<Path> files(Path dir) throws IOException {
        try (Stream<Path> walk = Files.walk(dir)) {
            return new ArrayList<>(walk.filter(Files::isRegularFile).map(dir::relativize)
                    .filter(p -> !p.toString().equals("timing.json")).sorted().toList());
        }
    }

    /** Removes an earlier run's folder, so that each run writes a new one. */
    private static void delete(Path dir) throws IOException {
        if (Files.exists(dir)) {
            try (Stream<Path> walk = Files.walk(dir)) {
                for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                    Files.delete(p);
                }
            }
        }
    }

    private static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        return CuttingBenchmark.median(sorted);
    }
}
