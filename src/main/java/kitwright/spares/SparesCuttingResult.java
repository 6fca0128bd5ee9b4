package kitwright.spares;

import java.util.List;
import kitwright.cutting.CutPlan;

/**
 * The cutting plan with the service-life spares in it, and where they came from.
 *
 * @param plan      the final cutting plan: the kit's bars and the spares
 * @param marks     per mark, in the kit's order
 * @param extraCost stock cost of the final plan minus that of the plan without spares (null without prices)
 * @param rounds    how many times the demand was re-planned (0 when the offcuts held every spare)
 */
public record SparesCuttingResult(CutPlan plan, List<SparesSupply> marks, Double extraCost, int rounds) {
    public SparesCuttingResult {
        marks = List.copyOf(marks);
    }

    public int fromOffcuts() {
        return marks.stream().mapToInt(SparesSupply::fromOffcuts).sum();
    }

    public int bought() {
        return marks.stream().mapToInt(SparesSupply::bought).sum();
    }

    public int missing() {
        return marks.stream().mapToInt(SparesSupply::missing).sum();
    }
}
