package kitwright.validate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.packing.Crate;
import kitwright.packing.CrateItem;
import kitwright.packing.CratePlan;
import kitwright.packing.ItemKind;
import kitwright.packing.JointBoxLoad;
import kitwright.packing.JointCount;

/**
 * Re-checks a crate plan from first principles, independently of how it was made:
 * <ul>
 *   <li>every joint is in exactly one joint box, each box within its mass limit and its joints' d x d x d cells
 *   within its volume, no joint wider than the box;</li>
 *   <li>every bundle and every joint box is in exactly one crate, with its own size and mass;</li>
 *   <li>each crate matches its catalog type, its gross mass is tare + contents and within max gross;</li>
 *   <li>every item lies inside the inner walls (length, width and height);</li>
 *   <li>no two items overlap where their lengths overlap: bundles by their circles (centres at least the sum of
 *   the radii apart), anything with a box by bounding boxes;</li>
 *   <li>support (dunnage is not modelled, so it comes from the floor or from items): every item whose bottom
 *   is above the crate floor (z &gt; 1 mm) rests on items below. The bearing items of an item are those whose top
 *   is at its bottom (within {@value #TOUCH} mm). A box needs bearing items under the centre of its footprint and
 *   under at least {@value #BOX_SHARE} of its footprint area (bounding rectangles). A bundle, a cylinder lying
 *   along x, needs support at every x along its length: a bearing item whose y range overlaps its axis band
 *   (axis y &plusmn; d/4), or bundles of the row below that its circle touches (centres the sum of the radii
 *   apart within {@value #TOUCH} mm, lower than its own), one on each side of its axis or one right under it,
 *   as a bundle lies in a square or staggered row; or on one side only when the crate wall or the side of a
 *   box on the other side is nearer than the contact's slack (sum of radii - lateral offset), so that it
 *   catches the bundle before it rolls off;</li>
 *   <li>the lower bound does not exceed the number of crates.</li>
 * </ul>
 * Throws AssertionError listing every violation found.
 */
public final class CratePlanValidator {
    private static final double EPS = 1e-6;
    /** Tolerance of contact, mm: a top within this of a bottom bears it. */
    static final double TOUCH = 1.0;
    /** Least share of a box's footprint that must rest on bearing items. */
    static final double BOX_SHARE = 0.5;

    /**
     * The items of one crate layout (width {@code innerWidthMm}) that stand neither on the floor nor, by the support
     * rule above, on the other items; empty when every item is supported.
     */
    public static List<CrateItem> unsupported(List<CrateItem> items, double innerWidthMm) {
        return items.stream().filter(i -> i.zMm() > TOUCH
                && !SupportRule.supported(i, items, innerWidthMm, TOUCH, BOX_SHARE)).toList();
    }

    private CratePlanValidator() {
    }

    public static void check(CratePlan plan, List<Bundle> bundles, List<Joint> joints, List<CrateType> catalog,
                             JointBox jointBox) {
        List<String> errors = new ArrayList<>();
        if (plan.status() == Status.INFEASIBLE) {
            errors.add("plan is INFEASIBLE: " + plan.reason());
            fail(errors);
        }
        checkBoxes(plan.boxes(), joints, jointBox, errors);
        Map<String, Bundle> bundleById = new HashMap<>();
        for (Bundle b : bundles) {
            if (bundleById.put(b.id(), b) != null) {
                errors.add("input has bundle id " + b.id() + " twice");
            }
        }
        Map<String, JointBoxLoad> boxById = new HashMap<>();
        plan.boxes().forEach(x -> boxById.put(x.id(), x));
        Map<String, Integer> seen = new HashMap<>();
        Map<String, Integer> crateIds = new HashMap<>();
        for (Crate c : plan.crates()) {
            crateIds.merge(c.id(), 1, Integer::sum);
            checkCrate(c, catalog, bundleById, boxById, seen, errors);
        }
        crateIds.forEach((id, n) -> {
            if (n > 1) {
                errors.add("crate id " + id + " appears " + n + " times");
            }
        });
        for (Bundle b : bundles) {
            int n = seen.getOrDefault("bundle:" + b.id(), 0);
            if (n != 1) {
                errors.add("bundle " + b.id() + " is in " + n + " crates (expected exactly 1)");
            }
        }
        for (JointBoxLoad x : plan.boxes()) {
            int n = seen.getOrDefault("box:" + x.id(), 0);
            if (n != 1) {
                errors.add("joint box " + x.id() + " is in " + n + " crates (expected exactly 1)");
            }
        }
        if (plan.lowerBound() > plan.crates().size()) {
            errors.add("lower bound " + plan.lowerBound() + " exceeds the " + plan.crates().size() + " crates");
        }
        fail(errors);
    }

