package kitwright.loading;

/**
 * Crates that are interchangeable on a deck: same outer size, gross mass, stackability and top load.
 *
 * @param lengthMm outer length (along the deck unless rotated)
 * @param widthMm  outer width
 * @param heightMm outer height
 * @param demand   crates of this class to load
 */
record CrateClass(int index, double lengthMm, double widthMm, double heightMm, double massKg, boolean stackable,
                  double maxTopLoadKg, int demand) {

    double footprint() {
        return lengthMm * widthMm;
    }

    double volume() {
        return lengthMm * widthMm * heightMm;
    }

    /** Along the deck in the given orientation. */
    double alongDeck(boolean rotated) {
        return rotated ? widthMm : lengthMm;
    }

    /** Across the deck in the given orientation. */
    double acrossDeck(boolean rotated) {
        return rotated ? lengthMm : widthMm;
    }
}
