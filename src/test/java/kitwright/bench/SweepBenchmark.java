package kitwright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import kitwright.cli.KitwrightCommand;
import kitwright.io.SweepInput;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.sweep.MarkNames;
import kitwright.sweep.SweepOptions;
import kitwright.validate.PlanValidator;

/**
 * Benchmark of {@code sweep} (not a unit test): 1,000 invented members of four structures in five steel sections
 * (fixed seed), K from 5 to 40, every option planned through the whole chain with the default work limits and a
 * 10 s safety net per problem (kit.json timeLimitSeconds). Prints the grouping time of all 36 options and the wall
 * time of the whole command; then re-plans three options and puts them through the shared validator. Run from the
 * project root after a test compile:
 * <pre>
 * mvn -q -B -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.bench.SweepBenchmark [--threads N]
 * </pre>
 */
public final class SweepBenchmark {
    private static final String[] SECTIONS = {"CHS 88.9x3.2", "CHS 76.1x3.2", "CHS 60.3x3.2", "CHS 48.3x3.2",
        "CHS 33.7x2.6"};
    private static final String[] STRUCTURES = {"hall-truss", "stage-roof", "tower", "walkway"};

    private SweepBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        String threads = args.length == 2 && args[0].equals("--threads") ? args[1]
                : Integer.toString(Runtime.getRuntime().availableProcessors());
        Path dir = Path.of("target", "bench-kits", "sweep-1000");
        write(dir, 1000, 20261203L);
        long start = System.nanoTime();
        SweepInput input = SweepInput.read(dir);
        for (int k = 5; k <= 40; k++) {
            SweepOptions.of(input.members(), input.sectionOrder(), new MarkNames(List.of()), k);
        }
        double grouping = (System.nanoTime() - start) / 1e9;
        Path out = Path.of("target", "bench-sweep");
        start = System.nanoTime();
        int code = KitwrightCommand.execute("sweep", dir.toString(), "--marks", "5..40", "--out", out.toString(),
                "--threads", threads);
        double whole = (System.nanoTime() - start) / 1e9;
        System.out.printf(Locale.ROOT, "sweep benchmark: 1000 members, 5 sections, K 5..40 (36 options), %s threads,"
                + " %d processors%n", threads, Runtime.getRuntime().availableProcessors());
        System.out.printf(Locale.ROOT, "grouping of all 36 options: %.2f s; whole command: %.1f s; exit code %d%n",
                grouping, whole, code);
        for (String k : List.of("k05", "k20", "k40")) {
            PlanResult result = Planner.run(kitwright.io.KitReader.read(out.resolve(k)), Planner.Options.DEFAULT,
                    PlanProgress.NONE);
            PlanValidator.validate(result);
            System.out.println(k + ": validated");
        }
    }

    /** The designer folder: kit.json naming the repository's steel catalog, and the members (invented). */
    static void write(Path dir, int members, long seed) throws IOException {
        Files.createDirectories(dir);
        Path catalog = Path.of("stock-catalogs", "steel-chs.csv").toAbsolutePath();
        Files.writeString(dir.resolve("kit.json"), "{\n  \"name\": \"bench-1000\",\n  \"stockCatalog\": \""
                + catalog.toString().replace('\\', '/') + "\",\n  \"endDeductionMm\": 95,\n"
                + "  \"timeLimitSeconds\": 10\n}\n");
        Random random = new Random(seed);
        List<String> lines = new ArrayList<>(List.of("structure,member,section,node_to_node_mm"));
        for (int i = 0; i < members; i++) {
            int s = i % SECTIONS.length;
            double shortest = 700 + 300 * s;
            double tenths = Math.round((shortest + random.nextDouble() * 2300) * 10);
            if (random.nextDouble() < 0.3) {
                tenths = Math.round(tenths / 500) * 500; // member types at whole 50 mm, as designs often have
            }
            lines.add(STRUCTURES[i % STRUCTURES.length] + ",m" + (i + 1) + "," + SECTIONS[s] + ","
                    + String.format(Locale.ROOT, "%.1f", tenths / 10));
        }
        Files.write(dir.resolve("members.csv"), lines);
    }
}
