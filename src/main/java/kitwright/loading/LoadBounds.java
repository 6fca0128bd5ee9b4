package kitwright.loading;

/**
 * Lower bounds on the trip cost of a crate plan.
 *
 * @param fleetRelaxation value of the fleet linear relaxation (mass, floor area and volume by vehicle type)
 * @param cost            the proven bound: the relaxation, and at least the cheapest trip that takes a crate
 * @param gap             (trip cost - bound) / trip cost
 */
public record LoadBounds(double fleetRelaxation, double cost, double gap) {
    public static final LoadBounds NONE = new LoadBounds(0, 0, 0);
}
