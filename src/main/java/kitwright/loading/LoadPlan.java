package kitwright.loading;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;
import kitwright.model.Status;

/**
 * The loading of a crate plan: {@code plan.json -> "loads"} = {@code {status, lowerBound, totalCost,
 * totalLowerBound, vehicles}}.
 *
 * @param lowerBound      proven lower bound on the total trip cost of these crates (the number of trips when no
 *                        vehicle has a cost)
 * @param tripCost        total cost of the trips (not in the JSON contract)
 * @param reason          why no plan exists (INFEASIBLE); "stopped by the time limit" for a FEASIBLE plan whose
 *                        search the wall-clock limit cut short; else null
 * @param totalCost       crate price plus trip cost, when both catalogs give prices and costs; else null
 * @param totalLowerBound proven lower bound on crate price plus trip cost over every crate plan and loading
 *                        ({@link ShippingCostBound}); null with {@code totalCost}
 */
@JsonPropertyOrder({"status", "lowerBound", "totalCost", "totalLowerBound", "vehicles"})
@JsonInclude(JsonInclude.Include.NON_NULL)
public record LoadPlan(Status status, double lowerBound, List<VehicleLoad> vehicles, @JsonIgnore double tripCost,
                       @JsonIgnore LoadBounds bounds, @JsonIgnore String reason, Double totalCost,
                       Double totalLowerBound) {
    public LoadPlan {
        vehicles = List.copyOf(vehicles);
        bounds = bounds == null ? LoadBounds.NONE : bounds;
        if ((totalCost == null) != (totalLowerBound == null)) {
            throw new IllegalArgumentException("a total cost needs its lower bound");
        }
    }

    /** A plan of the trips alone, without the total of crates and trips. */
    public LoadPlan(Status status, double lowerBound, List<VehicleLoad> vehicles, double tripCost, LoadBounds bounds,
                    String reason) {
        this(status, lowerBound, vehicles, tripCost, bounds, reason, null, null);
    }

    public static LoadPlan infeasible(String reason) {
        return new LoadPlan(Status.INFEASIBLE, 0, List.of(), 0, LoadBounds.NONE, reason);
    }

    /**
     * This plan with the total of crates and trips and its bound; OPTIMAL only when the trips meet their bound and
     * the total meets its bound.
     */
    public LoadPlan withTotal(double total, double totalBound) {
        boolean met = total <= totalBound + 1e-6 * Math.max(1, total);
        Status s = status == Status.OPTIMAL && !met ? Status.FEASIBLE : status;
        return new LoadPlan(s, lowerBound, vehicles, tripCost, bounds, reason, total, totalBound);
    }

    /** (total - bound) / total, or 0 without a total. */
    @JsonIgnore
    public double totalGap() {
        return totalCost == null || totalCost <= 0 ? 0 : Math.max(0, (totalCost - totalLowerBound) / totalCost);
    }
}
