package kitwright.spares;

import java.util.Map;
import kitwright.cutting.CutPlan;
import kitwright.model.Kit;

/**
 * The two steps of the cutting stage that {@link SparesCutting} needs: plan the kit's demand, and fill the offcuts
 * of a plan with extra bars without buying more stock. Implemented over the cutting package (its optimiser and its
 * offcut filler); a plain interface here so that spares do not depend on how the cutting is solved.
 */
public interface CuttingSteps {
    /** Cuts every bar of the kit (its quantities are the demand) at minimum stock cost. */
    CutPlan plan(Kit kit);

    /**
     * Fills the offcuts of {@code plan} with extra bars: at most {@code maxExtra.get(mark)} bars of each mark, on the
     * same stock pieces (nothing more is bought). Bars the plan already cuts stay where they are.
     */
    CutPlan fillOffcuts(Kit kit, CutPlan plan, Map<String, Integer> maxExtra);
}
