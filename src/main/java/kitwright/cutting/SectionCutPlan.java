package kitwright.cutting;

import java.util.List;
import kitwright.model.Status;

/**
 * The cutting plan of one section.
 *
 * @param objective  "cost" (minimum total price) or "length" (minimum total stock length, without prices)
 * @param reason     null unless INFEASIBLE: names the marks and the length missing
 * @param value      objective value of the plan (null when INFEASIBLE)
 * @param lowerBound proven lower bound on the objective (null when INFEASIBLE)
 * @param gap        (value - lowerBound) / value (null when INFEASIBLE)
 * @param stockPieces mill and rack pieces used
 */
public record SectionCutPlan(String section, double kerfMm, double trimMm, double minRemnantMm, String objective,
                             Status status, String reason, Double value, Double lowerBound, Double gap,
                             int stockPieces, List<CutPattern> patterns, List<Spare> spares) {
    public SectionCutPlan {
        patterns = List.copyOf(patterns);
        spares = List.copyOf(spares);
    }
}
