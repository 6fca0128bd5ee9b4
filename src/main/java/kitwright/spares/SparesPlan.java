package kitwright.spares;

import java.util.List;
import kitwright.model.SparesPolicy;

/**
 * Service-life spares of a whole kit: one entry per mark (in the kit's mark order) and the totals.
 *
 * @param policy              the loss rate, cycles and kit service level the plan was sized for
 * @param marks               spares per mark
 * @param totalSpares         spares needed over all marks
 * @param totalToMake         spares still to be made (beyond the kit's existing surplus)
 * @param totalExpectedLosses mean bars lost over the kit's life, all marks
 * @param kitLevel            probability that every mark is covered under independence: the product of the marks'
 *                            {@link MarkSpares#coverage()}; at least {@code policy.serviceLevel()} by construction
 */
public record SparesPlan(SparesPolicy policy, List<MarkSpares> marks, int totalSpares, int totalToMake,
                         double totalExpectedLosses, double kitLevel) {
    public SparesPlan {
        marks = List.copyOf(marks);
    }

    /** The entry of a mark, or null when the mark is not in the plan. */
    public MarkSpares mark(String mark) {
        return marks.stream().filter(m -> m.mark().equals(mark)).findFirst().orElse(null);
    }
}
