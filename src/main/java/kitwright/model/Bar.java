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
 * @param startDeductionMm node centre to the bar's start (bars.csv start_deduction_mm, else kit.json's
 *                         endDeductionMm), or null without a node-to-node length
 * @param endDeductionMm   node centre to the bar's end, likewise, or null
 */
public record Bar(String mark, String section, double lengthMm, int quantity, int requiredQuantity,
                  Double nodeToNodeMm, Double toleranceMm, String note, Double startDeductionMm,
                  Double endDeductionMm) {
    /** A bar whose end deductions are not known (no node-to-node length, or a bar made from another). */
    public Bar(String mark, String section, double lengthMm, int quantity, int requiredQuantity,
               Double nodeToNodeMm, Double toleranceMm, String note) {
        this(mark, section, lengthMm, quantity, requiredQuantity, nodeToNodeMm, toleranceMm, note, null, null);
    }

    public Bar {
        if ((startDeductionMm == null) != (endDeductionMm == null)) {
            throw new IllegalArgumentException("both end deductions or neither for " + mark);
        }
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
