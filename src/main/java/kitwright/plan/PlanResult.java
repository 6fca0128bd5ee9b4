package kitwright.plan;

import java.util.LinkedHashMap;
import java.util.Map;
import kitwright.cutting.CutPlan;
import kitwright.loading.LoadPlan;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.nesting.NestResult;
import kitwright.packing.CratePlan;

/**
 * Everything the chain planned for one kit. {@code crates} and {@code loads} are null when the kit has no crate or
 * vehicle catalog (the report then says logistics were not planned).
 *
 * @param stageSeconds wall-clock seconds per stage, for stderr and timing.json only (never in plan.json)
 */
public record PlanResult(Kit kit, KitSummary summary, CutPlan cutting, NestResult nesting, CratePlan crates,
                         LoadPlan loads, Map<String, Double> stageSeconds) {
    public PlanResult {
        stageSeconds = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(stageSeconds));
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
        return cut || nest || crate || load;
    }
}
