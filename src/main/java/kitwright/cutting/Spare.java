package kitwright.cutting;

/** Bars of a mark cut beyond the demand. */
public record Spare(String mark, int count) {
}