    private static void checkBoxes(List<JointBoxLoad> boxes, List<Joint> joints, JointBox spec,
                                   List<String> errors) {
        Map<String, Integer> packed = new HashMap<>();
        for (JointBoxLoad x : boxes) {
            double mass = 0;
            double cells = 0;
            for (JointCount j : x.joints()) {
                packed.merge(j.mark(), j.count(), Integer::sum);
                mass += j.massKg();
                cells += j.count() * Math.pow(j.diameterMm(), 3);
                if (j.diameterMm() > Math.min(spec.lengthMm(), Math.min(spec.widthMm(), spec.heightMm())) + EPS) {
                    errors.add("box " + x.id() + ": joint " + j.mark() + " is wider than the box");
                }
            }
            if (Math.abs(mass - x.massKg()) > EPS) {
                errors.add("box " + x.id() + ": mass " + x.massKg() + " is not the joints' " + mass);
            }
            if (mass > spec.maxMassKg() + EPS) {
                errors.add("box " + x.id() + ": " + mass + " kg over the limit " + spec.maxMassKg());
            }
            if (cells > spec.lengthMm() * spec.widthMm() * spec.heightMm() + EPS) {
                errors.add("box " + x.id() + ": joint cells exceed the box volume");
            }
            if (x.lengthMm() != spec.lengthMm() || x.widthMm() != spec.widthMm() || x.heightMm() != spec.heightMm()) {
                errors.add("box " + x.id() + ": size differs from the joint box");
            }
        }
        for (Joint j : joints) {
            int n = packed.getOrDefault(j.mark(), 0);
            if (n != j.quantity()) {
                errors.add("joint " + j.mark() + ": " + n + " boxed, " + j.quantity() + " in the kit");
            }
        }
    }

    private static void checkCrate(Crate c, List<CrateType> catalog, Map<String, Bundle> bundles,
                                   Map<String, JointBoxLoad> boxes, Map<String, Integer> seen, List<String> errors) {
        CrateType type = catalog.stream().filter(t -> t.name().equals(c.type())).findFirst().orElse(null);
        if (type == null) {
            errors.add(c.id() + ": unknown crate type " + c.type());
            return;
        }
        double[] mine = {c.innerLengthMm(), c.innerWidthMm(), c.innerHeightMm(), c.outerLengthMm(),
            c.outerWidthMm(), c.outerHeightMm(), c.tareKg(), c.maxGrossKg()};
        double[] cat = {type.innerLengthMm(), type.innerWidthMm(), type.innerHeightMm(), type.outerLengthMm(),
            type.outerWidthMm(), type.outerHeightMm(), type.tareKg(), type.maxGrossKg()};
        if (!Arrays.equals(mine, cat)) {
            errors.add(c.id() + ": dimensions or limits differ from crate type " + type.name());
        }
        double contents = 0;
        for (CrateItem i : c.items()) {
            contents += i.massKg();
            seen.merge(i.kind().code() + ":" + i.ref(), 1, Integer::sum);
            checkItemSource(c, i, bundles, boxes, errors);
            if (i.xMm() < -EPS || i.yMm() < -EPS || i.zMm() < -EPS
                    || i.xMm() + i.lengthMm() > type.innerLengthMm() + EPS
                    || i.yMm() + i.widthMm() > type.innerWidthMm() + EPS
                    || i.zMm() + i.heightMm() > type.innerHeightMm() + EPS) {
                errors.add(c.id() + ": " + i.ref() + " is outside the inner walls");
            }
        }
        if (Math.abs(c.grossKg() - (type.tareKg() + contents)) > 1e-6 * Math.max(1, c.grossKg())) {
            errors.add(c.id() + ": gross " + c.grossKg() + " kg is not tare + contents " + (type.tareKg() + contents));
        }
        if (type.tareKg() + contents > type.maxGrossKg() + EPS) {
            errors.add(c.id() + ": gross " + (type.tareKg() + contents) + " kg over max " + type.maxGrossKg());
        }
        checkOverlaps(c, errors);
        for (CrateItem i : c.items()) {
            if (i.zMm() > TOUCH && !SupportRule.supported(i, c.items(), type.innerWidthMm(), TOUCH, BOX_SHARE)) {
                errors.add(c.id() + ": " + i.ref() + " is not supported (floats at z = "
                        + Math.round(i.zMm()) + " mm)");
            }
        }
    }

