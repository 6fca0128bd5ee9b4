package kitwright.compare;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Status;
import kitwright.plan.PlanResult;

/**
 * Sums up a whole-chain plan as an {@link OptionSummary}: the kit figures the plan carries, the counts of
 * bundles, crates and vehicles with the trip cost, and the worst status of all stages. A stage that did not run
 * (no crate or vehicle catalog) or found no plan leaves its figures null. Pure function.
 */
public final class OptionSummaries {
    private OptionSummaries() {
    }

    public static OptionSummary of(PlanResult result) {
        List<Status> statuses = new ArrayList<>();
        result.cutting().sections().stream().map(SectionCutPlan::status).forEach(statuses::add);
        Integer bundles = null;
        if (result.nesting() != null) {
            statuses.add(result.nesting().plan().status());
            if (result.nesting().plan().status() != Status.INFEASIBLE) {
                bundles = result.nesting().plan().bundles().size();
            }
        }
        Integer crates = null;
        if (result.crates() != null) {
            statuses.add(result.crates().status());
            if (result.crates().status() != Status.INFEASIBLE) {
                crates = result.crates().crates().size();
            }
        }
        Integer vehicles = null;
        Double tripCost = null;
        if (result.loads() != null) {
            statuses.add(result.loads().status());
            if (result.loads().status() != Status.INFEASIBLE) {
                vehicles = result.loads().vehicles().size();
                tripCost = result.loads().tripCost();
            }
        }
        return OptionSummary.of(result.kit().name(), result.figures(),
                new Logistics(bundles, crates, vehicles, tripCost), statuses);
    }
}
