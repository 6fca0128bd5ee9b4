package kitwright.model;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The tube catalog: sections (in catalog order) and every stock length offered for them. */
public record TubeCatalog(Path file, Map<String, Section> sections, List<StockLength> stock) {
    public TubeCatalog {
        sections = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(sections));
        stock = List.copyOf(stock);
    }

    public Optional<Section> section(String name) {
        return Optional.ofNullable(sections.get(name));
    }

    /** Stock rows of one section, in catalog order. */
    public List<StockLength> stockFor(String section) {
        return stock.stream().filter(s -> s.section().equals(section)).toList();
    }

    /** The longest stock length of a section, mill or rack, or 0 when there is none. */
    public double longestLengthMm(String section) {
        return stockFor(section).stream().mapToDouble(StockLength::lengthMm).max().orElse(0);
    }
}
