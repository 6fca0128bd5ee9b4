package kitwright.packing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import kitwright.cutting.Deadline;
import kitwright.ids.IdScheme;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;

/**
 * Crating by lanes and rows: joints into boxes ({@link ShelfJointBoxer}), then bundles and boxes into crates
 * ({@link CrateFiller} builds each crate, {@link CrateChoice} picks the crate mix of least total price, then fewest
 * crates). Without prices on every crate type the count alone is minimised. Surplus places of the chosen patterns
 * are left empty, {@link CrateElimination} then empties what crates it can into the others, and each crate moves to
 * the cheapest type that still holds exactly its contents. Crates and joint boxes take the ids of the kit's
 * {@link IdScheme} (CRT-1, BOX-1, ... unless a mark reads like them).
 *
 * <p>Status: OPTIMAL when the count meets the proven count bound and the price meets the price bound
 * ({@link CrateLowerBounds}); else FEASIBLE with the gap. INFEASIBLE when an item fits no crate type, with the
 * reason; FEASIBLE with the reason "stopped by the time limit" when the stage's deadline
 * ({@link Limits#safetySeconds()}), not a work limit, cut a step short. Deterministic: stable ordering, one CP-SAT
 * worker, deterministic work limits.
 */
public final class LaneCratePacker implements CratePacker {
    private static final double EPS = 1e-6;
    /** Crate fillings the elimination of crates may try ({@link CrateElimination}). */
    private static final int ELIMINATION_BUDGET = 400;

    /**
     * Work and time limits of the crating stage.
     *
     * @param deterministicTime CP-SAT deterministic work limit for the crate mix
     * @param safetySeconds     wall-clock safety net of the whole crating stage (one deadline, set when
     *                          {@link #pack} starts, for every loop and solver call) [10, kit.json timeLimitSeconds]
     * @param pricingRounds     column generation rounds
     * @param maxFillings       crate fillings the greedy constructions of the crate mix may spend
     *                          ({@link CrateChoice}; the sample kits take 108-563) [2,000]
     */
    public record Limits(double deterministicTime, double safetySeconds, int pricingRounds, long maxFillings) {
        public static final long FILLINGS = 2_000L;
        public static final Limits DEFAULT = new Limits(1.0, 10.0, 20);

        /** The given limits with the default budget of crate fillings. */
        public Limits(double deterministicTime, double safetySeconds, int pricingRounds) {
            this(deterministicTime, safetySeconds, pricingRounds, FILLINGS);
        }
    }

    private final Limits limits;
    /** The kit's id scheme, or null to choose one from the marks of the bundles and joints packed. */
    private final IdScheme ids;
    private final CrateFiller filler = new CrateFiller();

    public LaneCratePacker() {
        this(Limits.DEFAULT);
    }

    /** Ids that read like none of the marks packed. */
    public LaneCratePacker(Limits limits) {
        this(limits, null);
    }

    /** Crate and joint box ids of the kit's scheme ({@link IdScheme#of}). */
    public LaneCratePacker(Limits limits, IdScheme ids) {
        this.limits = limits;
        this.ids = ids;
    }

    @Override
    public CratePlan pack(List<Bundle> bundles, List<Joint> joints, List<CrateType> crates, JointBox jointBox) {
        return pack(bundles, joints, crates, crates, jointBox);
    }

    /**
     * Crates with the given crate types only, while the bounds and the status stay those of the whole catalog (so a
     * plan of smaller crates, chosen to ride on smaller vehicles, is OPTIMAL only when no crate plan of the catalog
     * costs less).
     *
     * @param usable the crate types the plan may use, a part of {@code catalog}
     */
    public CratePlan pack(List<Bundle> bundles, List<Joint> joints, List<CrateType> catalog, List<CrateType> usable,
                          JointBox jointBox) {
        List<CrateType> crates = usable;
        Deadline deadline = Deadline.in(limits.safetySeconds());
        IdScheme ids = this.ids != null ? this.ids : IdScheme.avoiding(marks(bundles, joints));
        List<JointBoxLoad> boxes;
        try {
            boxes = new ShelfJointBoxer(ids).box(joints, jointBox == null ? JointBox.DEFAULT : jointBox);
        } catch (IllegalArgumentException e) {
            return CratePlan.infeasible(e.getMessage());
        }
        ItemTypes items = ItemTypes.of(bundles, boxes);
        if (items.isEmpty()) {
            return new CratePlan(Status.OPTIMAL, 0, List.of(), boxes, CrateLowerBounds.compute(List.of(), catalog,
                    0, null), null);
        }
        if (crates.isEmpty()) {
            return CratePlan.infeasible("the crate catalog is empty, so nothing can be crated");
        }
        String unfit = unfit(items, crates);
        if (unfit != null) {
            return CratePlan.infeasible(unfit);
        }
        boolean priced = catalog.stream().allMatch(c -> c.price() != null);
        double[] cost = crates.stream().mapToDouble(c -> priced ? c.price() : 1.0).toArray();
        PatternCover cover = new PatternCover(limits.deterministicTime(), deadline);
        List<CrateLayout> layouts = new CrateChoice(cover, limits.pricingRounds(), limits.maxFillings(), deadline)
                .choose(crates, cost, items.types());
        if (layouts.isEmpty()) {
            return CratePlan.infeasible("no crate filling holds every item (check the crate catalog)");
        }
        layouts = downsize(dropSurplus(layouts, items.types(), crates), crates, cost, items.types());
        List<CrateLayout> fewer = new CrateElimination(ELIMINATION_BUDGET, deadline).improve(layouts, crates, cost,
                items.types());
        layouts = downsize(fewer, crates, cost, items.types());
        List<Crate> result = realise(layouts, crates, items, ids);
        Double price = priced ? layouts.stream().mapToDouble(l -> cost[l.crateType()]).sum() : null;
        CrateBounds bounds = CrateLowerBounds.compute(items.types(), catalog, result.size(), price, deadline);
        boolean optimal = result.size() <= bounds.crates()
                && (price == null || price <= bounds.price() + 1e-6 * Math.max(1, price));
        // a step the deadline cut short makes the plan depend on the machine's speed: say so, as cutting does
        return new CratePlan(optimal ? Status.OPTIMAL : Status.FEASIBLE, bounds.crates(), result, boxes, bounds,
                !optimal && deadline.struck() ? Deadline.STOPPED_BY_TIME_LIMIT : null);
    }

