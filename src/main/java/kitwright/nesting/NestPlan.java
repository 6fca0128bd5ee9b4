package kitwright.nesting;

import java.util.List;
import kitwright.model.NestTolerance;
import kitwright.model.Status;

/** All bundles of a kit, with the fit rule used and a lower bound on the number of bundles. */
public record NestPlan(NestTolerance tolerance, double clearanceMm, Status status, double lowerBound,
                       List<Bundle> bundles) {
    public NestPlan {
        bundles = List.copyOf(bundles);
    }
}
