package kitwright.packing;

/**
 * One bundle or joint box in a crate, as its bounding box from the crate's inside corner: x along the crate
 * length, y across its width, z up. A bundle's width and height are its envelope diameter; its axis runs along x
 * through (y + d/2, z + d/2).
 *
 * @param ref the bundle id (nesting) or the joint box id
 */
public record CrateItem(ItemKind kind, String ref, double xMm, double yMm, double zMm,
                        double lengthMm, double widthMm, double heightMm, double massKg) {
    public CrateItem {
        if (kind == null || ref == null || ref.isBlank()) {
            throw new IllegalArgumentException("a crate item needs a kind and a ref");
        }
        if (!(lengthMm > 0 && widthMm > 0 && heightMm > 0) || massKg < 0) {
            throw new IllegalArgumentException("bad size or mass of crate item " + ref);
        }
    }

    /** Far end along the crate length. */
    public double endXMm() {
        return xMm + lengthMm;
    }
}
