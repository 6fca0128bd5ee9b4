package kitwright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import kitwright.cutting.CutProgress;
import kitwright.cutting.CuttingStockOptimizer;
import kitwright.cutting.SearchLimits;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;

/**
 * Benchmark of the cutting optimiser on our generated instances of the published bin-packing classes
 * ({@link PublishedClasses}), run as {@code kitwright cut} runs them: kerf and trim 0, one stock length at price 1,
 * default work limits, a 20 s safety net per instance. Not a unit test. From the project root:
 * <pre>
 * mvn -q -B -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * nice -n 15 java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.bench.ClassBenchmark \
 *     run OUT.tsv [PER_CLASS [HARD [CLASS...]]]
 * java -cp ... kitwright.bench.ClassBenchmark table RUN.tsv [OTHER_RUN.tsv...]
 * </pre>
 * {@code run} solves every instance (each plan through the shared validator) and writes one line per instance;
 * {@code table} prints the per-class table of the first run. The optimum is the construction's where it proves one
 * (triplets, augmented IRUP), else the best value of any run given, which must not lie below any proven bound; a
 * run's OPTIMAL claim above that best value or below another run's bound is counted as false.
 */
public final class ClassBenchmark {
    private ClassBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        if (args[0].equals("run")) {
            int perClass = args.length > 2 ? Integer.parseInt(args[2]) : 4;
            int hard = args.length > 3 ? Integer.parseInt(args[3]) : 10;
            List<String> only = Arrays.asList(args).subList(Math.min(4, args.length), args.length);
            run(Path.of(args[1]), perClass, hard, only);
        } else {
            List<Path> runs = Arrays.stream(args).skip(1).map(Path::of).toList();
            System.out.print(table(runs));
        }
    }

    private static void run(Path out, int perClass, int hard, List<String> only) throws IOException {
        SearchLimits limits = SearchLimits.defaults(20);
        String loadBefore = CuttingBenchmark.loadAverage();
        // warm the JIT and the natives once, as a fresh JVM's first section would not be
        new CuttingStockOptimizer().solve(PublishedClasses.uniform(40, 1, limits).problem(), CutProgress.NONE);
        StringBuilder tsv = new StringBuilder("class\tinstance\titems\toptimum\tvalue\tbound\tstatus\tseconds\n");
        for (PublishedClasses.Instance instance : PublishedClasses.all(perClass, hard, limits)) {
            if (!only.isEmpty() && only.stream().noneMatch(c -> instance.cls().startsWith(c))) {
                continue;
            }
            long start = System.nanoTime();
            SectionCutPlan plan = new CuttingStockOptimizer().solve(instance.problem(), CutProgress.NONE);
            double seconds = (System.nanoTime() - start) / 1e9;
            CutPlanValidator.validate(instance.problem(), plan);
            int items = instance.problem().demands().stream().mapToInt(d -> d.quantity()).sum();
            String line = String.format(Locale.ROOT, "%s\t%s\t%d\t%s\t%.0f\t%.0f\t%s\t%.2f", instance.cls(),
                    instance.name(), items, instance.optimum() == null ? "" : instance.optimum(), plan.value(),
                    plan.lowerBound(), plan.status(), seconds);
            System.out.println(line);
            tsv.append(line).append('\n');
            Files.writeString(out, tsv + "# load average (1 min) before " + loadBefore + "\n");
        }
        Files.writeString(out, tsv + "# load average (1 min) before " + loadBefore + ", after "
                + CuttingBenchmark.loadAverage() + "\n");
    }

    private static String table(List<Path> runs) throws IOException {
        List<List<String[]>> all = new ArrayList<>();
        for (Path p : runs) {
            all.add(Files.readAllLines(p).stream().skip(1).filter(l -> !l.startsWith("#"))
                    .map(l -> l.split("\t", -1)).toList());
        }
        Map<String, Double> best = new TreeMap<>();
        Map<String, Double> bound = new TreeMap<>();
        for (List<String[]> run : all) {
            for (String[] r : run) {
                double value = r[3].isEmpty() ? Double.parseDouble(r[4]) : Double.parseDouble(r[3]);
                best.merge(r[1], value, Math::min);
                bound.merge(r[1], Double.parseDouble(r[5]), Math::max);
            }
        }
        Map<String, List<String[]>> byClass = new LinkedHashMap<>();
        for (String[] r : all.get(0)) {
            byClass.computeIfAbsent(r[0], k -> new ArrayList<>()).add(r);
        }
        StringBuilder sb = new StringBuilder("| class | n | reached | proven | false OPTIMAL | median s | max s |\n"
                + "|---|---:|---:|---:|---:|---:|---:|\n");
        int n = 0;
        int reached = 0;
        int proven = 0;
        int wrong = 0;
        List<Double> seconds = new ArrayList<>();
        for (Map.Entry<String, List<String[]>> e : byClass.entrySet()) {
            int cr = 0;
            int cp = 0;
            int cw = 0;
            double[] s = e.getValue().stream().mapToDouble(r -> Double.parseDouble(r[7])).sorted().toArray();
            for (String[] r : e.getValue()) {
                double value = Double.parseDouble(r[4]);
                boolean optimal = r[6].equals(Status.OPTIMAL.name());
                cr += value <= best.get(r[1]) ? 1 : 0;
                cp += optimal ? 1 : 0;
                cw += optimal && (value > best.get(r[1]) || value < bound.get(r[1])) ? 1 : 0;
                seconds.add(Double.parseDouble(r[7]));
            }
            sb.append(String.format(Locale.ROOT, "| %s | %d | %d | %d | %d | %.2f | %.2f |%n", e.getKey(),
                    s.length, cr, cp, cw, CuttingBenchmark.median(s), s[s.length - 1]));
            n += s.length;
            reached += cr;
            proven += cp;
            wrong += cw;
        }
        double[] s = seconds.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        sb.append(String.format(Locale.ROOT, "| all | %d | %d (%.0f %%) | %d (%.0f %%) | %d | %.2f | %.2f |%n", n,
                reached, 100.0 * reached / n, proven, 100.0 * proven / n, wrong, CuttingBenchmark.median(s),
                s[s.length - 1]));
        return sb.toString();
    }
}