    /** The marks of every tube of the bundles and of the joints. */
    private static List<String> marks(List<Bundle> bundles, List<Joint> joints) {
        List<String> marks = new ArrayList<>();
        java.util.ArrayDeque<NestedTube> open = new java.util.ArrayDeque<>();
        bundles.forEach(b -> open.add(b.host()));
        while (!open.isEmpty()) {
            NestedTube t = open.poll();
            marks.add(t.mark());
            open.addAll(t.guests());
        }
        joints.forEach(j -> marks.add(j.mark()));
        return marks;
    }

    /** The first item no crate type can take, as a reason; null when every item fits somewhere. */
    private static String unfit(ItemTypes items, List<CrateType> crates) {
        for (ItemType t : items.types()) {
            boolean fits = crates.stream().anyMatch(c -> fits(t, c));
            if (!fits) {
                String ref = items.refs().get(t.index()).get(0);
                String what = t.kind() == ItemKind.BUNDLE
                        ? String.format(Locale.ROOT, "bundle %s (%.0f mm long, %.1f mm across, %.1f kg)", ref,
                                t.lengthMm(), t.diameterMm(), t.massKg())
                        : String.format(Locale.ROOT, "joint box %s (%.0f x %.0f x %.0f mm, %.1f kg)", ref,
                                t.lengthMm(), t.widthMm(), t.heightMm(), t.massKg());
                return what + " fits no crate type of the catalog (inner size or max gross - tare)";
            }
        }
        return null;
    }

    static boolean fits(ItemType t, CrateType c) {
        if (t.massKg() > c.maxGrossKg() - c.tareKg() + EPS) {
            return false;
        }
        double[] inner = {c.innerLengthMm(), c.innerWidthMm(), c.innerHeightMm()};
        if (t.kind() == ItemKind.BUNDLE) {
            return t.lengthMm() <= inner[0] + EPS && t.diameterMm() <= Math.min(inner[1], inner[2]) + EPS;
        }
        double[] box = {t.lengthMm(), t.widthMm(), t.heightMm()};
        java.util.Arrays.sort(box);
        double[] room = inner.clone();
        java.util.Arrays.sort(room);
        return box[0] <= room[0] + EPS && box[1] <= room[1] + EPS && box[2] <= room[2] + EPS;
    }

    /** Leaves empty the places beyond each item type's demand, from the last crates back. */
    private List<CrateLayout> dropSurplus(List<CrateLayout> layouts, List<ItemType> types,
                                                 List<CrateType> crates) {
        double[] widths = crates.stream().mapToDouble(CrateType::innerWidthMm).toArray();
        int[] surplus = new int[types.size()];
        for (CrateLayout l : layouts) {
            for (int i = 0; i < surplus.length; i++) {
                surplus[i] += l.counts()[i];
            }
        }
        for (ItemType t : types) {
            surplus[t.index()] -= t.demand();
        }
        List<CrateLayout> result = new ArrayList<>(layouts);
        // first only places that nothing rests on, so that what stays keeps its support; then any, from the end
        for (boolean anyPlace : new boolean[] {false, true}) {
            for (int k = result.size() - 1; k >= 0; k--) {
                CrateLayout l = result.get(k);
                List<CrateLayout.Slot> kept = new ArrayList<>(l.slots());
                boolean changed = false;
                boolean again = true;
                while (again) {
                    again = false;
                    for (int s = kept.size() - 1; s >= 0; s--) {
                        int type = kept.get(s).itemType();
                        if (surplus[type] > 0
                                && (anyPlace || Support.bearsNothing(kept, s, types, widths[l.crateType()]))) {
                            surplus[type]--;
                            kept.remove(s);
                            changed = true;
                            again = !anyPlace;
                        }
                    }
                }
                if (changed) {
                    CrateLayout next = relayout(l.crateType(), kept, types);
                    if (anyPlace && !Support.holds(kept, types, widths[l.crateType()])) {
                        next = refit(next, crates, types);
                    }
                    result.set(k, next);
                }
            }
        }
        result.removeIf(CrateLayout::isEmpty);
        return addCratesForMissing(result, crates, types);
    }

