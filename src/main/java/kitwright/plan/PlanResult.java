package kitwright.plan;

import java.util.LinkedHashMap;
import java.util.Map;
import kitwright.cutting.CutPlan;
import kitwright.loading.LoadPlan;
import kitwright.metrics.KitMetrics;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.nesting.NestResult;
import kitwright.packing.CratePlan;
import kitwright.spares.SparesOutcome;
import kitwright.tour.TourPlan;

/**
 * Everything the chain planned for one kit. {@code crates} and {@code loads} are null when the kit has no crate or
 * vehicle catalog (the report then says logistics were not planned).
 *
 * @param spares       the service-life spares (sizing, where they came from, extra cost), or null when the kit has
 *                     no {@code spares} policy
 * @param figures      the kit's figures over the cutting plan (reuse ratio, stock, waste, masses, embodied carbon)
 * @param stageSeconds wall-clock seconds per stage, for stderr and timing.json only (never in plan.json)
 * @param tour         the legs of kit.json's tour, or null when the kit has no tour or no crate or vehicle catalog
 */
public record PlanResult(Kit kit, KitSummary summary, CutPlan cutting, SparesOutcome spares, KitMetrics figures,
                         NestResult nesting, CratePlan crates, LoadPlan loads, Map<String, Double> stageSeconds,
                         TourPlan tour) {
    public PlanResult {
        java.util.Objects.requireNonNull(figures, "figures");
        stageSeconds = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(stageSeconds));
    }

    /** A plan without tour legs. */
    public PlanResult(Kit kit, KitSummary summary, CutPlan cutting, SparesOutcome spares, KitMetrics figures,
                      NestResult nesting, CratePlan crates, LoadPlan loads, Map<String, Double> stageSeconds) {
        this(kit, summary, cutting, spares, figures, nesting, crates, loads, stageSeconds, null);
    }

    public boolean logisticsPlanned() {
        return crates != null && loads != null;
    }

    /** True when some part has no feasible plan (exit code 3), the rest still planned and written. */
    public boolean anyInfeasible() {
        boolean cut = cutting.sections().stream().anyMatch(s -> s.status() == Status.INFEASIBLE);
        boolean nest = nesting != null && nesting.plan().status() == Status.INFEASIBLE;
        boolean crate = crates != null && crates.status() == Status.INFEASIBLE;
        boolean load = loads != null && loads.status() == Status.INFEASIBLE;
        boolean leg = tour != null && tour.anyInfeasible();
        return cut || nest || crate || load || leg;
    }
}
