package kitwright.validate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.loading.LoadPlan;
import kitwright.loading.PlacedCrate;
import kitwright.loading.VehicleLoad;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.model.VehicleType;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;

/**
 * Re-checks a load plan from first principles, independently of how it was made:
 * <ul>
 *   <li>every crate of the crate plan is on exactly one vehicle, and nothing else is;</li>
 *   <li>each vehicle matches its catalog type; its mass is the sum of its crates' gross masses and within the
 *   payload; its centre of gravity is the mass-weighted mean of the crates' centres along the deck;</li>
 *   <li>every crate's outer box (turned when {@code rotated}) lies inside the deck: length, width and height;</li>
 *   <li>no two crates overlap;</li>
 *   <li>a crate off the floor stands fully on one crate whose top is at its bottom, and that crate is stackable;</li>
 *   <li>the mass resting on each crate (every crate above it whose footprint overlaps it) is within its top
 *   load;</li>
 *   <li>the lateral centre of gravity is the mass-weighted mean of the footprint centres across the deck, as an
 *   offset from the centreline; beyond 10 % of the deck width the vehicle says why;</li>
 *   <li>with axle geometry in the catalog, the front (or kingpin) and rear loads are the unladen loads plus each
 *   crate's share by moments about the other support, and within the limits (and above the least front load);
 *   without it, no axle loads are claimed;</li>
 *   <li>stacks stay below the door opening; the crates are listed in an order they can be loaded in: every crate
 *   after the crates it stands on;</li>
 *   <li>the lower bound does not exceed the trip cost; the total's bound does not exceed the total.</li>
 * </ul>
 * Throws AssertionError listing every violation found.
 */
public final class LoadPlanValidator {
    private static final double EPS = 1e-6;

    private LoadPlanValidator() {
    }

    /** A crate as placed: its box on the deck. */
    private record Box(String ref, double x0, double y0, double z0, double x1, double y1, double z1, double mass,
                       CrateType type) {
        boolean overlapsFootprint(Box o) {
            return x0 < o.x1 - EPS && o.x0 < x1 - EPS && y0 < o.y1 - EPS && o.y0 < y1 - EPS;
        }
    }

    public static void check(LoadPlan plan, CratePlan crates, List<CrateType> crateCatalog,
                             List<VehicleType> vehicles) {
        List<String> errors = new ArrayList<>();
        if (plan.status() == Status.INFEASIBLE) {
            errors.add("plan is INFEASIBLE: " + plan.reason());
            fail(errors);
        }
        Map<String, Crate> byId = new HashMap<>();
        crates.crates().forEach(c -> byId.put(c.id(), c));
        Map<String, Integer> seen = new HashMap<>();
        double cost = 0;
        for (VehicleLoad load : plan.vehicles()) {
            VehicleType type = vehicles.stream().filter(v -> v.name().equals(load.type())).findFirst().orElse(null);
            if (type == null) {
                errors.add(load.id() + ": unknown vehicle type " + load.type());
                continue;
            }
            cost += type.costPerTrip();
            checkVehicle(load, type, byId, crateCatalog, seen, errors);
        }
        for (Crate c : crates.crates()) {
            int n = seen.getOrDefault(c.id(), 0);
            if (n != 1) {
                errors.add("crate " + c.id() + " is on " + n + " vehicles (expected exactly 1)");
            }
        }
        seen.keySet().stream().filter(r -> !byId.containsKey(r)).forEach(r -> errors.add("unknown crate " + r));
        boolean costed = vehicles.stream().anyMatch(v -> v.costPerTrip() > 0);
        double objective = costed ? cost : plan.vehicles().size();
        if (plan.lowerBound() > objective + 1e-6 * Math.max(1, objective)) {
            errors.add("lower bound " + plan.lowerBound() + " exceeds the trip cost " + objective);
        }
        if (plan.totalCost() != null && plan.totalLowerBound() > plan.totalCost() + 1e-6 * plan.totalCost()) {
            errors.add("total lower bound " + plan.totalLowerBound() + " exceeds the total " + plan.totalCost());
        }
        if (plan.totalCost() != null && costed) {
            double price = 0;
            for (Crate c : crates.crates()) {
                CrateType t = crateCatalog.stream().filter(x -> x.name().equals(c.type())).findFirst().orElse(null);
                price += t == null || t.price() == null ? 0 : t.price();
            }
            if (Math.abs(price + cost - plan.totalCost()) > 1e-6 * Math.max(1, plan.totalCost())) {
                errors.add("total " + plan.totalCost() + " is not crate price " + price + " plus trips " + cost);
            }
        }
        fail(errors);
    }

