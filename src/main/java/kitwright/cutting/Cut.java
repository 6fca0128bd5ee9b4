package kitwright.cutting;

/** One piece sawn from a stock piece: a bar of a mark. */
public record Cut(String mark, double lengthMm) {
}
