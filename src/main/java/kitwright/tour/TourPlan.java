package kitwright.tour;

import java.util.List;
import kitwright.model.Status;

/**
 * The legs of a tour in order: n structures make n + 1 legs, depot to the first venue, each venue to the next, and
 * the last venue back to the depot.
 */
public record TourPlan(List<Leg> legs) {
    /** The name of the place a tour starts from and ends at. */
    public static final String DEPOT = "depot";

    public TourPlan {
        legs = List.copyOf(legs);
    }

    /** True when some leg has no plan. */
    public boolean anyInfeasible() {
        return legs.stream().anyMatch(l -> l.shipment().status() == Status.INFEASIBLE);
    }

    /** How many distinct shipments were planned (legs alike share one). */
    public long distinctShipments() {
        return legs.stream().filter(l -> l.sameAs() == l.number()).count();
    }
}
