package kitwright.cutting;

/**
 * How many bars of one mark a section must yield.
 *
 * @param mark     the bar type, unique within the problem
 * @param lengthMm cut length in millimetres
 * @param quantity bars to cut, at least one
 */
public record Demand(String mark, double lengthMm, int quantity) {
    public Demand {
        if (mark == null || mark.isBlank()) {
            throw new IllegalArgumentException("a demand needs a mark");
        }
        if (!(lengthMm > 0) || Double.isInfinite(lengthMm)) {
            throw new IllegalArgumentException("length must be positive for " + mark + ": " + lengthMm);
        }
        if (quantity <= 0) {
            throw new IllegalArgumentException("quantity must be positive for " + mark + ": " + quantity);
        }
    }
}
