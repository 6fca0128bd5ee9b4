package kitwright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Predicate;
import kitwright.cutting.CutProgress;
import kitwright.cutting.CuttingStockOptimizer;
import kitwright.cutting.Demand;
import kitwright.cutting.Instances;
import kitwright.cutting.SearchLimits;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.SectionProblem;
import kitwright.cutting.StockOption;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;

/**
 * Benchmark of the cutting optimiser (not a unit test). Run from the project root:
 * <pre>
 * mvn -q -B -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.bench.CuttingBenchmark [SET...]
 *     [--markdown FILE]
 * </pre>
 * SET is {@code examples}, {@code triplets}, {@code kits}, {@code large} or {@code rack} (default: all five);
 * {@code rack=5,30} runs the rack set with those numbers of rack rows only (0: the 1,000 mill lengths). Peak memory of the
 * large kit: {@code /usr/bin/time -v java ... kitwright.bench.CuttingBenchmark large}. Every plan goes through
 * the shared validator. Default limits (as {@code kitwright cut}), a 60 s safety net per section.
 *
 * <p>Sets: the worked examples (Chvátal 1983; the 5600 mm encyclopedia example); Falkenauer-style triplets of 60,
 * 120, 249 and 501 items; generated kits of 5-40 marks in 1-3 sections, 1-3 stock lengths (cheaper per metre
 * when longer), kerf 2-3 mm, some limited rack rows; one large kit of 200 marks and about 20,000 bars in four
 * sections. Data are generated with fixed seeds (invented).
 */
public final class CuttingBenchmark {
    private static final SearchLimits LIMITS = SearchLimits.defaults(60);

    /** One planned instance (a kit may hold several sections). */
    record Row(String set, String name, String kind, int marks, int bars, int sections, int pieces, double value,
               double bound, double firstFit, boolean proven, boolean timedOut, double seconds) {
        double gap() {
            return value > 0 ? (value - bound) / value : 0;
        }

        String status() {
            return proven ? "OPTIMAL" : timedOut ? "FEASIBLE, " + SectionCutPlan.STOPPED_BY_TIME_LIMIT : "FEASIBLE";
        }
    }

    public static void main(String[] args) throws IOException {
        List<String> sets = new ArrayList<>();
        Path markdown = null;
        for (int i = 0; i < args.length; i++) {
            if (args[i].equals("--markdown")) {
                markdown = Path.of(args[++i]);
            } else {
                sets.add(args[i]);
            }
        }
        if (sets.isEmpty()) {
            sets = List.of("examples", "triplets", "kits", "large", "rack");
        }
        String loadBefore = loadAverage();
        warmUp();
        List<Row> rows = new ArrayList<>();
        for (String set : sets) {
            switch (set) {
                case "examples" -> examples(rows);
                case "triplets" -> triplets(rows);
                case "kits" -> kits(rows);
                case "large" -> large(rows);
                case "rack" -> rack(rows, new int[] {5, 15, 20, 30, 100, 0});
                default -> {
                    if (!set.startsWith("rack=")) {
                        throw new IllegalArgumentException("unknown set " + set);
                    }
                    rack(rows, Arrays.stream(set.substring(5).split(",")).mapToInt(Integer::parseInt)
                            .toArray());
                }
            }
        }
        String summary = summary(rows) + "load average (1 min) before " + loadBefore + ", after " + loadAverage()
                + " (other jobs share the machine)\n";
        System.out.println(summary);
        if (markdown != null) {
            Files.createDirectories(markdown.toAbsolutePath().getParent());
            Files.writeString(markdown, markdown(rows, summary));
            System.out.println("wrote " + markdown);
        }
    }

