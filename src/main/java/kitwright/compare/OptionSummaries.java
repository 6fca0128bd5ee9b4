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
        List<StageStatus> stages = new ArrayList<>();
        result.cutting().sections().stream().map(SectionCutPlan::status).forEach(statuses::add);
        result.cutting().sections().forEach(s -> stages.add(new StageStatus("cutting " + s.section(), s.status(),
                s.gap())));
        Integer bundles = null;
        if (result.nesting() != null) {
            var nest = result.nesting().plan();
            statuses.add(nest.status());
            stages.add(new StageStatus("nesting", nest.status(), nest.status() == Status.INFEASIBLE
                    || nest.bundles().isEmpty() ? null
                    : Math.max(0, (nest.bundles().size() - nest.lowerBound()) / nest.bundles().size())));
            if (result.nesting().plan().status() != Status.INFEASIBLE) {
                bundles = result.nesting().plan().bundles().size();
            }
        }
        Integer crates = null;
        Double crateCost = null;
        if (result.crates() != null) {
            statuses.add(result.crates().status());
            stages.add(new StageStatus("crates", result.crates().status(), result.crates().status()
                    == Status.INFEASIBLE ? null : result.crates().bounds().gap()));
            if (result.crates().status() != Status.INFEASIBLE) {
                crates = result.crates().crates().size();
                boolean priced = result.kit().crates().stream().allMatch(c -> c.price() != null);
                crateCost = priced ? kitwright.loading.Shipping.cratePrice(result.crates(), result.kit().crates())
                        : null;
            }
        }
        Integer vehicles = null;
        Double tripCost = null;
        if (result.loads() != null) {
            statuses.add(result.loads().status());
            boolean loaded = result.loads().status() != Status.INFEASIBLE;
            // the trips for these crates, then the total against the bound over every crate plan and loading
            boolean tripsProven = loaded && result.loads().bounds().gap() <= 1e-9;
            stages.add(new StageStatus("loads", !loaded ? Status.INFEASIBLE : tripsProven ? Status.OPTIMAL
                    : Status.FEASIBLE, loaded ? result.loads().bounds().gap() : null));
            if (loaded && result.loads().totalCost() != null) {
                boolean met = result.loads().totalGap() <= 1e-9;
                stages.add(new StageStatus("crates and trips", met ? Status.OPTIMAL : Status.FEASIBLE,
                        result.loads().totalGap()));
            }
            if (loaded) {
                vehicles = result.loads().vehicles().size();
                tripCost = result.loads().tripCost();
            }
        }
        return OptionSummary.of(result.kit().name(), result.figures(),
                new Logistics(bundles, crates, vehicles, tripCost, crateCost), statuses, stages);
    }
}
