package kitwright.packing;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Joint boxes filling a rectangular region of a crate by guillotine blocks: a grid block of boxes in one
 * orientation (any of the six) at the region's corner, then, recursively, the slabs it leaves: the end slab behind
 * it, the side slab beside it and the top slab on it (over the block only, so that what goes there rests on the
 * block). The orientation and the order of the end and side cuts are the ones that hold the most boxes over the
 * whole recursion (a staged guillotine cutting of the region, Gilmore &amp; Gomory 1965 for the two-dimensional
 * case); upright orientations are tried first so that ties keep boxes the right way up. In 6300 × 1000 × 800
 * mm, 600 × 400 × 300 mm boxes go 10 × 3 × 2 = 60 in one grid and 63 with the end slab filled. Cells are filled
 * block by block, layer by layer from the bottom, each with the first box type still available whose mass fits
 * the crate. All box types share one size (the kit's joint box); they differ in mass only.
 */
final class BoxGrid {
    private static final double EPS = 1e-6;

    private BoxGrid() {
    }

    /** How many boxes of this size the blocks and slabs above place in a region (not every guillotine packing). */
    static long capacity(double lx, double wy, double hz, ItemType box) {
        return plan(lx, wy, hz, orientations(box), new HashMap<>()).count();
    }

    /**
     * The best guillotine filling of a region: the block's orientation, whether the side slab runs the region's
     * whole length (else the end slab runs its whole width), and the count over the whole recursion.
     */
    private record Plan(double[] orientation, boolean sideFirst, long count) {
        static final Plan EMPTY = new Plan(null, false, 0);
    }

    /**
     * A region as the memo's key, by its exact sizes: regions a hair apart may hold different counts
     * ({@link RowPattern#floor} has a tolerance), and {@link #fill} must follow the plan made for its own region.
     */
    private record Region(double lx, double wy, double hz) {
    }

    private static Plan plan(double lx, double wy, double hz, double[][] orientations, Map<Region, Plan> memo) {
        Region key = new Region(lx, wy, hz);
        Plan known = memo.get(key);
        if (known != null) {
            return known;
        }
        Plan best = Plan.EMPTY;
        for (double[] o : orientations) {
            int nx = RowPattern.floor(lx / o[0]);
            int ny = RowPattern.floor(wy / o[1]);
            int nz = RowPattern.floor(hz / o[2]);
            long block = (long) nx * ny * nz;
            if (block == 0) {
                continue;
            }
            double bx = nx * o[0];
            double by = ny * o[1];
            long top = plan(bx, by, hz - nz * o[2], orientations, memo).count();
            for (boolean sideFirst : new boolean[] {false, true}) {
                long end = plan(lx - bx, sideFirst ? by : wy, hz, orientations, memo).count();
                long side = plan(sideFirst ? lx : bx, wy - by, hz, orientations, memo).count();
                long count = block + top + end + side;
                if (count > best.count()) {
                    best = new Plan(o, sideFirst, count);
                }
            }
        }
        memo.put(key, best);
        return best;
    }

    private static double[][] orientations(ItemType b) {
        return new double[][] {
            {b.lengthMm(), b.widthMm(), b.heightMm()},
            {b.widthMm(), b.lengthMm(), b.heightMm()},
            {b.lengthMm(), b.heightMm(), b.widthMm()},
            {b.heightMm(), b.lengthMm(), b.widthMm()},
            {b.widthMm(), b.heightMm(), b.lengthMm()},
            {b.heightMm(), b.widthMm(), b.lengthMm()},
        };
    }

    /**
     * Fills the region with the boxes on offer, as {@link #capacity} counts them, until the boxes or the crate's
     * net capacity run out.
     */
    static void fill(double x0, double y0, double z0, double lx, double wy, double hz, List<ItemType> boxes,
                     int[] left, double net, double[] mass, int[] counts, List<CrateLayout.Slot> slots) {
        if (lx <= EPS || wy <= EPS || hz <= EPS) {
            return;
        }
        double[][] orientations = orientations(boxes.get(0));
        fill(x0, y0, z0, lx, wy, hz, orientations, new HashMap<>(), boxes, left, net, mass, counts, slots);
    }

    /** Returns false once no box can be placed any more (none left, or none whose mass fits). */
    private static boolean fill(double x0, double y0, double z0, double lx, double wy, double hz,
                                double[][] orientations, Map<Region, Plan> memo, List<ItemType> boxes, int[] left,
                                double net, double[] mass, int[] counts, List<CrateLayout.Slot> slots) {
        Plan plan = plan(lx, wy, hz, orientations, memo);
        if (plan.count() == 0) {
            return true;
        }
        double[] o = plan.orientation();
        int nx = RowPattern.floor(lx / o[0]);
        int ny = RowPattern.floor(wy / o[1]);
        int nz = RowPattern.floor(hz / o[2]);
        for (int k = 0; k < nz; k++) {
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    ItemType box = nextBox(boxes, left, net - mass[0]);
                    if (box == null) {
                        return false;
                    }
                    left[box.index()]--;
                    counts[box.index()]++;
                    mass[0] += box.massKg();
                    slots.add(new CrateLayout.Slot(box.index(), x0 + i * o[0], y0 + j * o[1], z0 + k * o[2],
                            o[0], o[1], o[2]));
                }
            }
        }
        double bx = nx * o[0];
        double by = ny * o[1];
        double bz = nz * o[2];
        boolean side = plan.sideFirst();
        return fill(x0 + bx, y0, z0, lx - bx, side ? by : wy, hz, orientations, memo, boxes, left, net, mass,
                counts, slots)
                && fill(x0, y0 + by, z0, side ? lx : bx, wy - by, hz, orientations, memo, boxes, left, net, mass,
                        counts, slots)
                && fill(x0, y0, z0 + bz, bx, by, hz - bz, orientations, memo, boxes, left, net, mass, counts, slots);
    }

    private static ItemType nextBox(List<ItemType> boxes, int[] left, double massRoom) {
        for (ItemType b : boxes) {
            if (left[b.index()] > 0 && b.massKg() <= massRoom + EPS) {
                return b;
            }
        }
        return null;
    }
}
