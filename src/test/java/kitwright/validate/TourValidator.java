package kitwright.validate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.model.Bar;
import kitwright.model.Joint;
import kitwright.model.Kit;
import kitwright.model.Section;
import kitwright.model.Status;
import kitwright.model.StructureCount;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;
import kitwright.packing.Crate;
import kitwright.packing.CrateItem;
import kitwright.packing.ItemKind;
import kitwright.packing.JointBoxLoad;
import kitwright.tour.Leg;
import kitwright.tour.LegShipment;
import kitwright.tour.TourPlan;

/**
 * Re-checks a tour's legs from first principles, from the kit's tour and structures rows alone:
 * <ul>
 *   <li>n structures give n + 1 legs: the depot to the first venue, each venue to the next, the last back to the
 *   depot, each leg shipping the structure it arrives for (the last leg the last structure);</li>
 *   <li>each leg's bundles hold exactly its structure's bars, as pieces with the fit rule's sizes
 *   ({@link NestPlanValidator}); its crates ({@link CratePlanValidator}) and loads ({@link LoadPlanValidator},
 *   with the balance and axle checks) are valid for those bundles and for its joints: the structure's joint rows
 *   (at most joints.csv's quantity), or every joint of the kit when its rows name none;</li>
 *   <li>counted again through the crates (bundles' tubes and boxes' joints, by mark), each leg's crates hold exactly
 *   those bars and joints, every bundle and box in one crate, every crate on one vehicle;</li>
 *   <li>legs that say they share a shipment have structures with the same rows, and the same plans.</li>
 * </ul>
 * A leg without a plan must say why and hold no crates. Throws an AssertionError naming what is wrong.
 */
public final class TourValidator {
    private TourValidator() {
    }

    public static void validate(Kit kit, TourPlan tour) {
        List<String> stops = kit.settings().tour();
        List<Leg> legs = tour.legs();
        check(legs.size() == stops.size() + 1, stops.size() + " structures need " + (stops.size() + 1) + " legs, got "
                + legs.size());
        for (int i = 0; i < legs.size(); i++) {
            Leg leg = legs.get(i);
            String from = i == 0 ? TourPlan.DEPOT : stops.get(i - 1);
            String to = i == stops.size() ? TourPlan.DEPOT : stops.get(i);
            String structure = stops.get(Math.min(i, stops.size() - 1));
            check(leg.number() == i + 1 && leg.from().equals(from) && leg.to().equals(to)
                    && leg.structure().equals(structure), "leg " + (i + 1) + " runs " + from + " -> " + to + " with "
                    + structure + ", got leg " + leg.number() + " " + leg.from() + " -> " + leg.to() + " with "
                    + leg.structure());
            Leg first = legs.get(leg.sameAs() - 1);
            check(rows(kit, first.structure()).equals(rows(kit, structure)), "leg " + leg.number() + " shares leg "
                    + first.number() + "'s shipment, but their structures differ");
            check(first.shipment().equals(leg.shipment()), "leg " + leg.number() + " has the plan of leg "
                    + first.number());
            for (Leg earlier : legs.subList(0, i)) {
                check(!rows(kit, earlier.structure()).equals(rows(kit, structure)) || leg.sameAs() == earlier.sameAs(),
                        "leg " + leg.number() + " ships what leg " + earlier.number() + " ships but plans it again");
            }
            shipment(kit, leg, leg.shipment());
        }
    }

