package kitwright.packing;

/**
 * Identical items (same kind, size and mass), interchangeable in a crate layout: equal bundles from the nesting
 * plan, or joint boxes of equal mass.
 *
 * @param widthMm  across the crate; a bundle's envelope diameter
 * @param heightMm up; a bundle's envelope diameter
 * @param demand   how many items of this type must be crated
 */
record ItemType(int index, ItemKind kind, double lengthMm, double widthMm, double heightMm, double massKg,
                int demand) {

    double diameterMm() {
        return widthMm;
    }

    /** Bounding-box volume, mm3. */
    double boxVolume() {
        return lengthMm * widthMm * heightMm;
    }

    /** Volume any packing must give the item: the cylinder for a bundle, the box for a box, mm3. */
    double solidVolume() {
        return kind == ItemKind.BUNDLE ? Math.PI / 4 * widthMm * widthMm * lengthMm : boxVolume();
    }
}
