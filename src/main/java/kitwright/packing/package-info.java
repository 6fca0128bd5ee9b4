/**
 * Crating: joints into joint boxes, then bundles (tube nests lying lengthwise) and joint boxes into timber crates
 * from the crate catalog. Bundles form lanes along the crate length (shorter ones end to end); lanes sit in the
 * crate's cross-section in square or staggered rows; boxes fill the space left. The crate mix is chosen for the
 * least total crate price, then the fewest crates, and reported beside volume, mass and price lower bounds.
 * The records {@link kitwright.packing.CratePlan}, {@link kitwright.packing.Crate} and
 * {@link kitwright.packing.CrateItem} are the JSON contract of {@code plan.json -> "crates"}.
 */
package kitwright.packing;
