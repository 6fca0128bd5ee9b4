package kitwright.packing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import kitwright.ids.IdScheme;
import kitwright.model.Joint;
import kitwright.model.JointBox;

/**
 * Joints into boxes in a square grid: a spherical joint of diameter d takes a d x d x d cell (52 % of the cell is
 * sphere, pi/6; staggered layers could reach 74 %, Kepler's density, which this method does not use). Cells form
 * rows along the box length (floor(L/d) joints a row), rows sit side by side in layers, layers stack to the lid,
 * so one mark alone fills a box with floor(L/d)*floor(W/d)*floor(H/d) joints, or as many as the box's mass
 * limit allows. Marks go largest diameter first; a mark's last, partly filled box takes the next marks' rows
 * (next-fit shelves: a layer is as high as its first row, later rows are no wider).
 *
 * Boxes are numbered in the order they are filled, with the joint box ids of an {@link IdScheme} (BOX-1, BOX-2,
 * ... unless a mark reads like them).
 *
 * <p>Guarantee: every box holds its rows inside its walls and no more than its mass limit.
 * Source: the square-grid and Kepler densities are textbook (Hales 2005 proved Kepler's bound).
 */
public final class ShelfJointBoxer implements JointBoxer {
    private static final double EPS = 1e-9;

    /** The kit's id scheme, or null to choose one from the joints' marks alone. */
    private final IdScheme ids;

    /** Box ids that read like none of the joints' marks. */
    public ShelfJointBoxer() {
        this(null);
    }

    /** Box ids of the kit's scheme ({@link IdScheme#of}). */
    public ShelfJointBoxer(IdScheme ids) {
        this.ids = ids;
    }

    @Override
    public List<JointBoxLoad> box(List<Joint> joints, JointBox box) {
        IdScheme ids = this.ids != null ? this.ids : IdScheme.avoiding(joints.stream().map(Joint::mark).toList());
        List<Joint> sorted = joints.stream().filter(j -> j.quantity() > 0)
                .sorted(Comparator.comparingDouble(Joint::diameterMm).reversed().thenComparing(Joint::mark))
                .toList();
        for (Joint j : sorted) {
            if (j.diameterMm() > Math.min(box.lengthMm(), Math.min(box.widthMm(), box.heightMm())) + EPS) {
                throw new IllegalArgumentException("joint " + j.mark() + " (diameter " + j.diameterMm()
                        + " mm) does not fit the joint box " + size(box) + "; set a larger jointBox in kit.json");
            }
            if (j.massKg() > box.maxMassKg() + EPS) {
                throw new IllegalArgumentException("joint " + j.mark() + " (" + j.massKg() + " kg) is heavier than"
                        + " the joint box limit of " + box.maxMassKg() + " kg; set jointBox.maxMassKg in kit.json");
            }
        }
        List<JointBoxLoad> result = new ArrayList<>();
        Filling open = new Filling();
        for (Joint j : sorted) {
            int perRow = (int) Math.floor(box.lengthMm() / j.diameterMm() + EPS);
            int left = j.quantity();
            while (left > 0) {
                int row = Math.min(perRow, left);
                int byMass = (int) Math.floor((box.maxMassKg() - open.massKg) / j.massKg() + EPS);
                int placed = Math.min(row, byMass);
                if (placed > 0 && open.takesRow(j.diameterMm(), box)) {
                    open.add(j, placed);
                    left -= placed;
                    if (placed < row) {
                        result.add(open.close(ids.jointBox(result.size() + 1), box));
                        open = new Filling();
                    }
                } else {
                    result.add(open.close(ids.jointBox(result.size() + 1), box));
                    open = new Filling();
                }
            }
        }
        if (!open.counts.isEmpty()) {
            result.add(open.close(ids.jointBox(result.size() + 1), box));
        }
        return List.copyOf(result);
    }

    private static String size(JointBox b) {
        return fmt(b.lengthMm()) + " x " + fmt(b.widthMm()) + " x " + fmt(b.heightMm()) + " mm";
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    /** The box being filled: its shelves and contents. */
    private static final class Filling {
        final List<JointCount> counts = new ArrayList<>();
        double massKg;
        double layerHeight;
        double layerWidthUsed;
        double heightUsed;

        /** Reserves room for one row of cells of diameter d: in the current layer, or in a new one. */
        boolean takesRow(double d, JointBox box) {
            if (layerHeight > 0 && d <= layerHeight + EPS && layerWidthUsed + d <= box.widthMm() + EPS) {
                layerWidthUsed += d;
                return true;
            }
            if (heightUsed + d <= box.heightMm() + EPS) {
                heightUsed += d;
                layerHeight = d;
                layerWidthUsed = d;
                return true;
            }
            return false;
        }

        void add(Joint j, int n) {
            massKg += j.massKg() * n;
            int last = counts.size() - 1;
            if (last >= 0 && counts.get(last).mark().equals(j.mark())) {
                counts.set(last, new JointCount(j.mark(), j.diameterMm(), j.massKg(), counts.get(last).count() + n));
            } else {
                counts.add(new JointCount(j.mark(), j.diameterMm(), j.massKg(), n));
            }
        }

        JointBoxLoad close(String id, JointBox box) {
            return new JointBoxLoad(id, box.lengthMm(), box.widthMm(), box.heightMm(), counts, massKg);
        }
    }
}
