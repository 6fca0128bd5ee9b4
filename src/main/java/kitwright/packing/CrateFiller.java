package kitwright.packing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.TreeSet;
import kitwright.model.CrateType;

/**
 * Fills one crate of a given type from the items on offer, building its layout from the floor up.
 *
 * <ol>
 *   <li>Bundles are offered largest diameter first, then longest first, up to what the crate could hold by cells,
 *   length and mass.</li>
 *   <li>{@link LaneBuilder} puts them into lanes along the crate length by best-fit decreasing; a lane's cell is
 *   its first (largest) bundle's diameter, thinner bundles fill its far end.</li>
 *   <li>Lanes go into the cross-section in row groups, largest cells first. A group has one cell diameter and the
 *   better of {@link RowPattern#SQUARE} and {@link RowPattern#STAGGERED} for the lanes it is to hold (fewest rows
 *   for all of them, or most lanes when they do not all fit); lanes at least {@value #MERGE} of the group's cell
 *   join it, thinner ones start a group on top or take a free cell left in a row below. Of one cell, the lanes
 *   that bear longest go lowest; a bundle thinner than its cell is let down onto what is under it. A lane that
 *   would pass the crate's net capacity (max gross - tare) is cut short.</li>
 *   <li>Joint boxes fill the end of the crate behind the longest lane, then the space above the top row, in the
 *   box orientation that holds most. When both bundles and boxes are on offer, two more layouts put the boxes
 *   first: in as few full tiers on the floor as hold them, with the lanes above; or in stacks in the narrowest
 *   strip along the left wall that holds them, with the lanes from the floor beside it. The caller chooses.</li>
 *   <li>{@link Support#settle} keeps, from the floor up, only the items that rest on items below.</li>
 * </ol>
 * Guarantee: every item lies inside the inner walls, circles of bundles that share a stretch of length do not
 * overlap (they sit on separate cells), boxes and lanes occupy disjoint regions, every item above the floor is
 * supported ({@link Support}), and the contents' mass is within the net capacity. Not a proof of the best filling: a constructive heuristic, fast enough to be called for every
 * crate type at every step of the crate choice.
 */
final class CrateFiller {
    /** Lanes at least this fraction of a group's cell diameter join the group rather than start a new one. */
    static final double MERGE = 0.9;
    private static final double EPS = 1e-6;

    /**
     * The layouts of one crate of {@code crate} (catalog index {@code crateIndex}) from {@code available}: lanes
     * first with boxes in the space left; and, when both bundles and boxes are on offer, the boxes' floor tiers
     * first with lanes above. The caller keeps the one that suits it.
     */
    List<CrateLayout> fills(int crateIndex, CrateType crate, List<ItemType> types, int[] available) {
        CrateLayout rows = build(crateIndex, crate, types, available, Start.LANES, Placing.ROW_GROUPS);
        CrateLayout skyline = build(crateIndex, crate, types, available, Start.LANES, Placing.SKYLINE);
        boolean boxes = types.stream().anyMatch(t -> t.kind() == ItemKind.BOX && available[t.index()] > 0);
        boolean bundles = types.stream().anyMatch(t -> t.kind() == ItemKind.BUNDLE && available[t.index()] > 0);
        List<CrateLayout> result = new ArrayList<>(List.of(rows));
        if (!java.util.Arrays.equals(skyline.counts(), rows.counts())) {
            result.add(skyline);
        }
        if (boxes && bundles) {
            result.add(build(crateIndex, crate, types, available, Start.BOX_TIERS, Placing.ROW_GROUPS));
            result.add(build(crateIndex, crate, types, available, Start.BOX_COLUMN, Placing.ROW_GROUPS));
        }
        return List.copyOf(result);
    }

