package kitwright.model;

/**
 * A mark of the kit: a bar type with its cut length, section and quantity.
 *
 * @param lengthMm         cut length (node-to-node minus the end deductions when that is given)
 * @param quantity         bars in the kit
 * @param requiredQuantity bars the structures need (equal to quantity without structures.csv); the surplus is spares
 * @param nodeToNodeMm     designer's node-to-node length, or null
 * @param toleranceMm      cut length tolerance (plus or minus), or null
 * @param note             free text, or empty
 */
public record Bar(String mark, String section, double lengthMm, int quantity, int requiredQuantity,
                  Double nodeToNodeMm, Double toleranceMm, String note) {
    public Bar {
        if (lengthMm <= 0) {
            throw new IllegalArgumentException("length must be positive for " + mark);
        }
        if (quantity <= 0 || requiredQuantity < 0 || requiredQuantity > quantity) {
            throw new IllegalArgumentException("bad quantity for " + mark + ": " + quantity + "/" + requiredQuantity);
        }
        note = note == null ? "" : note;
    }

    /** Bars beyond what the structures need, kept as spares. */
    public int surplus() {
        return quantity - requiredQuantity;
    }
}
