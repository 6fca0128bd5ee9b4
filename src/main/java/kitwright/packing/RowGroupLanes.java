package kitwright.packing;

import java.util.ArrayList;
import java.util.List;

/**
 * Lanes into a crate's cross-section in row groups ({@link RowGroup}): widest cells first, each group of one cell
 * diameter in square or staggered rows, lanes of at least {@value CrateFiller#MERGE} of the group's cell joining
 * it, thinner ones starting a group on top or taking a free cell left in a row below. Of one cell, the lanes that
 * bear longest go lowest (the caller's order); a bundle thinner than its cell is let down onto what is under it.
 */
final class RowGroupLanes {
    private static final double EPS = 1e-6;

    private RowGroupLanes() {
    }

    /**
     * Places lanes into row groups, from y0 to the crate's inner width; returns {end of the longest lane, top of
     * the rows}. A lane above the floor goes in only as far along as what is under it bears it ({@link Support});
     * the rest of it goes back among the lanes still to place, as a lane of its own.
     */
    static double[] place(List<LaneBuilder.Lane> sorted, List<ItemType> types, double y0, double length,
                          double crateWidth, double floor, double height, double net, double[] mass, int[] counts,
                          List<CrateLayout.Slot> slots) {
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
            boolean fitsGroup = current != null && d <= current.d + EPS;
            if (fitsGroup && current.hasRoomInOpenRow()) {
                cell = current.next();
            } else if (fitsGroup && d >= CrateFiller.MERGE * current.d - EPS && current.canOpenRow()) {
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
                    // the rest's cell is its widest bundle: in a lane joined from two (see requeue) a wider
                    // bundle may follow a thinner one
                    List<ItemType> rest = List.copyOf(items.subList(i, items.size()));
                    requeue(lanes, k, new LaneBuilder.Lane(rest.stream().mapToDouble(ItemType::diameterMm).max()
                            .orElseThrow(), rest), length, requeued);
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
}
