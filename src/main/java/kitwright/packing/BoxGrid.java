package kitwright.packing;

import java.util.List;

/**
 * Joint boxes in a grid filling a rectangular region of a crate, in the orientation (any of the six) that holds
 * the most boxes; upright orientations are tried first so that ties keep boxes the right way up. Cells are filled
 * layer by layer from the bottom, each with the first box type still available whose mass fits the crate. All box
 * types share one size (the kit's joint box); they differ in mass only.
 */
final class BoxGrid {
    private static final double EPS = 1e-6;

    private BoxGrid() {
    }

    /** Most boxes of this size a region holds in one orientation. */
    static long capacity(double lx, double wy, double hz, ItemType box) {
        long best = 0;
        for (double[] o : orientations(box)) {
            best = Math.max(best, (long) RowPattern.floor(lx / o[0]) * RowPattern.floor(wy / o[1])
                    * RowPattern.floor(hz / o[2]));
        }
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

    static void fill(double x0, double y0, double z0, double lx, double wy, double hz, List<ItemType> boxes,
                     int[] left, double net, double[] mass, int[] counts, List<CrateLayout.Slot> slots) {
        if (lx <= EPS || wy <= EPS || hz <= EPS) {
            return;
        }
        double[] best = null;
        long bestCount = 0;
        for (double[] o : orientations(boxes.get(0))) {
            long n = (long) RowPattern.floor(lx / o[0]) * RowPattern.floor(wy / o[1]) * RowPattern.floor(hz / o[2]);
            if (n > bestCount) {
                bestCount = n;
                best = o;
            }
        }
        if (best == null) {
            return;
        }
        int nx = RowPattern.floor(lx / best[0]);
        int ny = RowPattern.floor(wy / best[1]);
        int nz = RowPattern.floor(hz / best[2]);
        for (int k = 0; k < nz; k++) {
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    ItemType box = nextBox(boxes, left, net - mass[0]);
                    if (box == null) {
                        return;
                    }
                    left[box.index()]--;
                    counts[box.index()]++;
                    mass[0] += box.massKg();
                    slots.add(new CrateLayout.Slot(box.index(), x0 + i * best[0], y0 + j * best[1],
                            z0 + k * best[2], best[0], best[1], best[2]));
                }
            }
        }
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