    private static void checkVehicle(VehicleLoad load, VehicleType type, Map<String, Crate> byId,
                                     List<CrateType> catalog, Map<String, Integer> seen, List<String> errors) {
        if (load.deckLengthMm() != type.deckLengthMm() || load.deckWidthMm() != type.deckWidthMm()
                || load.deckHeightMm() != type.deckHeightMm() || load.payloadKg() != type.payloadKg()) {
            errors.add(load.id() + ": deck or payload differs from vehicle type " + type.name());
        }
        List<Box> boxes = new ArrayList<>();
        double mass = 0;
        double moment = 0;
        for (PlacedCrate p : load.crates()) {
            seen.merge(p.ref(), 1, Integer::sum);
            Crate c = byId.get(p.ref());
            if (c == null) {
                continue;
            }
            double along = p.rotated() ? c.outerWidthMm() : c.outerLengthMm();
            double across = p.rotated() ? c.outerLengthMm() : c.outerWidthMm();
            CrateType ct = catalog.stream().filter(t -> t.name().equals(c.type())).findFirst().orElse(null);
            Box b = new Box(p.ref(), p.xMm(), p.yMm(), p.zMm(), p.xMm() + along, p.yMm() + across,
                    p.zMm() + c.outerHeightMm(), c.grossKg(), ct);
            boxes.add(b);
            mass += c.grossKg();
            moment += c.grossKg() * (b.x0 + b.x1) / 2;
            if (b.x0 < -EPS || b.y0 < -EPS || b.z0 < -EPS || b.x1 > type.deckLengthMm() + EPS
                    || b.y1 > type.deckWidthMm() + EPS || b.z1 > loadHeight(type) + EPS) {
                errors.add(load.id() + ": crate " + p.ref() + " is outside the deck");
            }
        }
        if (Math.abs(mass - load.massKg()) > 1e-6 * Math.max(1, mass)) {
            errors.add(load.id() + ": mass " + load.massKg() + " is not the crates' " + mass);
        }
        if (mass > type.payloadKg() + EPS) {
            errors.add(load.id() + ": " + mass + " kg over the payload " + type.payloadKg());
        }
        if (mass > 0 && Math.abs(moment / mass - load.centreOfGravityMm()) > 1e-3) {
            errors.add(load.id() + ": centre of gravity " + load.centreOfGravityMm() + " should be " + moment / mass);
        }
        BalanceCheck.check(load, type, boxes.stream().map(b -> new double[] {b.x0, b.y0, b.x1, b.y1, b.mass})
                .toList(), errors);
        for (int i = 0; i < boxes.size(); i++) {
            Box a = boxes.get(i);
            for (int j = i + 1; j < boxes.size(); j++) {
                Box b = boxes.get(j);
                if (a.overlapsFootprint(b) && Math.abs(b.z1 - a.z0) <= EPS) {
                    errors.add(load.id() + ": crate " + a.ref + " is listed for loading before " + b.ref
                            + ", which it stands on");
                }
            }
        }
        for (int i = 0; i < boxes.size(); i++) {
            Box a = boxes.get(i);
            double above = 0;
            for (int j = 0; j < boxes.size(); j++) {
                Box b = boxes.get(j);
                if (i == j) {
                    continue;
                }
                if (j > i && a.overlapsFootprint(b) && a.z0 < b.z1 - EPS && b.z0 < a.z1 - EPS) {
                    errors.add(load.id() + ": crates " + a.ref + " and " + b.ref + " overlap");
                }
                if (a.overlapsFootprint(b) && b.z0 >= a.z1 - EPS) {
                    above += b.mass;
                }
            }
            if (above > 0 && (a.type == null || !a.type.stackable())) {
                errors.add(load.id() + ": crate " + a.ref + " is not stackable but carries " + above + " kg");
            } else if (above > 0 && above > a.type.maxTopLoadKg() + EPS) {
                errors.add(load.id() + ": crate " + a.ref + " carries " + above + " kg over its top load "
                        + a.type.maxTopLoadKg());
            }
            if (a.z0 > EPS && boxes.stream().noneMatch(b -> b != a && Math.abs(b.z1 - a.z0) <= EPS
                    && b.x0 <= a.x0 + EPS && b.y0 <= a.y0 + EPS && b.x1 >= a.x1 - EPS && b.y1 >= a.y1 - EPS)) {
                errors.add(load.id() + ": crate " + a.ref + " does not stand fully on one crate below");
            }
        }
    }

    /** The height stacks may reach: the deck, or the door opening when lower (read here, not from the model). */
    private static double loadHeight(VehicleType type) {
        return type.doorHeightMm() == null ? type.deckHeightMm() : Math.min(type.deckHeightMm(), type.doorHeightMm());
    }

    private static void fail(List<String> errors) {
        if (!errors.isEmpty()) {
            throw new AssertionError("load plan invalid:\n  " + String.join("\n  ",
                    errors.subList(0, Math.min(errors.size(), 30))));
        }
    }
}