    /**
     * The lanes-first layout (see {@link #fills}), lanes in row groups or on the skyline, whichever holds more
     * bounding-box volume (then more mass).
     */
    CrateLayout fill(int crateIndex, CrateType crate, List<ItemType> types, int[] available) {
        CrateLayout rows = build(crateIndex, crate, types, available, Start.LANES, Placing.ROW_GROUPS);
        CrateLayout skyline = build(crateIndex, crate, types, available, Start.LANES, Placing.SKYLINE);
        double gain = skyline.volume(types) - rows.volume(types);
        return gain > EPS || (Math.abs(gain) <= EPS && skyline.massKg() > rows.massKg() + EPS) ? skyline : rows;
    }

    /** What goes in first: lanes from the floor; boxes in floor tiers; boxes in a column along one side wall. */
    private enum Start { LANES, BOX_TIERS, BOX_COLUMN }

    /**
     * How lanes go into the cross-section: in row groups of one diameter, square or staggered, thinner lanes taking
     * cells left free; or square on the skyline of what is already placed ({@link SkylineLanes}), which holds
     * mixed diameters and lengths better where the row groups leave holes.
     */
    private enum Placing { ROW_GROUPS, SKYLINE }

    private CrateLayout build(int crateIndex, CrateType crate, List<ItemType> types, int[] available, Start start,
                              Placing placing) {
        double length = crate.innerLengthMm();
        double width = crate.innerWidthMm();
        double height = crate.innerHeightMm();
        double net = crate.maxGrossKg() - crate.tareKg();
        int[] counts = new int[types.size()];
        List<CrateLayout.Slot> slots = new ArrayList<>();
        double[] mass = {0};
        int[] left = available.clone();
        double floor = start == Start.BOX_TIERS ? floorTiers(crate, types, left, net, mass, counts, slots) : 0;
        double side = start == Start.BOX_COLUMN ? boxColumn(crate, types, left, net, mass, counts, slots) : 0;
        List<LaneBuilder.Lane> lanes = new ArrayList<>(new LaneBuilder().build(
                offeredBundles(crate, types, left, net - mass[0]), length));
        // widest cells first, and of a cell the lanes that bear longest lowest, so that upper lanes lie on lower
        // ones; on the skyline the lanes that bear longest go first whatever their cell
        Comparator<LaneBuilder.Lane> widest = Comparator.comparingDouble(LaneBuilder.Lane::cellMm).reversed();
        Comparator<LaneBuilder.Lane> bearing = Comparator.comparingDouble(CrateFiller::bearingLength).reversed();
        lanes.sort((placing == Placing.SKYLINE ? bearing.thenComparing(widest) : widest.thenComparing(bearing))
                .thenComparing(Comparator.comparingDouble(LaneBuilder.Lane::lengthMm).reversed()));
        double[] used = placing == Placing.SKYLINE && floor <= EPS
                ? SkylineLanes.place(lanes, types, side, length, width, height, net, mass, counts, slots, left)
                : placeLanes(lanes, types, side, length, width, floor, height, net, mass, counts, slots);
        placeBoxes(crate, types, left, net, floor, side, used[0], used[1], mass, counts, slots);
        List<CrateLayout.Slot> standing = Support.settle(slots, types, width);
        int[] kept = new int[types.size()];
        double keptMass = 0;
        for (CrateLayout.Slot s : standing) {
            kept[s.itemType()]++;
            keptMass += types.get(s.itemType()).massKg();
        }
        return new CrateLayout(crateIndex, kept, standing, keptMass);
    }

    /** Length from x = 0 over which a lane is as wide as its cell (thinner bundles at its far end bear less). */
    private static double bearingLength(LaneBuilder.Lane lane) {
        double length = 0;
        for (ItemType t : lane.items()) {
            if (t.diameterMm() < lane.cellMm() - Support.TOUCH / 2) {
                break;
            }
            length += t.lengthMm();
        }
        return length;
    }

