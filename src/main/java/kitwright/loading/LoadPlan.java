package kitwright.loading;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;
import kitwright.model.Status;

/**
 * The loading of a crate plan: {@code plan.json -> "loads"} = {@code {status, lowerBound, vehicles}}.
 *
 * @param lowerBound proven lower bound on the total trip cost (the number of trips when no vehicle has a cost)
 * @param tripCost   total cost of the trips (not in the JSON contract)
 * @param reason     why no plan exists (INFEASIBLE); "stopped by the time limit" for a FEASIBLE plan whose search
 *                   the wall-clock limit cut short; else null
 */
@JsonPropertyOrder({"status", "lowerBound", "vehicles"})
public record LoadPlan(Status status, double lowerBound, List<VehicleLoad> vehicles, @JsonIgnore double tripCost,
                       @JsonIgnore LoadBounds bounds, @JsonIgnore String reason) {
    public LoadPlan {
        vehicles = List.copyOf(vehicles);
        bounds = bounds == null ? LoadBounds.NONE : bounds;
    }

    public static LoadPlan infeasible(String reason) {
        return new LoadPlan(Status.INFEASIBLE, 0, List.of(), 0, LoadBounds.NONE, reason);
    }
}
