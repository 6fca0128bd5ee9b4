package kitwright.tour;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.loading.LoadPlan;
import kitwright.model.Joint;
import kitwright.model.Status;
import kitwright.nesting.NestResult;
import kitwright.packing.CratePlan;

/**
 * What one leg ships for its structure: the structure's bars nested into bundles of their own, its joints, the
 * crates and the vehicle loads. Legs whose structures have the same rows in structures.csv share one shipment.
 *
 * @param bars          bars by mark, as structures.csv counts them for the structure (mark order)
 * @param joints        the joints shipped, with the structure's counts (joints.csv order)
 * @param jointsAssumed true when the structure's rows name no joint mark, so every joint of the kit is shipped
 * @param nesting       the bundles of the structure's bars (the kit's fit rule and limits); null when the
 *                      cutting plan lacks some of its bars
 * @param crates        the crate plan (INFEASIBLE with the reason when the leg cannot be planned)
 * @param loads         the vehicle loads, with the total of crates and trips and its bound where priced
 * @param crateCost     the price of the crates, or null when a crate type has no price
 */
public record LegShipment(Map<String, Integer> bars, List<Joint> joints, boolean jointsAssumed, NestResult nesting,
                          CratePlan crates, LoadPlan loads, Double crateCost) {
    public LegShipment {
        bars = java.util.Collections.unmodifiableMap(new TreeMap<>(bars));
        joints = List.copyOf(joints);
    }

    /** Trip cost of the loads (0 when nothing could be loaded). */
    public double tripCost() {
        return loads.tripCost();
    }

    /**
     * The leg's status: INFEASIBLE when crating or loading is; else, with a total of crates and trips, the loads'
     * status (OPTIMAL only when that total meets its proven bound); else the weaker of the two stages'.
     */
    public Status status() {
        if (crates.status() == Status.INFEASIBLE || loads.status() == Status.INFEASIBLE) {
            return Status.INFEASIBLE;
        }
        if (loads.totalCost() != null) {
            return loads.status();
        }
        return crates.status() == Status.OPTIMAL ? loads.status() : crates.status();
    }

    /** Why the leg has no plan (INFEASIBLE), else null. */
    public String reason() {
        if (crates.status() == Status.INFEASIBLE) {
            return crates.reason();
        }
        return loads.status() == Status.INFEASIBLE ? loads.reason() : null;
    }
}