    /**
     * Boxes in full-height stacks in the narrowest strip along the left wall (y from 0) that holds every box on
     * offer (or the whole width); returns the strip's width, where the lanes begin.
     */
    private static double boxColumn(CrateType crate, List<ItemType> types, int[] left, double net, double[] mass,
                                    int[] counts, List<CrateLayout.Slot> slots) {
        List<ItemType> boxes = types.stream().filter(t -> t.kind() == ItemKind.BOX && left[t.index()] > 0).toList();
        int wanted = boxes.stream().mapToInt(t -> left[t.index()]).sum();
        ItemType box = boxes.get(0);
        double width = crate.innerWidthMm();
        TreeSet<Double> strips = new TreeSet<>();
        for (double dim : new double[] {box.lengthMm(), box.widthMm(), box.heightMm()}) {
            for (int k = 1; k * dim <= width + EPS; k++) {
                strips.add(k * dim);
            }
        }
        double strip = width;
        for (double w : strips) {
            if (BoxGrid.capacity(crate.innerLengthMm(), w, crate.innerHeightMm(), box) >= wanted) {
                strip = w;
                break;
            }
        }
        BoxGrid.fill(0, 0, 0, crate.innerLengthMm(), strip, crate.innerHeightMm(), boxes, left, net, mass, counts,
                slots);
        return strip;
    }

    /** Tiers of boxes on the crate floor, as few as hold every box on offer; returns their height. */
    private static double floorTiers(CrateType crate, List<ItemType> types, int[] left, double net, double[] mass,
                                     int[] counts, List<CrateLayout.Slot> slots) {
        List<ItemType> boxes = types.stream().filter(t -> t.kind() == ItemKind.BOX && left[t.index()] > 0).toList();
        int wanted = boxes.stream().mapToInt(t -> left[t.index()]).sum();
        ItemType box = boxes.get(0);
        double tier = Math.min(box.lengthMm(), Math.min(box.widthMm(), box.heightMm()));
        int tiers = 1;
        while ((tiers + 1) * tier <= crate.innerHeightMm() + EPS
                && BoxGrid.capacity(crate.innerLengthMm(), crate.innerWidthMm(), tiers * tier, box) < wanted) {
            tiers++;
        }
        int before = slots.size();
        BoxGrid.fill(0, 0, 0, crate.innerLengthMm(), crate.innerWidthMm(), tiers * tier, boxes, left, net, mass,
                counts, slots);
        double top = 0;
        for (int k = before; k < slots.size(); k++) {
            top = Math.max(top, slots.get(k).z() + slots.get(k).height());
        }
        return top;
    }

    /** Bundles offered to this crate, largest diameter and longest first, bounded by cells, length and mass. */
    private static List<ItemType> offeredBundles(CrateType crate, List<ItemType> types, int[] available, double net) {
        double length = crate.innerLengthMm();
        double width = crate.innerWidthMm();
        double height = crate.innerHeightMm();
        List<ItemType> bundles = types.stream()
                .filter(t -> t.kind() == ItemKind.BUNDLE && available[t.index()] > 0)
                .filter(t -> t.lengthMm() <= length + EPS && t.diameterMm() <= Math.min(width, height) + EPS)
                .sorted(Comparator.comparingDouble(ItemType::diameterMm).reversed()
                        .thenComparing(Comparator.comparingDouble(ItemType::lengthMm).reversed())
                        .thenComparingInt(ItemType::index))
                .toList();
        double volumeCap = length * width * height;
        double volume = 0;
        double mass = 0;
        List<ItemType> offered = new ArrayList<>();
        for (ItemType t : bundles) {
            double d = t.diameterMm();
            long cells = Math.max(RowPattern.SQUARE.capacity(width, height, d),
                    RowPattern.STAGGERED.capacity(width, height, d));
            long cap = Math.min(available[t.index()], cells * RowPattern.floor(length / t.lengthMm()));
            for (long k = 0; k < cap && volume <= volumeCap; k++) {
                if (mass + t.massKg() > net + EPS) {
                    break;
                }
                offered.add(t);
                mass += t.massKg();
                volume += t.lengthMm() * d * d * RowPattern.ROW_PITCH;
            }
        }
        return offered;
    }

