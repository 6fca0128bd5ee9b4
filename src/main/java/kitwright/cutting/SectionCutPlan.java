package kitwright.cutting;

import java.util.List;
import kitwright.model.Status;

/**
 * The cutting plan of one section.
 *
 * @param objective  "cost" (minimum total price) or "length" (minimum total stock length, without prices)
 * @param reason     INFEASIBLE: names the marks and the length missing; FEASIBLE: {@value #STOPPED_BY_TIME_LIMIT}
 *                   when the wall-clock limit rather than the work limits ended the search (such a plan may
 *                   differ from machine to machine); otherwise null
 * @param value      objective value of the plan (null when INFEASIBLE)
 * @param lowerBound proven lower bound on the objective (null when INFEASIBLE)
 * @param gap        (value - lowerBound) / value (null when INFEASIBLE)
 * @param stockPieces mill and rack pieces used
 */
public record SectionCutPlan(String section, double kerfMm, double trimMm, double minRemnantMm, String objective,
                             Status status, String reason, Double value, Double lowerBound, Double gap,
                             int stockPieces, List<CutPattern> patterns, List<Spare> spares) {
    /** The reason of a FEASIBLE plan whose search the wall-clock limit ended. */
    public static final String STOPPED_BY_TIME_LIMIT = "stopped by the time limit";

    public SectionCutPlan {
        patterns = List.copyOf(patterns);
        spares = List.copyOf(spares);
    }

    /** This plan with another reason. */
    public SectionCutPlan withReason(String text) {
        return new SectionCutPlan(section, kerfMm, trimMm, minRemnantMm, objective, status, text, value, lowerBound,
                gap, stockPieces, patterns, spares);
    }
}
