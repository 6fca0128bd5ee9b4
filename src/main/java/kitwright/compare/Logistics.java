package kitwright.compare;

/**
 * Shipping figures of one option, from the nesting, crating and loading stages; each is null when that stage did
 * not run or found no plan.
 *
 * @param bundles  nested bundles (handling units)
 * @param crates   crates
 * @param vehicles vehicles or containers loaded
 * @param tripCost cost of those trips, in the vehicle catalog's currency
 * @param crateCost price of the crates, in the crate catalog's currency
 */
public record Logistics(Integer bundles, Integer crates, Integer vehicles, Double tripCost, Double crateCost) {
    /** No shipping figures known. */
    public static final Logistics UNKNOWN = new Logistics(null, null, null, null, null);
}
