package kitwright.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Supplier;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.cutting.KitCutter;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.plan.PlanProgress;
import kitwright.plan.PlanResult;
import kitwright.plan.Planner;
import kitwright.spares.CuttingSteps;
import kitwright.spares.KitCuttingSteps;
import kitwright.spares.ServiceLifeSpares;
import kitwright.spares.SparesCutting;
import kitwright.spares.SparesCuttingResult;
import kitwright.spares.SparesPlan;
import kitwright.validate.CutPlanValidator;

/**
 * Benchmark of the cutting stage with service-life spares (not a unit test). Run from the project root:
 * <pre>
 * mvn -q -B -o test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/classes:target/test-classes:$(cat target/cp.txt) kitwright.bench.SparesBenchmark [KIT_DIR] [RUNS]
 * </pre>
 * KIT_DIR defaults to {@code sample-kits/alu-kiosk} (its kit.json sets a spares policy), RUNS to 3. Per run: the
 * whole chain without the policy, the whole chain with it, and the spares cutting alone with re-plans that solve
 * every section again (as before the per-section memory of {@link KitCuttingSteps}), to show what the memory
 * saves. Prints the median seconds of each and checks every cutting plan with the shared validator. The plans use
 * deterministic work limits; the kit's timeLimitSeconds stays as the safety net per section, so on a loaded
 * machine a section that reaches it may end with another bound.
 */
public final class SparesBenchmark {
    private SparesBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args.length > 0 ? args[0] : "sample-kits/alu-kiosk");
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
        Kit kit = KitReader.read(dir);
        if (kit.settings().spares() == null) {
            throw new IllegalArgumentException(dir + ": kit.json sets no spares policy");
        }
        Kit plain = kit.withSettings(withoutSpares(kit.settings()));
        List<Double> without = new ArrayList<>();
        List<Double> with = new ArrayList<>();
        List<Double> cutWith = new ArrayList<>();
        List<Double> cutEverySection = new ArrayList<>();
        PlanResult last = null;
        for (int r = 0; r < runs; r++) {
            PlanResult a = timed(without, () -> Planner.run(plain, Planner.Options.DEFAULT, PlanProgress.NONE));
            CutPlanValidator.validate(plain, a.cutting());
            last = timed(with, () -> Planner.run(kit, Planner.Options.DEFAULT, PlanProgress.NONE));
            CutPlanValidator.validate(kit, last.cutting());
            cutWith.add(last.stageSeconds().get("cutting"));
            SparesPlan sizing = ServiceLifeSpares.plan(kit.bars(), kit.settings().spares());
            SparesCuttingResult again = timed(cutEverySection, () -> SparesCutting.apply(kit, sizing,
                    everySection()));
            CutPlanValidator.validate(kit, again.plan());
            if (!again.plan().equals(last.cutting())) {
                System.out.println("note: run " + (r + 1) + ": the plans differ (a section reached its time limit)");
            }
        }
        System.out.printf(Locale.ROOT, "%s, %d runs, medians:%n", kit.name(), runs);
        System.out.printf(Locale.ROOT, "  whole chain without the spares policy   %7.2f s%n", median(without));
        System.out.printf(Locale.ROOT, "  whole chain with the spares policy      %7.2f s (cutting stage %.2f s)%n",
                median(with), median(cutWith));
        System.out.printf(Locale.ROOT, "  spares cutting, every section re-solved %7.2f s%n", median(cutEverySection));
        System.out.printf(Locale.ROOT, "  spares: %d to make, %d from offcuts, %d bought, %d missing, %d re-plans,"
                        + " extra cost %.2f, kit level %.4f%n", last.spares().sizing().totalToMake(),
                last.spares().fromOffcuts(), last.spares().bought(), last.spares().missing(), last.spares().rounds(),
                last.spares().extraCost(), last.spares().sizing().kitLevel());
    }

    /** The cutting steps as they were before the memory: every re-plan solves every section. */
    private static CuttingSteps everySection() {
        KitCuttingSteps filler = new KitCuttingSteps(null, CutProgress.NONE);
        return new CuttingSteps() {
            @Override
            public CutPlan plan(Kit k) {
                return KitCutter.cut(k, new KitCutter.Options(false, null), CutProgress.NONE);
            }

            @Override
            public CutPlan fillOffcuts(Kit k, CutPlan plan, Map<String, Integer> maxExtra) {
                return filler.fillOffcuts(k, plan, maxExtra);
            }
        };
    }

    private static KitSettings withoutSpares(KitSettings s) {
        return new KitSettings(s.name(), s.description(), s.kerfMm(), s.trimMm(), s.minRemnantMm(),
                s.timeLimitSeconds(), s.structuresStandTogether(), s.endDeductionMm(), s.nestTolerance(),
                s.nestClearanceMm(), s.nestEndAllowanceMm(), s.maxBundleMassKg(), s.jointBox(), null);
    }

    private static <T> T timed(List<Double> seconds, Supplier<T> work) {
        long start = System.nanoTime();
        T value = work.get();
        seconds.add((System.nanoTime() - start) / 1e9);
        return value;
    }

    private static double median(List<Double> values) {
        List<Double> sorted = values.stream().sorted().toList();
        int n = sorted.size();
        return n % 2 == 1 ? sorted.get(n / 2) : (sorted.get(n / 2 - 1) + sorted.get(n / 2)) / 2;
    }
}
