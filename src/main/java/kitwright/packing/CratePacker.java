package kitwright.packing;

import java.util.List;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.nesting.Bundle;

/** The crating stage: bundles and joints into crates from a catalog. A pure function. */
public interface CratePacker {

    /**
     * Crates every bundle and joint (joints first go into joint boxes of the given size).
     *
     * @return a plan with every bundle and every joint box in exactly one crate, or an INFEASIBLE plan with the
     *         reason (a bundle or joint that no crate type takes, an empty catalog)
     */
    CratePlan pack(List<Bundle> bundles, List<Joint> joints, List<CrateType> crates, JointBox jointBox);
}
