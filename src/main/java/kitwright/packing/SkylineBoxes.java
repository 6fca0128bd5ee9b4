package kitwright.packing;

import java.util.ArrayList;
import java.util.List;

/**
 * Joint boxes on the {@link Skyline} of the lanes: rows of boxes along the crate from its front end, each row
 * where it rests lowest (then leftmost) and as far along as the surface under it bears, each box resting on items
 * under its centre and half its footprint ({@link Support}). Boxes lie with their length along the crate, either
 * upright (width across) or on their side (height across); both are tried and the one that places more boxes
 * (then the lower top) is kept, upright on a tie. Where a row finds no support, the lowest segment under it is
 * given up as waste and the search goes on (the skyline heuristic, Burke, Kendall &amp; Whitwell 2004).
 */
final class SkylineBoxes {
    private static final double EPS = 1e-6;

    private SkylineBoxes() {
    }

    /** One way to lay the boxes: across the crate and up. */
    private enum Lie { UPRIGHT, ON_SIDE }

    /** What one way of laying placed: its slots and what it took. */
    private record Trial(List<CrateLayout.Slot> slots, int[] counts, int[] left, double mass, double endX,
                         double top) {
    }

    /**
     * Places boxes from {@code left} (taken from it as they go in) on the skyline; returns {end of the longest row,
     * top of the highest}.
     */
    static double[] place(Skyline sky, List<ItemType> types, double length, double crateWidth, double height,
                          double net, double[] mass, int[] counts, List<CrateLayout.Slot> slots, int[] left) {
        Trial best = null;
        for (Lie lie : Lie.values()) {
            Trial t = rows(sky.copy(), lie, types, length, crateWidth, height, net, mass[0], counts, slots, left);
            if (best == null || t.slots().size() > best.slots().size()
                    || (t.slots().size() == best.slots().size() && t.top() < best.top() - EPS)) {
                best = t;
            }
        }
        slots.addAll(best.slots());
        System.arraycopy(best.counts(), 0, counts, 0, counts.length);
        System.arraycopy(best.left(), 0, left, 0, left.length);
        mass[0] = best.mass();
        return new double[] {best.endX(), best.top()};
    }

    private static Trial rows(Skyline sky, Lie lie, List<ItemType> types, double length, double crateWidth,
                              double height, double net, double startMass, int[] startCounts,
                              List<CrateLayout.Slot> placed, int[] startLeft) {
        int[] counts = startCounts.clone();
        int[] left = startLeft.clone();
        double mass = startMass;
        List<CrateLayout.Slot> all = new ArrayList<>(placed);
        List<CrateLayout.Slot> added = new ArrayList<>();
        double endX = 0;
        double top = 0;
        int wastes = 0;
        while (true) {
            ItemType size = null;
            int wanted = 0;
            for (ItemType t : types) {
                if (t.kind() == ItemKind.BOX && left[t.index()] > 0) {
                    size = size == null ? t : size;
                    wanted += left[t.index()];
                }
            }
            if (size == null) {
                break;
            }
            double across = lie == Lie.UPRIGHT ? size.widthMm() : size.heightMm();
            double up = lie == Lie.UPRIGHT ? size.heightMm() : size.widthMm();
            double rowLength = Math.min(length, wanted * size.lengthMm());
            Skyline.Spot spot = sky.bestSpot(crateWidth, across, up, height, size.lengthMm(), rowLength);
            if (spot == null) {
                break;
            }
            double x = 0;
            while (x + size.lengthMm() <= Math.min(length, spot.bearing()) + EPS) {
                ItemType box = null;
                for (ItemType t : types) {
                    if (t.kind() == ItemKind.BOX && left[t.index()] > 0 && mass + t.massKg() <= net + EPS) {
                        box = t;
                        break;
                    }
                }
                if (box == null) {
                    break;
                }
                CrateLayout.Slot slot = new CrateLayout.Slot(box.index(), x, spot.y(), spot.h(), box.lengthMm(),
                        across, up);
                if (slot.z() > Support.TOUCH && !Support.supported(slot, all, types, crateWidth)) {
                    break;
                }
                left[box.index()]--;
                counts[box.index()]++;
                mass += box.massKg();
                all.add(slot);
                added.add(slot);
                x += box.lengthMm();
            }
            if (x <= EPS) {
                // no box of this row found support (or mass room): give the spot up and look elsewhere
                if (mass + lightest(types, left) > net + EPS || ++wastes > 1000) {
                    break;
                }
                sky.waste(spot.y(), across, height);
                continue;
            }
            endX = Math.max(endX, x);
            top = Math.max(top, spot.h() + up);
            sky.raise(spot.y(), spot.y() + across, spot.h() + up, x);
        }
        return new Trial(added, counts, left, mass, endX, top);
    }

    /** The lightest box still to place. */
    private static double lightest(List<ItemType> types, int[] left) {
        double m = Double.MAX_VALUE;
        for (ItemType t : types) {
            if (t.kind() == ItemKind.BOX && left[t.index()] > 0) {
                m = Math.min(m, t.massKg());
            }
        }
        return m;
    }
}