    private static void checkItemSource(Crate c, CrateItem i, Map<String, Bundle> bundles,
                                        Map<String, JointBoxLoad> boxes, List<String> errors) {
        if (i.kind() == ItemKind.BUNDLE) {
            Bundle b = bundles.get(i.ref());
            if (b == null) {
                errors.add(c.id() + ": unknown bundle " + i.ref());
            } else if (i.lengthMm() != b.lengthMm() || i.widthMm() != b.envelopeDiameterMm()
                    || i.heightMm() != b.envelopeDiameterMm() || i.massKg() != b.massKg()) {
                errors.add(c.id() + ": bundle " + i.ref() + " has another size or mass than the nesting plan");
            }
        } else {
            JointBoxLoad x = boxes.get(i.ref());
            if (x == null) {
                errors.add(c.id() + ": unknown joint box " + i.ref());
                return;
            }
            double[] a = {i.lengthMm(), i.widthMm(), i.heightMm()};
            double[] b = {x.lengthMm(), x.widthMm(), x.heightMm()};
            Arrays.sort(a);
            Arrays.sort(b);
            if (!Arrays.equals(a, b) || i.massKg() != x.massKg()) {
                errors.add(c.id() + ": joint box " + i.ref() + " has another size or mass");
            }
        }
    }

    /** Sweep along x: items whose lengths overlap must be apart across the section. */
    private static void checkOverlaps(Crate c, List<String> errors) {
        List<CrateItem> items = new ArrayList<>(c.items());
        items.sort(Comparator.comparingDouble(CrateItem::xMm));
        for (int a = 0; a < items.size(); a++) {
            CrateItem p = items.get(a);
            for (int b = a + 1; b < items.size() && items.get(b).xMm() < p.endXMm() - EPS; b++) {
                CrateItem q = items.get(b);
                if (overlap(p, q)) {
                    errors.add(c.id() + ": " + p.ref() + " and " + q.ref() + " overlap");
                }
            }
        }
    }

    private static boolean overlap(CrateItem p, CrateItem q) {
        if (p.kind() == ItemKind.BUNDLE && q.kind() == ItemKind.BUNDLE) {
            double dy = (p.yMm() + p.widthMm() / 2) - (q.yMm() + q.widthMm() / 2);
            double dz = (p.zMm() + p.heightMm() / 2) - (q.zMm() + q.heightMm() / 2);
            double reach = (p.widthMm() + q.widthMm()) / 2;
            return dy * dy + dz * dz < reach * reach - 1e-6 * reach;
        }
        return p.yMm() < q.yMm() + q.widthMm() - EPS && q.yMm() < p.yMm() + p.widthMm() - EPS
                && p.zMm() < q.zMm() + q.heightMm() - EPS && q.zMm() < p.zMm() + p.heightMm() - EPS;
    }

    private static void fail(List<String> errors) {
        if (!errors.isEmpty()) {
            throw new AssertionError("crate plan invalid:\n  " + String.join("\n  ",
                    errors.subList(0, Math.min(errors.size(), 30))));
        }
    }
}
