package kitwright.packing;

/**
 * Lower bounds on the crating, and how far the plan is from them.
 *
 * @param boxVolumeCrates      ceil(sum of the items' bounding-box volumes / largest crate inner volume): the figure
 *                             the benchmark target uses. Not a proof: staggered rows beat the bounding boxes (105
 *                             circles of d = 100 in 1000 x 1000, where the boxes allow 100).
 * @param cylinderVolumeCrates ceil(sum of bundle cylinder volumes (pi/4 d^2 L) and box volumes / largest crate
 *                             inner volume): valid for every packing
 * @param massCrates           ceil(total mass / largest net capacity (max gross - tare))
 * @param crates               the proven count bound: max(cylinderVolumeCrates, massCrates), at least 1 with items
 * @param priceRelaxation      the linear relaxation over crate types with volume and mass by length class, or
 *                             null when the catalog has no prices
 * @param price                proven lower bound on the total crate price: the relaxation, the same with whole
 *                             crates, and the count bound times the cheapest price, whichever is largest; or null
 * @param gap                  (objective - bound) / objective on price when priced, else on the count
 */
public record CrateBounds(int boxVolumeCrates, int cylinderVolumeCrates, int massCrates, int crates,
                          Double priceRelaxation, Double price, double gap) {
    public static final CrateBounds NONE = new CrateBounds(0, 0, 0, 0, null, null, 0);
}
