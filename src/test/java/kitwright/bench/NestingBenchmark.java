package kitwright.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.cutting.KitCutter;
import kitwright.io.InvalidInputException;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.NestTolerance;
import kitwright.model.Section;
import kitwright.nesting.FitRule;
import kitwright.nesting.NestResult;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;
import kitwright.nesting.NestingProblem;
import kitwright.nesting.Tube;
import kitwright.nesting.TubeEnvelope;
import kitwright.nesting.TubeList;
import kitwright.validate.NestPlanValidator;

/**
 * Nesting benchmark (not a unit test). The sample kits, and generated steel kits in EN 10219-2 sizes, invented lengths and counts:
 * sample-like kits of 6, 12 and 20 marks with 200 to 600 bars, and larger kits up to 5,000 pieces. Per instance:
 * pieces, bundles, lower bound, gap, status, bundled volume against un-nested volume, and the median seconds of
 * three runs (the native libraries are loaded before timing). Every plan is validated. Run after a test compile:
 * <pre>
 * mvn -q -B -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.bench.NestingBenchmark
 * </pre>
 */
public final class NestingBenchmark {
    /** EN 10219-2 CHS sizes (outside x wall, mm) that partly nest, widest first. */
    /** Runs per instance; the median time is reported ({@code -Dkitwright.bench.repeats=N}, default 3). */
    static final int REPEATS = Integer.getInteger("kitwright.bench.repeats", 3);
    static final double[][] SIZES = {{114.3, 3.6}, {88.9, 3.2}, {76.1, 3.2}, {60.3, 3.2}, {48.3, 3.2},
        {42.4, 2.6}, {33.7, 2.6}, {26.9, 2.0}};

    private NestingBenchmark() {
    }

    public static void main(String[] args) {
        FitRule rule = new FitRule(NestTolerance.WORST_CASE, 2.0);
        NestingOptions options = NestingOptions.DEFAULT;
        kitwright.natives.SolverLibraries.load(); // once per JVM, not part of any instance's time
        System.out.println("| instance | marks | pieces | bundles | lower bound | gap % | status | volume bundled / loose | seconds |");
        System.out.println("| --- | ---: | ---: | ---: | ---: | ---: | --- | ---: | ---: |");
        List<double[]> rows = new ArrayList<>();
        for (String sample : new String[] {"cinema-6", "cinema-12", "cinema-20", "alu-kiosk", "acrylic-vitrine"}) {
            runSample(sample, options, rows);
        }
        int[][] sampleLike = {{6, 200}, {12, 400}, {20, 600}};
        for (int[] spec : sampleLike) {
            for (int seed = 1; seed <= 3; seed++) {
                run("sample-like-" + spec[0] + "-s" + seed, kit(rule, spec[0], spec[1], seed), rule, options, rows);
            }
        }
        int[][] large = {{20, 1000}, {30, 2000}, {40, 5000}, {120, 5000}};
        for (int[] spec : large) {
            for (int seed = 1; seed <= 3; seed++) {
                run("generated-" + spec[1] + "-" + spec[0] + "m-s" + seed, kit(rule, spec[0], spec[1], seed), rule, options, rows);
            }
        }
        rows.sort((a, b) -> Double.compare(a[0], b[0]));
        double worstGap = rows.stream().mapToDouble(r -> r[1]).max().orElse(0);
        double slowest = rows.stream().mapToDouble(r -> r[0]).max().orElse(0);
        System.out.printf(Locale.ROOT, "%ninstances %d, median seconds %.2f, slowest %.2f s, worst gap %.1f %%%n",
                rows.size(), rows.get(rows.size() / 2)[0], slowest, worstGap);
    }

    /** A sample kit through the cutting stage (not timed), then nested with the kit's own fit rule. */
    private static void runSample(String name, NestingOptions options, List<double[]> rows) {
        try {
            Kit kit = KitReader.read(Path.of("sample-kits", name));
            CutPlan cuts = KitCutter.cut(kit, KitCutter.Options.DEFAULT, CutProgress.NONE);
            KitSettings s = kit.settings();
            FitRule rule = new FitRule(s.nestTolerance(), s.nestClearanceMm());
            NestingProblem problem = new NestingProblem(TubeList.of(kit, cuts, rule), s.nestClearanceMm(),
                    s.nestEndAllowanceMm(), s.maxBundleMassKg());
            run("sample " + name, problem, rule, options, rows);
        } catch (InvalidInputException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void run(String name, NestingProblem problem, FitRule rule, NestingOptions options,
                            List<double[]> rows) {
        NestResult result = null;
        double[] times = new double[REPEATS];
        for (int r = 0; r < REPEATS; r++) {
            long start = System.nanoTime();
            result = Nester.run(problem, rule, options);
            times[r] = (System.nanoTime() - start) / 1e9;
        }
        java.util.Arrays.sort(times);
        double seconds = times[REPEATS / 2];
        NestPlanValidator.validate(problem, result.plan());
        int bundles = result.plan().bundles().size();
        double bound = Math.ceil(result.plan().lowerBound() - 1e-6);
        double gap = 100.0 * (bundles - bound) / bundles;
        long marks = problem.tubes().stream().map(Tube::mark).distinct().count();
        System.out.printf(Locale.ROOT, "| %s | %d | %d | %d | %.0f | %.1f | %s | %.3f | %.2f |%n", name, marks,
                problem.tubes().size(), bundles, bound, gap, result.plan().status(),
                result.bundledVolumeM3() / result.looseVolumeM3(), seconds);
        rows.add(new double[] {seconds, gap});
    }

    /**
     * A generated kit: marks spread over the sizes (a few long heavy marks in the wide sizes, more and shorter ones
     * in the narrow sizes, as space frames tend to have), lengths 400 to 6,000 mm, counts summing to the pieces.
     */
    public static NestingProblem kit(FitRule rule, int marks, int pieces, long seed) {
        Random random = new Random(seed * 7919 + marks);
        List<Tube> tubes = new ArrayList<>();
        int left = pieces;
        for (int m = 0; m < marks; m++) {
            double[] size = SIZES[Math.min(SIZES.length - 1, (int) (Math.sqrt(random.nextDouble()) * SIZES.length))];
            Section section = new Section("CHS " + size[0] + "x" + size[1], "steel", size[0], size[1], null, null,
                    null);
            TubeEnvelope e = rule.envelope(section);
            double length = 400 + 10 * random.nextInt(561);
            int count = m == marks - 1 ? left : Math.max(1, Math.min(left - (marks - m - 1),
                    (int) Math.round(pieces / (double) marks * (0.3 + 1.4 * random.nextDouble()))));
            left -= count;
            double mass = section.massPerMetreKg(7850) * length / 1000;
            for (int i = 0; i < count; i++) {
                tubes.add(new Tube(tubes.size(), "M" + (m + 1), section.name(), e.outerDiameterMm(), e.boreMm(),
                        length, mass));
            }
        }
        return new NestingProblem(tubes, 2.0, 10, null);
    }
}
