package kitwright.model;

/**
 * Where a vehicle's load space rests on its supports, and what they may carry: the lever rule's data.
 *
 * <p>Positions are measured from the front of the deck (the headboard) along the deck, in millimetres; a front axle
 * ahead of the deck is negative. A front support at or behind the front of the deck is read as a semi-trailer's
 * kingpin (a rigid truck's front axle sits under the cab, ahead of its body), and the reports call its load the
 * kingpin load.
 *
 * @param frontSupportMm front axle (rigid truck) or kingpin (semi-trailer)
 * @param rearSupportMm  centre of the rear axle group, behind the front support
 * @param unladenFrontKg front support's load with the deck empty
 * @param unladenRearKg  rear axle group's load with the deck empty
 * @param maxFrontKg     the front support's limit
 * @param maxRearKg      the rear axle group's limit
 * @param minFrontKg     least front load for steering (a rigid truck's steer-axle share), or null when unchecked
 */
public record AxleGeometry(double frontSupportMm, double rearSupportMm, double unladenFrontKg, double unladenRearKg,
                           double maxFrontKg, double maxRearKg, Double minFrontKg) {
    public AxleGeometry {
        if (!(rearSupportMm > frontSupportMm)) {
            throw new IllegalArgumentException("the rear support must lie behind the front support");
        }
        if (unladenFrontKg < 0 || unladenRearKg < 0 || maxFrontKg <= 0 || maxRearKg <= 0
                || (minFrontKg != null && minFrontKg < 0)) {
            throw new IllegalArgumentException("axle loads must be 0 or more, limits above 0");
        }
    }

    /** Whether the front support is a kingpin (at or behind the front of the deck). */
    public boolean kingpin() {
        return frontSupportMm >= 0;
    }

    /** The distance between the supports, the lever rule's span. */
    public double wheelbaseMm() {
        return rearSupportMm - frontSupportMm;
    }

    /**
     * Front and rear support loads, unladen included, for a load of the given mass whose centre of gravity lies
     * {@code centreMm} from the front of the deck. Lever rule (moments about each support): rear share =
     * m (x - a) / (b - a), front share = m (b - x) / (b - a).
     */
    public double[] loads(double massKg, double centreMm) {
        double rear = massKg * (centreMm - frontSupportMm) / wheelbaseMm();
        return new double[] {unladenFrontKg + massKg - rear, unladenRearKg + rear};
    }
}