    /** The 1-minute load average from /proc/loadavg, or "unknown". */
    static String loadAverage() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).split(" ")[0];
        } catch (IOException | RuntimeException e) {
            return "unknown";
        }
    }

    private static void warmUp() {
        new CuttingStockOptimizer().solve(Instances.triplets(20, 99, LIMITS), CutProgress.NONE);
    }

    private static void examples(List<Row> rows) {
        rows.add(run("examples", "Chvátal 1983 ch. 13", "single", List.of(rolls(100,
                new double[] {45, 36, 31, 14}, new int[] {97, 610, 395, 211}))));
        rows.add(run("examples", "encyclopedia 5600 mm", "single", List.of(rolls(5600,
                new double[] {1380, 1520, 1560, 1710, 1820, 1880, 1930, 2000, 2050, 2100, 2140, 2150, 2200},
                new int[] {22, 25, 12, 14, 18, 18, 20, 10, 12, 14, 16, 18, 20}))));
    }

    private static void triplets(List<Row> rows) {
        for (int triplets : new int[] {20, 40, 83, 167}) {
            for (long seed = 1; seed <= 4; seed++) {
                rows.add(run("triplets", "t" + 3 * triplets + "-" + seed, "single",
                        List.of(Instances.triplets(triplets, seed, LIMITS))));
            }
        }
    }

    /** Kits of 5-40 marks: single-length ones (one mill length, no rack) and multi-length ones. */
    private static void kits(List<Row> rows) {
        int[] marks = {5, 10, 20, 30, 40};
        int[] quantities = {20, 60, 100};
        long seed = 1000;
        for (int m : marks) {
            for (int s = 0; s < 8; s++) {
                rows.add(kit("kits", "single", m, 1, 0, quantities[s % 3], seed++));
            }
            int[][] variants = {{1, 2}, {2, 0}, {2, 2}, {3, 0}, {3, 2}};
            for (int[] v : variants) {
                for (int s = 0; s < 3; s++) {
                    rows.add(kit("kits", "multi", m, v[0], v[1], quantities[(s + v[0]) % 3], seed++));
                }
            }
        }
    }

    private static Row kit(String set, String kind, int marks, int lengths, int rackRows, int maxQuantity,
                           long seed) {
        int sections = marks <= 10 ? 1 : marks <= 20 ? 2 : 3;
        List<SectionProblem> problems = new ArrayList<>();
        for (int s = 0; s < sections; s++) {
            int share = marks / sections + (s < marks % sections ? 1 : 0);
            problems.add(Instances.kitSection("S" + (s + 1), share, lengths, rackRows, maxQuantity,
                    seed * 10 + s, LIMITS));
        }
        return run(set, "kit-" + seed + " (" + lengths + "L" + (rackRows > 0 ? "+rack" : "") + ")", kind,
                problems);
    }

    /** 200 marks in four sections of 50, two mill lengths and two rack rows each, about 20,000 bars. */
    private static void large(List<Row> rows) {
        List<SectionProblem> problems = new ArrayList<>();
        for (int s = 0; s < 4; s++) {
            problems.add(Instances.kitSection("L" + (s + 1), 50, 2, 2, 200, 77 + s, LIMITS));
        }
        rows.add(run("large", "200 marks", "multi", problems));
    }

    /**
     * One section of 12 marks on 6 m and 12 m stock with many rack offcut rows (a rack after several jobs), and one
     * with the same marks on 1,000 mill lengths, each under plan's default 10 s safety net.
     */
    private static void rack(List<Row> rows, int[] rackRows) {
        SearchLimits limits = SearchLimits.defaults(10);
        for (int r : rackRows) {
            SectionProblem section = Instances.kitSection("R", 12, 2, r, 60, 4242, limits);
            rows.add(run("rack", r == 0 ? "1,000 mill lengths" : r + " rack rows", "multi",
                    List.of(r == 0 ? millLengths(section, 1000) : section)));
        }
    }

    /** The section's marks on {@code lengths} unlimited mill lengths of 3-13 m, 8 % cheaper per metre at 13 m. */
    private static SectionProblem millLengths(SectionProblem section, int lengths) {
        List<StockOption> stock = new ArrayList<>();
        for (int j = 0; j < lengths; j++) {
            double length = 3000 + 10 * j;
            double perMetre = 8 * (1 - 0.08 * j / lengths);
            stock.add(new StockOption(length, Math.round(length / 1000 * perMetre * 100) / 100.0, null,
                    Origin.MILL));
        }
        return new SectionProblem(section.section(), section.demands(), stock, section.kerfMm(),
                section.trimMm(), section.minRemnantMm(), section.limits());
    }

    private static Row run(String set, String name, String kind, List<SectionProblem> problems) {
        CuttingStockOptimizer optimizer = new CuttingStockOptimizer();
        double value = 0;
        double bound = 0;
        double firstFit = 0;
        int pieces = 0;
        int bars = 0;
        int marks = 0;
        boolean proven = true;
        boolean timedOut = false;
        long start = System.nanoTime();
        for (SectionProblem problem : problems) {
            CuttingStockOptimizer.Outcome outcome = optimizer.optimize(problem, CutProgress.NONE);
            SectionCutPlan plan = outcome.plan();
            CutPlanValidator.validate(problem, plan);
            if (plan.status() == Status.INFEASIBLE) {
                throw new IllegalStateException(name + ": " + plan.reason());
            }
            value += plan.value();
            bound += plan.lowerBound();
            firstFit += outcome.firstFitValue() == null ? Double.NaN : outcome.firstFitValue();
            pieces += plan.stockPieces();
            bars += problem.demands().stream().mapToInt(Demand::quantity).sum();
            marks += problem.demands().size();
            proven &= plan.status() == Status.OPTIMAL;
            timedOut |= SectionCutPlan.STOPPED_BY_TIME_LIMIT.equals(plan.reason());
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        Row row = new Row(set, name, kind, marks, bars, problems.size(), pieces, value, bound, firstFit, proven,
                timedOut, seconds);
        System.out.printf(Locale.ROOT, "%-9s %-26s %3d marks %6d bars %5d pieces  value %11.2f  bound %11.2f"
                        + "  gap %6.3f%%  %-8s %6.2f s  FFD %11.2f%n", set, name, marks, bars, pieces, value, bound,
                100 * row.gap(), row.status(), seconds, firstFit);
        return row;
    }

    private static SectionProblem rolls(double length, double[] widths, int[] demand) {
        List<Demand> demands = new ArrayList<>();
        for (int i = 0; i < widths.length; i++) {
            demands.add(new Demand("W" + (int) widths[i], widths[i], demand[i]));
        }
        return new SectionProblem("rolls", demands, List.of(new StockOption(length, 1.0, null, Origin.MILL)), 0, 0,
                0, LIMITS);
    }

    private static String summary(List<Row> rows) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "%n%-34s %5s %8s %10s %10s %10s %10s%n", "group", "n", "proven",
                "median s", "max s", "median gap", "max gap"));
        group(sb, rows, "worked examples", r -> r.set().equals("examples"));
        group(sb, rows, "triplets (60-501 items)", r -> r.set().equals("triplets"));
        group(sb, rows, "kits, single length", r -> r.set().equals("kits") && r.kind().equals("single"));
        group(sb, rows, "kits, several lengths or rack", r -> r.set().equals("kits") && r.kind().equals("multi"));
        group(sb, rows, "kits up to 40 marks / 2,000 bars", r -> r.set().equals("kits") && r.bars() <= 2000);
        group(sb, rows, "large kit (200 marks)", r -> r.set().equals("large"));
        group(sb, rows, "rack offcut rows (12 marks)", r -> r.set().equals("rack"));
        return sb.toString();
    }

    private static void group(StringBuilder sb, List<Row> rows, String label, Predicate<Row> filter) {
        List<Row> group = rows.stream().filter(filter).toList();
        if (group.isEmpty()) {
            return;
        }
        long proven = group.stream().filter(Row::proven).count();
        double[] seconds = group.stream().mapToDouble(Row::seconds).sorted().toArray();
        double[] gaps = group.stream().mapToDouble(Row::gap).sorted().toArray();
        sb.append(String.format(Locale.ROOT, "%-34s %5d %7.1f%% %10.2f %10.2f %9.3f%% %9.3f%%%n", label, group.size(),
                100.0 * proven / group.size(), median(seconds), seconds[seconds.length - 1], 100 * median(gaps),
                100 * gaps[gaps.length - 1]));
    }

    static double median(double[] sorted) {
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
    }

    private static String markdown(List<Row> rows, String summary) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Cutting benchmark\n\n");
        sb.append("Measured by `kitwright.bench.CuttingBenchmark` on ").append(LocalDate.now())
                .append(", ").append(Runtime.getRuntime().availableProcessors())
                .append(" cores, default work limits, one CP-SAT worker. Generated data (invented, fixed seeds). ")
                .append("Value: total price; bound: proven lower bound; gap = (value - bound) / value; ")
                .append("FFD: first-fit decreasing on the same data.\n\n");
        sb.append("```").append(summary).append("```\n\n");
        sb.append("| set | instance | marks | bars | stock pieces | value | lower bound | gap % | status | seconds "
                + "| FFD value |\n");
        sb.append("| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: | --- | ---: | ---: |\n");
        for (Row r : rows) {
            sb.append(String.format(Locale.ROOT, "| %s | %s | %d | %d | %d | %.2f | %.2f | %.3f | %s | %.2f | %.2f |%n",
                    r.set(), r.name(), r.marks(), r.bars(), r.pieces(), r.value(), r.bound(), 100 * r.gap(),
                    r.status(), r.seconds(), r.firstFit()));
        }
        return sb.toString();
    }

    private CuttingBenchmark() {
    }

}
