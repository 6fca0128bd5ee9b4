package kitwright.io;

/**
 * One row of {@code bars.csv} as written, before it is checked against the catalog and structures: the cut length
 * may still be blank (derived from node-to-node) and the quantity blank (taken from structures.csv).
 *
 * @param lengthMm     cut length, or null when blank (or unreadable)
 * @param quantity     bars in the kit, or null when blank (or unreadable)
 * @param nodeToNodeMm node-to-node length, or null
 * @param toleranceMm  cut length tolerance (plus or minus), or null
 * @param startDeductionMm deduction at the bar's start from node-to-node, or null for kit.json's endDeductionMm
 * @param endDeductionMm   deduction at the bar's end, or null for kit.json's endDeductionMm
 * @param readable     false when a value of the row was wrong (the problem is already reported)
 */
public record BarLine(String mark, String section, Double lengthMm, Integer quantity, Double nodeToNodeMm,
                      Double toleranceMm, Double startDeductionMm, Double endDeductionMm, String note,
                      boolean readable) {
}
