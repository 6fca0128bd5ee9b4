package kitwright.loading;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.ids.IdScheme;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.model.VehicleType;
import kitwright.nesting.Bundle;
import kitwright.packing.CratePlan;
import kitwright.packing.CratingDemand;
import kitwright.packing.LaneCratePacker;

/**
 * Crating then loading for a kit, as one pure function for the {@code pack} and {@code plan} commands: the kit's
 * crate and vehicle catalogs, its joint box, its time limit as the solvers' wall-clock safety net, and its id scheme
 * ({@link IdScheme#of}: no crate, joint box or trip id reads like a mark of the kit).
 *
 * <p>Crates and vehicles chosen together, for the least crate price plus trip cost. The crate plan of least price
 * may need crates that only a large vehicle takes (a 6.3 m crate on a semi-trailer where two shorter crates would
 * ride on smaller trucks), so further crate plans are made, each from the crate types that ride on one vehicle type
 * of the catalog (every distinct such part of the crate catalog, once), and every plan is loaded; the least total
 * wins, then fewer crates, then the earlier plan. A candidate is skipped when the proven bound over all plans of
 * its crate types ({@link ShippingCostBound}) is already no less than the best total found. The total's proven
 * bound, over every crate plan of the catalog and every loading, is {@link ShippingCostBound}; the load plan is
 * OPTIMAL only when its total meets it. Without prices on every crate type or a cost on some vehicle the stages
 * keep their own objectives (least price or count, then least trip cost or count) and no total is given.
 */
public final class Shipping {

    /** Both plans; {@code loads} is INFEASIBLE (with the crate plan's reason) when the crating is. */
    public record Shipment(CratePlan crates, LoadPlan loads) {
    }

    /** The catalogs, joint box, ids and wall-clock safety net of one shipment. */
    public record Setting(List<CrateType> crates, List<VehicleType> vehicles, JointBox jointBox, IdScheme ids,
                          double safetySeconds) {
        public Setting {
            crates = List.copyOf(crates);
            vehicles = List.copyOf(vehicles);
        }
    }

    private Shipping() {
    }

    public static Shipment plan(Kit kit, List<Bundle> bundles, List<Joint> joints) {
        return plan(bundles, joints, new Setting(kit.crates(), kit.vehicles(), kit.settings().jointBox(),
                IdScheme.of(kit), kit.settings().timeLimitSeconds()));
    }

    public static Shipment plan(List<Bundle> bundles, List<Joint> joints, Setting setting) {
        double limit = setting.safetySeconds();
        LaneCratePacker.Limits crating = LaneCratePacker.Limits.DEFAULT;
        LaneCratePacker packer = new LaneCratePacker(new LaneCratePacker.Limits(crating.deterministicTime(), limit,
                crating.pricingRounds()), setting.ids());
        RowLoadPlanner.Limits loading = RowLoadPlanner.Limits.DEFAULT;
        RowLoadPlanner loader = new RowLoadPlanner(new RowLoadPlanner.Limits(loading.deterministicTime(), limit,
                loading.pricingRounds()), setting.ids());
        List<CrateType> catalog = setting.crates();
        CratePlan crates = packer.pack(bundles, joints, catalog, setting.jointBox());
        if (crates.status() == Status.INFEASIBLE) {
            return new Shipment(crates, LoadPlan.infeasible("no crate plan: " + crates.reason()));
        }
        LoadPlan loads = loader.load(crates, catalog, setting.vehicles());
        boolean priced = !catalog.isEmpty() && catalog.stream().allMatch(c -> c.price() != null)
                && setting.vehicles().stream().anyMatch(v -> v.costPerTrip() > 0);
        if (!priced || loads.status() == Status.INFEASIBLE || crates.crates().isEmpty()) {
            return new Shipment(crates, loads);
        }
        Deadline deadline = Deadline.in(limit);
        CratingDemand demand = CratingDemand.of(bundles, crates.boxes());
        Shipment best = new Shipment(crates, loads);
        double bestTotal = total(best, catalog);
        List<Integer> all = indices(catalog.size());
        List<List<Integer>> tried = new ArrayList<>();
        // each family's bound (by its crate types), solved once for the candidates' checks and the total's bound
        java.util.Map<List<Integer>, Double> families = new java.util.HashMap<>();
        tried.add(all);
        for (VehicleType v : setting.vehicles()) {
            List<Integer> part = new ArrayList<>();
            for (int t = 0; t < catalog.size(); t++) {
                if (ShippingCostBound.rides(catalog.get(t), v)) {
                    part.add(t);
                }
            }
            if (part.isEmpty() || tried.contains(part) || deadline.passed()) {
                continue;
            }
            tried.add(part);
            double partBound = ShippingCostBound.compute(demand, catalog, part, setting.vehicles(), deadline,
                    Integer.MAX_VALUE, families);
            if (partBound >= bestTotal - 1e-6 * bestTotal) {
                continue;
            }
            List<CrateType> usable = part.stream().map(catalog::get).toList();
            CratePlan other = packer.pack(bundles, joints, catalog, usable, setting.jointBox());
            if (other.status() == Status.INFEASIBLE) {
                continue;
            }
            LoadPlan otherLoads = loader.load(other, catalog, setting.vehicles());
            if (otherLoads.status() == Status.INFEASIBLE) {
                continue;
            }
            Shipment candidate = new Shipment(other, otherLoads);
            double total = total(candidate, catalog);
            if (total < bestTotal - 1e-6 * bestTotal || (total <= bestTotal + 1e-6 * bestTotal
                    && other.crates().size() < best.crates().crates().size())) {
                best = candidate;
                bestTotal = total;
            }
        }
        double bound = ShippingCostBound.compute(demand, catalog, all, setting.vehicles(), deadline,
                Integer.MAX_VALUE, families);
        return new Shipment(best.crates(), best.loads().withTotal(bestTotal, bound));
    }

    /** Crate price plus trip cost. */
    private static double total(Shipment s, List<CrateType> catalog) {
        return cratePrice(s.crates(), catalog) + s.loads().tripCost();
    }

    /** The total price of the plan's crates, from the catalog. */
    public static double cratePrice(CratePlan plan, List<CrateType> catalog) {
        double sum = 0;
        for (kitwright.packing.Crate c : plan.crates()) {
            sum += catalog.stream().filter(t -> t.name().equals(c.type())).findFirst()
                    .map(CrateType::price).orElse(0.0);
        }
        return sum;
    }

    private static List<Integer> indices(int n) {
        List<Integer> all = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            all.add(i);
        }
        return all;
    }
}
