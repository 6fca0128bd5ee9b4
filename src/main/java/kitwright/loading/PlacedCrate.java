package kitwright.loading;

/**
 * A crate on a deck: its outer box from the deck's front left corner, x along the deck (from the front), y across
 * (from the left), z up from the deck floor.
 *
 * @param ref     the crate id of the crate plan
 * @param rotated true when the crate is turned 90 degrees, its length running across the deck
 */
public record PlacedCrate(String ref, double xMm, double yMm, double zMm, boolean rotated) {
    public PlacedCrate {
        if (ref == null || ref.isBlank()) {
            throw new IllegalArgumentException("a placed crate needs a ref");
        }
    }
}