    /**
     * Places lanes into row groups, from y0 to the crate's inner width; returns {end of the longest lane, top of
     * the rows}. A lane above the floor goes in only as far along as what is under it bears it ({@link Support});
     * the rest of it goes back among the lanes still to place, as a lane of its own.
     */
    private static double[] placeLanes(List<LaneBuilder.Lane> sorted, List<ItemType> types, double y0,
                                       double length, double crateWidth, double floor, double height, double net, double[] mass,
                                       int[] counts, List<CrateLayout.Slot> slots) {
        double width = crateWidth - y0;
        List<LaneBuilder.Lane> lanes = new ArrayList<>(sorted);
        // lanes put back and not placed yet, in the order put back
        List<LaneBuilder.Lane> requeued = new ArrayList<>();
        if (width <= EPS) {
            return new double[] {0, floor};
        }
        double base = floor;
        RowGroup current = null;
        List<RowGroup.Cell> free = new ArrayList<>();
        double endX = 0;
        for (int k = 0; k < lanes.size(); k++) {
            LaneBuilder.Lane lane = lanes.get(k);
            requeued.removeIf(l -> l == lane);
            double d = lane.cellMm();
            if (mass[0] + lane.lightestKg() > net + EPS) {
                continue;
            }
            RowGroup.Cell cell = null;
            if (current != null && current.hasRoomInOpenRow()) {
                cell = current.next();
            } else if (current != null && d >= MERGE * current.d - EPS && current.canOpenRow()) {
                cell = current.next();
            } else {
                cell = takeFree(free, d);
                if (cell == null) {
                    if (current != null) {
                        base += current.heightUsed();
                        free.addAll(current.unusedInOpenRows());
                        current = null;
                    }
                    if (height - base + EPS >= d) {
                        current = RowGroup.open(lanes, k, width, height - base, base);
                        cell = current.next();
                    }
                }
            }
            if (cell == null) {
                continue;
            }
            double x = 0;
            List<ItemType> items = lane.items();
            for (int i = 0; i < items.size(); i++) {
                ItemType t = items.get(i);
                if (mass[0] + t.massKg() > net + EPS) {
                    continue;
                }
                double r = t.diameterMm() / 2;
                double z = t.diameterMm() < cell.d() - EPS
                        ? settle(x, t.lengthMm(), y0 + cell.y(), r, cell.z() - cell.d() / 2 + r, slots, types)
                        : cell.z();
                CrateLayout.Slot slot = new CrateLayout.Slot(t.index(), x, y0 + cell.y() - r, z - r, t.lengthMm(),
                        t.diameterMm(), t.diameterMm());
                if (slot.z() > Support.TOUCH && !Support.supported(slot, slots, types, crateWidth)) {
                    requeue(lanes, k, new LaneBuilder.Lane(items.get(i).diameterMm(),
                            List.copyOf(items.subList(i, items.size()))), length, requeued);
                    break;
                }
                mass[0] += t.massKg();
                counts[t.index()]++;
                slots.add(slot);
                x += t.lengthMm();
                if (z - r < cell.z() - cell.d() / 2 - EPS) {
                    // it came down through a hole below its cell: the free cells it now fills are taken
                    double axisY = cell.y();
                    free.removeIf(f -> Math.hypot(f.y() - axisY, f.z() - z) < (f.d() + t.diameterMm()) / 2 - EPS);
                }
            }
            endX = Math.max(endX, x);
        }
        double top = base + (current == null ? 0 : current.heightUsed());
        return new double[] {endX, top};
    }