    private static void shipment(Kit kit, Leg leg, LegShipment s) {
        String name = "leg " + leg.number();
        if (s.status() == Status.INFEASIBLE) {
            check(s.reason() != null && !s.reason().isBlank(), name + ": no plan needs a reason");
            check(s.crates().crates().isEmpty() && s.loads().vehicles().isEmpty(), name + ": no plan, no crates");
            return;
        }
        Map<String, Integer> bars = new TreeMap<>();
        List<NestPlanValidator.Piece> pieces = new ArrayList<>();
        for (StructureCount row : kit.structures()) {
            Bar bar = kit.bars().stream().filter(b -> b.mark().equals(row.mark())).findFirst().orElse(null);
            if (!row.structure().equals(leg.structure()) || bar == null) {
                continue;
            }
            bars.merge(bar.mark(), row.count(), Integer::sum);
            Section section = kit.catalog().section(bar.section()).orElseThrow();
            double[] sizes = NestPlanValidator.sizes(section, kit.settings().nestTolerance());
            double perMetre = kit.material(section).map(m -> Math.PI * (section.outerDiameterMm()
                    - section.wallMm()) * section.wallMm() * m.densityKgM3() * 1e-6).orElse(0.0);
            for (int k = 0; k < row.count(); k++) {
                pieces.add(new NestPlanValidator.Piece(bar.mark(), sizes[0], sizes[1], bar.lengthMm(),
                        perMetre * bar.lengthMm() / 1000));
            }
        }
        var settings = kit.settings();
        NestPlanValidator.validate(pieces, settings.nestClearanceMm(), settings.nestEndAllowanceMm(),
                settings.maxBundleMassKg(), s.nesting().plan());
        List<Joint> joints = joints(kit, leg.structure());
        List<Bundle> bundles = s.nesting().plan().bundles();
        CratePlanValidator.check(s.crates(), bundles, joints, kit.crates(), settings.jointBox());
        LoadPlanValidator.check(s.loads(), s.crates(), kit.crates(), kit.vehicles());

        Map<String, Bundle> bundleById = new HashMap<>();
        bundles.forEach(b -> bundleById.put(b.id(), b));
        Map<String, JointBoxLoad> boxById = new HashMap<>();
        s.crates().boxes().forEach(b -> boxById.put(b.id(), b));
        Map<String, Integer> crated = new TreeMap<>();
        Map<String, Integer> itemTimes = new TreeMap<>();
        for (Crate c : s.crates().crates()) {
            for (CrateItem item : c.items()) {
                itemTimes.merge(item.kind() + " " + item.ref(), 1, Integer::sum);
                if (item.kind() == ItemKind.BUNDLE) {
                    tubes(bundleById.get(item.ref()).host(), crated);
                } else {
                    boxById.get(item.ref()).joints().forEach(j -> crated.merge(j.mark(), j.count(), Integer::sum));
                }
            }
        }
        check(itemTimes.size() == bundles.size() + s.crates().boxes().size()
                && itemTimes.values().stream().allMatch(n -> n == 1), name + ": every bundle and box in one crate");
        Map<String, Integer> expected = new TreeMap<>(bars);
        joints.forEach(j -> expected.merge(j.mark(), j.quantity(), Integer::sum));
        check(crated.equals(expected), name + ": the crates hold " + crated + ", the structure needs " + expected);
        Map<String, Integer> loaded = new TreeMap<>();
        s.loads().vehicles().forEach(v -> v.crates().forEach(p -> loaded.merge(p.ref(), 1, Integer::sum)));
        check(loaded.size() == s.crates().crates().size() && loaded.values().stream().allMatch(n -> n == 1),
                name + ": every crate on one vehicle");
    }

    /** The structure's joints: its joint rows up to joints.csv's quantity, or every joint when it has none. */
    static List<Joint> joints(Kit kit, String structure) {
        List<Joint> rows = new ArrayList<>();
        for (Joint j : kit.joints()) {
            kit.structures().stream().filter(c -> c.structure().equals(structure) && c.mark().equals(j.mark()))
                    .findFirst().ifPresent(c -> rows.add(new Joint(j.mark(), j.diameterMm(), j.massKg(),
                            Math.min(c.count(), j.quantity()))));
        }
        return rows.isEmpty() ? kit.joints() : rows;
    }

    private static Map<String, Integer> rows(Kit kit, String structure) {
        Map<String, Integer> rows = new TreeMap<>();
        kit.structures().stream().filter(c -> c.structure().equals(structure))
                .forEach(c -> rows.merge(c.mark(), c.count(), Integer::sum));
        return rows;
    }

    private static void tubes(NestedTube tube, Map<String, Integer> marks) {
        marks.merge(tube.mark(), 1, Integer::sum);
        tube.guests().forEach(g -> tubes(g, marks));
    }

    private static void check(boolean ok, String what) {
        if (!ok) {
            throw new AssertionError("tour: " + what);
        }
    }
}
