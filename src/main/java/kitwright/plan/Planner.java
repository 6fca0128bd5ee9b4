package kitwright.plan;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import kitwright.cutting.CutPlan;
import kitwright.loading.LoadPlan;
import kitwright.loading.Shipping;
import kitwright.metrics.KitMass;
import kitwright.metrics.KitMetrics;
import kitwright.metrics.KitMetricsCalculator;
import kitwright.model.Kit;
import kitwright.nesting.NestResult;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;
import kitwright.packing.CratePlan;
import kitwright.spares.SparesStage;
import kitwright.tour.TourPlan;
import kitwright.tour.TourPlanner;

/**
 * The whole chain for one kit, as one pure function: cutting, then nesting of every cut piece, then crating of
 * the bundles and joint boxes and loading of the crates onto vehicles. The cutting step sizes and cuts the kit's
 * service-life spares when kit.json has a policy; the kit's figures (reuse ratio, stock, waste, masses, embodied
 * carbon) are computed once, from the final cutting plan. With a kit.json tour, each leg's shipment follows
 * ({@link TourPlanner}). Each stage sees only the records of the
 * stage before it. Deterministic: the stages use one solver worker and work limits, so the plan does not depend
 * on machine speed; only {@link PlanResult#stageSeconds()} does.
 */
public final class Planner {
    private Planner() {
    }

    /**
     * Options of a run: offcuts filled with spare bars (cut --spares-from-offcuts), nothing more bought; and the legs
     * of kit.json's tour planned (compare, which ranks whole kits, leaves them out).
     */
    public record Options(boolean sparesFromOffcuts, boolean tourLegs) {
        public static final Options DEFAULT = new Options(false);

        /** Options that plan the tour's legs. */
        public Options(boolean sparesFromOffcuts) {
            this(sparesFromOffcuts, true);
        }

        public Options withoutTourLegs() {
            return new Options(sparesFromOffcuts, false);
        }
    }

    public static PlanResult run(Kit kit, Options options, PlanProgress progress) {
        Map<String, Double> seconds = new LinkedHashMap<>();

        progress.stage("cutting", kit.usedSections().size() + " sections");
        SparesStage.Result cut = timed(seconds, "cutting", () -> SparesStage.cut(kit, options.sparesFromOffcuts(),
                null, progress));
        CutPlan cutting = cut.plan();
        KitMetrics figures = KitMetricsCalculator.of(kit, cutting);
        KitSummary summary = KitSummary.of(kit, KitMass.sparesCut(cutting));

        progress.stage("nesting", "every cut piece into bundles");
        NestResult nesting = timed(seconds, "nesting", () -> Nester.run(kit, cutting,
                NestingOptions.DEFAULT.withWallSeconds(kit.settings().timeLimitSeconds())));

        CratePlan crates = null;
        LoadPlan loads = null;
        if (!kit.crates().isEmpty() && !kit.vehicles().isEmpty()) {
            progress.stage("crating and loading", nesting.plan().bundles().size() + " bundles");
            Shipping.Shipment shipment = timed(seconds, "crating and loading",
                    () -> Shipping.plan(kit, nesting.plan().bundles(), kit.joints()));
            crates = shipment.crates();
            loads = shipment.loads();
        } else {
            progress.stage("crating and loading", "skipped: no crate or vehicle catalog");
        }
        TourPlan tour = null;
        if (crates != null && options.tourLegs() && !kit.settings().tour().isEmpty()) {
            progress.stage(TOUR_STAGE, kit.settings().tour().size() + 1 + " legs");
            tour = timed(seconds, TOUR_STAGE, () -> TourPlanner.plan(kit, cutting));
        }
        return new PlanResult(kit, summary, cutting, cut.outcome(), figures, nesting, crates, loads, seconds, tour);
    }

    private static <T> T timed(Map<String, Double> seconds, String stage, Supplier<T> work) {
        long start = System.nanoTime();
        T value = work.get();
        seconds.put(stage, (System.nanoTime() - start) / 1e9);
        return value;
    }

    /** Stage names in chain order, as they appear in timing.json. */
    public static final List<String> STAGES = List.of("cutting", "nesting", "crating and loading");
    /** The stage after them when kit.json has a tour: each leg's shipment, once per distinct structure. */
    public static final String TOUR_STAGE = "tour legs";
}
