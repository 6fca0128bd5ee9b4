package kitwright.loading;

import java.util.List;
import kitwright.ids.IdScheme;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.packing.CratePlan;
import kitwright.packing.LaneCratePacker;

/**
 * Crating then loading for a kit, as one pure function for the {@code pack} and {@code plan} commands: the kit's
 * crate and vehicle catalogs, its joint box, its time limit as the solvers' wall-clock safety net, and its id scheme
 * ({@link IdScheme#of}: no crate, joint box or trip id reads like a mark of the kit).
 */
public final class Shipping {

    /** Both plans; {@code loads} is INFEASIBLE (with the crate plan's reason) when the crating is. */
    public record Shipment(CratePlan crates, LoadPlan loads) {
    }

    private Shipping() {
    }

    public static Shipment plan(Kit kit, List<Bundle> bundles, List<Joint> joints) {
        double limit = kit.settings().timeLimitSeconds();
        IdScheme ids = IdScheme.of(kit);
        LaneCratePacker.Limits crating = LaneCratePacker.Limits.DEFAULT;
        CratePlan crates = new LaneCratePacker(new LaneCratePacker.Limits(crating.deterministicTime(), limit,
                crating.pricingRounds()), ids).pack(bundles, joints, kit.crates(), kit.settings().jointBox());
        if (crates.status() == Status.INFEASIBLE) {
            return new Shipment(crates, LoadPlan.infeasible("no crate plan: " + crates.reason()));
        }
        RowLoadPlanner.Limits loading = RowLoadPlanner.Limits.DEFAULT;
        LoadPlan loads = new RowLoadPlanner(new RowLoadPlanner.Limits(loading.deterministicTime(), limit,
                loading.pricingRounds()), ids).load(crates, kit.crates(), kit.vehicles());
        return new Shipment(crates, loads);
    }
}
