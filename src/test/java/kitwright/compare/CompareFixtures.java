package kitwright.compare;

import java.util.List;
import kitwright.model.Status;

/** Invented option summaries for the compare tests. */
final class CompareFixtures {
    private CompareFixtures() {
    }

    static OptionSummary option(String kit, int marks, double reuseRatio, Double cost, double offcutPct,
                                Integer vehicles, Status status) {
        return new OptionSummary(kit, marks, 300, 750, reuseRatio, 80, 80 * 6000.0, cost, offcutPct,
                offcutPct * 0.4, offcutPct * 0.6, 1500.0 + marks, 1700.0 + 10 * marks, 1720.0 + 10 * marks,
                2635.0 + 15.5 * marks,
                40 - marks, 4, vehicles, vehicles == null ? null : vehicles * 900.0, status);
    }

    /** Three options; the middle one is cheapest, the first reuses best, vehicles tie between two. */
    static List<OptionSummary> three() {
        return List.of(
                option("cinema-6", 6, 2.5, 5200.0, 9.5, 2, Status.OPTIMAL),
                option("cinema-12", 12, 2.1, 4800.0, 4.25, 2, Status.OPTIMAL),
                option("<b>&\"", 20, 1.8, 5100.5, 3.0, 3, Status.FEASIBLE));
    }
}