    /**
     * A crate whose surplus could only be taken from under other items: filled again with exactly its contents if
     * the filler manages, else what stands of it (the rest goes to {@link #addCratesForMissing}).
     */
    private CrateLayout refit(CrateLayout layout, List<CrateType> crates, List<ItemType> types) {
        int t = layout.crateType();
        for (CrateLayout again : filler.fills(t, crates.get(t), types, layout.counts())) {
            if (java.util.Arrays.equals(again.counts(), layout.counts())) {
                return again;
            }
        }
        return relayout(t, Support.settle(layout.slots(), types, crates.get(t).innerWidthMm()), types);
    }

    /** Items that no layout holds any more (see {@link #refit}) go into further crates, most items per crate. */
    private List<CrateLayout> addCratesForMissing(List<CrateLayout> layouts, List<CrateType> crates,
                                                  List<ItemType> types) {
        int[] missing = types.stream().mapToInt(ItemType::demand).toArray();
        for (CrateLayout l : layouts) {
            for (int i = 0; i < missing.length; i++) {
                missing[i] -= l.counts()[i];
            }
        }
        List<CrateLayout> result = new ArrayList<>(layouts);
        while (java.util.Arrays.stream(missing).anyMatch(n -> n > 0)) {
            CrateLayout best = null;
            for (int t = 0; t < crates.size(); t++) {
                CrateLayout l = filler.fill(t, crates.get(t), types, missing);
                if (!l.isEmpty() && (best == null || l.slots().size() > best.slots().size())) {
                    best = l;
                }
            }
            if (best == null) {
                break;
            }
            for (int i = 0; i < missing.length; i++) {
                missing[i] -= best.counts()[i];
            }
            result.add(best);
        }
        return result;
    }

    private static CrateLayout relayout(int crateType, List<CrateLayout.Slot> slots, List<ItemType> types) {
        int[] counts = new int[types.size()];
        double mass = 0;
        for (CrateLayout.Slot s : slots) {
            counts[s.itemType()]++;
            mass += types.get(s.itemType()).massKg();
        }
        return new CrateLayout(crateType, counts, slots, mass);
    }

    /** Moves each crate's contents into the cheapest crate type that holds all of them. */
    private List<CrateLayout> downsize(List<CrateLayout> layouts, List<CrateType> crates, double[] cost,
                                       List<ItemType> types) {
        List<Integer> byCost = new ArrayList<>();
        for (int t = 0; t < crates.size(); t++) {
            byCost.add(t);
        }
        byCost.sort(Comparator.<Integer>comparingDouble(t -> cost[t]).thenComparingInt(t -> t));
        List<CrateLayout> result = new ArrayList<>();
        for (CrateLayout l : layouts) {
            CrateLayout kept = l;
            for (int t : byCost) {
                if (cost[t] >= cost[l.crateType()] - EPS) {
                    break;
                }
                for (CrateLayout moved : filler.fills(t, crates.get(t), types, l.counts())) {
                    if (kept == l && java.util.Arrays.equals(moved.counts(), l.counts())) {
                        kept = moved;
                    }
                }
                if (kept != l) {
                    break;
                }
            }
            result.add(kept);
        }
        result.sort(Comparator.comparingInt(CrateLayout::crateType));
        return result;
    }

    /** Concrete crates: each place takes the next item of its type, in input order. */
    private static List<Crate> realise(List<CrateLayout> layouts, List<CrateType> crates, ItemTypes items,
                                       IdScheme ids) {
        int[] next = new int[items.types().size()];
        List<Crate> result = new ArrayList<>();
        for (CrateLayout l : layouts) {
            List<CrateItem> placed = new ArrayList<>();
            for (CrateLayout.Slot s : l.slots()) {
                ItemType t = items.types().get(s.itemType());
                String ref = items.refs().get(t.index()).get(next[t.index()]++);
                placed.add(new CrateItem(t.kind(), ref, s.x(), s.y(), s.z(), s.length(), s.width(), s.height(),
                        t.massKg()));
            }
            result.add(Crate.of(ids.crate(result.size() + 1), crates.get(l.crateType()), placed));
        }
        return result;
    }
}
