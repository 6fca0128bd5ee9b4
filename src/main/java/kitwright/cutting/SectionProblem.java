package kitwright.cutting;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The cutting-stock problem of one section: the marks to cut, the stock lengths to cut them from, and the saw.
 *
 * <p>Saw model: {@code trimMm} is taken off each end of a stock piece and includes its own squaring cut; the pieces
 * are separated by one kerf. A stock piece of length L holds pieces l_1..l_n when
 * {@code sum(l_i + kerf) <= L - 2*trim + kerf} (the last piece may end on the far trim line). Its offcut is
 * {@code L - 2*trim - sum(l_i) - n*kerf}, floored at 0; an offcut of at least {@code minRemnantMm} is a remnant.
 *
 * @param section      the section's name, for messages
 * @param demands      marks to cut, each mark once
 * @param stock        stock options in catalog order
 * @param kerfMm       slot of one saw cut
 * @param trimMm       taken off each end of a stock piece
 * @param minRemnantMm shortest offcut that goes back on the rack
 * @param limits       work and time limits
 */
public record SectionProblem(String section, List<Demand> demands, List<StockOption> stock, double kerfMm,
                             double trimMm, double minRemnantMm, SearchLimits limits) {

    public SectionProblem {
        demands = List.copyOf(demands);
        stock = List.copyOf(stock);
        if (demands.isEmpty()) {
            throw new IllegalArgumentException("section " + section + " has no demand");
        }
        Set<String> marks = new HashSet<>();
        for (Demand d : demands) {
            if (!marks.add(d.mark())) {
                throw new IllegalArgumentException("mark " + d.mark() + " appears twice in section " + section);
            }
        }
        if (kerfMm < 0 || trimMm < 0 || minRemnantMm < 0) {
            throw new IllegalArgumentException("kerf, trim and minimum remnant must not be negative");
        }
        if (limits == null) {
            throw new IllegalArgumentException("limits are required");
        }
    }

    /**
     * The objective: {@code "cost"} when every mill row has a price and some row has a positive price (rack rows
     * without a price cost nothing); otherwise {@code "length"}, the total stock length.
     */
    public String objective() {
        boolean millPriced = stock.stream()
                .filter(s -> s.origin() == kitwright.model.Origin.MILL)
                .allMatch(s -> s.price() != null);
        boolean somePositive = stock.stream().anyMatch(s -> s.price() != null && s.price() > 0);
        return millPriced && somePositive ? "cost" : "length";
    }

    /** Copy with other limits. */
    public SectionProblem withLimits(SearchLimits other) {
        return new SectionProblem(section, demands, stock, kerfMm, trimMm, minRemnantMm, other);
    }
}
