package kitwright.loading;

/**
 * Lower bounds on the trip cost of a crate plan.
 *
 * @param fleetRelaxation value of the fleet linear relaxation (mass, floor area and volume by vehicle type)
 * @param wholeVehicles   the same model with whole vehicles (at least the relaxation)
 * @param cost            the proven bound: the larger of the two, and at least the cheapest trip
 * @param gap             (trip cost - bound) / trip cost
 */
public record LoadBounds(double fleetRelaxation, double wholeVehicles, double cost, double gap) {
    public static final LoadBounds NONE = new LoadBounds(0, 0, 0, 0);
}