    /**
     * Centre height at which a bundle thinner than its cell comes to rest when let down from the bottom of its
     * cell (centre {@code from}) onto the items already placed under it, or onto the floor.
     */
    private static double settle(double x, double length, double axisY, double r, double from,
                                 List<CrateLayout.Slot> slots, List<ItemType> types) {
        double rest = r;
        for (CrateLayout.Slot s : slots) {
            if (s.x() >= x + length - EPS || x >= s.x() + s.length() - EPS) {
                continue;
            }
            boolean bundle = types.get(s.itemType()).kind() == ItemKind.BUNDLE;
            double sy = s.y() + s.width() / 2;
            double sz = s.z() + s.height() / 2;
            if (bundle && sz < from - EPS) {
                double reach = r + s.width() / 2;
                double dy = Math.abs(sy - axisY);
                if (dy < reach) {
                    rest = Math.max(rest, sz + Math.sqrt(reach * reach - dy * dy));
                }
            } else if (!bundle && s.z() + s.height() <= from - r + EPS && s.y() < axisY + r
                    && axisY - r < s.y() + s.width()) {
                rest = Math.max(rest, s.z() + s.height() + r);
            }
        }
        return Math.min(rest, from);
    }

    /**
     * Puts what is left of a lane cut short back among the lanes after position k, before the first lane with a
     * smaller cell, so it keeps the widest-first order; or joins the end of a lane so put back before, of the same
     * cell, when both fit the crate length together. Every lane placed takes a cell and cells are never given
     * back, so placing ends.
     */
    private static void requeue(List<LaneBuilder.Lane> lanes, int k, LaneBuilder.Lane rest, double length,
                                List<LaneBuilder.Lane> requeued) {
        double restLength = rest.lengthMm();
        for (LaneBuilder.Lane other : requeued) {
            if (Math.abs(other.cellMm() - rest.cellMm()) > EPS || other.lengthMm() + restLength > length + EPS) {
                continue;
            }
            for (int j = k + 1; j < lanes.size(); j++) {
                if (lanes.get(j) == other) {
                    List<ItemType> both = new ArrayList<>(other.items());
                    both.addAll(rest.items());
                    LaneBuilder.Lane merged = new LaneBuilder.Lane(other.cellMm(), List.copyOf(both));
                    lanes.set(j, merged);
                    requeued.removeIf(l -> l == other);
                    requeued.add(merged);
                    return;
                }
            }
        }
        requeued.add(rest);
        int at = k + 1;
        while (at < lanes.size() && lanes.get(at).cellMm() >= rest.cellMm() - EPS) {
            at++;
        }
        lanes.add(at, rest);
    }

    /** The free cell with the smallest diameter that takes a lane of cell d, removed from the list. */
    private static RowGroup.Cell takeFree(List<RowGroup.Cell> free, double d) {
        int best = -1;
        for (int i = 0; i < free.size(); i++) {
            if (free.get(i).d() + EPS >= d && (best < 0 || free.get(i).d() < free.get(best).d())) {
                best = i;
            }
        }
        return best < 0 ? null : free.remove(best);
    }

    private static void placeBoxes(CrateType crate, List<ItemType> types, int[] left, double net, double floor,
                                   double side, double endX, double top, double[] mass, int[] counts,
                                   List<CrateLayout.Slot> slots) {
        List<ItemType> boxes = types.stream()
                .filter(t -> t.kind() == ItemKind.BOX && left[t.index()] > 0).toList();
        if (boxes.isEmpty()) {
            return;
        }
        double length = crate.innerLengthMm();
        double width = crate.innerWidthMm();
        double height = crate.innerHeightMm();
        // the end of the crate behind the longest lane, full width, from the floor tiers up
        BoxGrid.fill(endX, side, floor, length - endX, width - side, height - floor, boxes, left, net, mass, counts,
                slots);
        // above the top row of lanes, as long as the longest lane
        if (endX > 0) {
            BoxGrid.fill(0, side, top, endX, width - side, height - top, boxes, left, net, mass, counts, slots);
        }
    }
}
