package kitwright.model;

/** One row of {@code structures.csv}: how many bars of a mark one structure uses. */
public record StructureCount(String structure, String mark, int count) {
}
