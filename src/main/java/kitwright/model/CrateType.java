package kitwright.model;

/**
 * A crate from the crate catalog. Inner dimensions bound the contents; outer dimensions go on the deck.
 *
 * @param price price per crate, or null when the catalog gives none
 */
public record CrateType(String name, double innerLengthMm, double innerWidthMm, double innerHeightMm,
                        double outerLengthMm, double outerWidthMm, double outerHeightMm,
                        double tareKg, double maxGrossKg, boolean stackable, double maxTopLoadKg, Double price) {
}
