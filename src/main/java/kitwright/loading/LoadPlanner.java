package kitwright.loading;

import java.util.List;
import kitwright.model.CrateType;
import kitwright.model.VehicleType;
import kitwright.packing.CratePlan;

/** The loading stage: crates onto vehicles from a catalog. A pure function. */
public interface LoadPlanner {

    /**
     * Loads every crate of the plan.
     *
     * @param crateCatalog the crate types of the plan (for stackability and top load)
     * @return every crate on exactly one vehicle, or an INFEASIBLE plan with the reason (a crate no vehicle takes)
     */
    LoadPlan load(CratePlan crates, List<CrateType> crateCatalog, List<VehicleType> vehicles);
}
