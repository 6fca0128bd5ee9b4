package kitwright.packing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.TreeSet;

/**
 * The support rule of a crate layout: dunnage is not modelled, so an item above the crate floor must rest on
 * items below it. Its bearing items are those whose top is at its bottom (within {@value #TOUCH} mm). A box needs
 * bearing items under the centre of its footprint and under at least half its footprint area. A bundle (a
 * cylinder lying along x) needs support at every x along its length: a bearing item whose y range overlaps its
 * axis band (axis y &plusmn; d/4), or a cradle of bundles below that its circle touches, one on each side of its
 * axis or one right under it (square and staggered rows); on one side only when the side wall on the open side
 * (or the side of a box there) is nearer than the contact's slack, so that it catches the bundle before it
 * rolls off.
 *
 * <p>{@link #settle} keeps, from the floor up, only the items so supported by the items kept: the guarantee
 * {@link CrateFiller} gives every layout.
 */
final class Support {
    /** Contact tolerance, mm. */
    static final double TOUCH = 1.0;
    /** Least share of a box's footprint on bearing items. */
    static final double BOX_SHARE = 0.5;

    private Support() {
    }

    /** The slots that stand, from the floor up, in build order; the others are left out. */
    static List<CrateLayout.Slot> settle(List<CrateLayout.Slot> slots, List<ItemType> types, double width) {
        List<CrateLayout.Slot> byHeight = new ArrayList<>(slots);
        byHeight.sort(Comparator.comparingDouble(CrateLayout.Slot::z));
        List<CrateLayout.Slot> kept = new ArrayList<>();
        java.util.Set<CrateLayout.Slot> standing = java.util.Collections.newSetFromMap(
                new java.util.IdentityHashMap<>());
        for (CrateLayout.Slot s : byHeight) {
            if (s.z() <= TOUCH || supported(s, kept, types, width)) {
                kept.add(s);
                standing.add(s);
            }
        }
        return slots.stream().filter(standing::contains).toList();
    }

    /** Whether every slot above the floor is supported by the others. */
    static boolean holds(List<CrateLayout.Slot> slots, List<ItemType> types, double width) {
        return slots.stream().allMatch(s -> s.z() <= TOUCH || supported(s, slots, types, width));
    }

    /** Whether the slot at {@code index} can be taken out without leaving another slot unsupported. */
    static boolean bearsNothing(List<CrateLayout.Slot> slots, int index, List<ItemType> types, double width) {
        CrateLayout.Slot gone = slots.get(index);
        List<CrateLayout.Slot> rest = new ArrayList<>(slots);
        rest.remove(index);
        for (CrateLayout.Slot o : rest) {
            if (o.z() > TOUCH && o.x() < end(gone) && gone.x() < end(o) && !supported(o, rest, types, width)) {
                return false;
            }
        }
        return true;
    }

    static boolean supported(CrateLayout.Slot s, List<CrateLayout.Slot> others, List<ItemType> types,
                             double width) {
        List<CrateLayout.Slot> bearing = new ArrayList<>();
        for (CrateLayout.Slot o : others) {
            if (o != s && Math.abs(o.z() + o.height() - s.z()) <= TOUCH && o.x() < end(s) - TOUCH
                    && s.x() < end(o) - TOUCH) {
                bearing.add(o);
            }
        }
        if (types.get(s.itemType()).kind() == ItemKind.BOX) {
            return box(s, bearing);
        }
        double d = s.width();
        double axisY = s.y() + d / 2;
        double axisZ = s.z() + d / 2;
        List<CrateLayout.Slot> flat = bearing.stream()
                .filter(o -> o.y() < axisY + d / 4 && axisY - d / 4 < o.y() + o.width()).toList();
        List<CrateLayout.Slot> left = new ArrayList<>();
        List<CrateLayout.Slot> right = new ArrayList<>();
        List<Double> leftSlack = new ArrayList<>();
        List<Double> rightSlack = new ArrayList<>();
        List<CrateLayout.Slot> faces = new ArrayList<>();
        for (CrateLayout.Slot o : others) {
            if (o == s) {
                continue;
            }
            if (types.get(o.itemType()).kind() == ItemKind.BOX) {
                if (o.z() <= axisZ && axisZ <= o.z() + o.height()) {
                    faces.add(o);
                }
                continue;
            }
            double dy = o.y() + o.width() / 2 - axisY;
            double dz = o.z() + o.height() / 2 - axisZ;
            if (dz < 0 && Math.abs(Math.hypot(dy, dz) - (d + o.width()) / 2) <= TOUCH / 2) {
                double slack = (d + o.width()) / 2 - Math.abs(dy);
                if (dy <= TOUCH / 2) {
                    left.add(o);
                    leftSlack.add(slack);
                }
                if (dy >= -TOUCH / 2) {
                    right.add(o);
                    rightSlack.add(slack);
                }
            }
        }
        // coverage changes only at the ends of the items that can hold it
        TreeSet<Double> cuts = new TreeSet<>(List.of(s.x(), end(s)));
        for (List<CrateLayout.Slot> holders : List.of(flat, left, right, faces)) {
            for (CrateLayout.Slot o : holders) {
                cuts.add(Math.max(s.x(), Math.min(end(s), o.x())));
                cuts.add(Math.max(s.x(), Math.min(end(s), end(o))));
            }
        }
        Double[] x = cuts.toArray(Double[]::new);
        for (int a = 0; a + 1 < x.length; a++) {
            double mx = (x[a] + x[a + 1]) / 2;
            if (x[a + 1] - x[a] <= TOUCH / 2 || covers(flat, mx) || (covers(left, mx) && covers(right, mx))) {
                continue;
            }
            // held on one side only, it rolls towards the other, where a side wall or the side of a box nearer
            // than the contact's slack (sum of radii - lateral offset) catches it while it still rests below
            double gapLeft = s.y();
            double gapRight = width - s.y() - d;
            for (CrateLayout.Slot f : faces) {
                if (f.x() <= mx && mx <= end(f)) {
                    if (f.y() + f.width() <= s.y() + TOUCH) {
                        gapLeft = Math.min(gapLeft, Math.max(0, s.y() - f.y() - f.width()));
                    } else if (f.y() >= s.y() + d - TOUCH) {
                        gapRight = Math.min(gapRight, Math.max(0, f.y() - s.y() - d));
                    }
                }
            }
            if (!caught(left, leftSlack, mx, gapRight) && !caught(right, rightSlack, mx, gapLeft)) {
                return false;
            }
        }
        return true;
    }

    private static boolean caught(List<CrateLayout.Slot> holders, List<Double> slack, double x, double gap) {
        for (int k = 0; k < holders.size(); k++) {
            CrateLayout.Slot o = holders.get(k);
            if (o.x() <= x && x <= end(o) && slack.get(k) > gap + TOUCH) {
                return true;
            }
        }
        return false;
    }

    private static boolean box(CrateLayout.Slot s, List<CrateLayout.Slot> bearing) {
        double cx = s.x() + s.length() / 2;
        double cy = s.y() + s.width() / 2;
        if (bearing.stream().noneMatch(o -> o.x() <= cx && cx <= end(o) && o.y() <= cy && cy <= o.y() + o.width())) {
            return false;
        }
        TreeSet<Double> xs = new TreeSet<>(List.of(s.x(), end(s)));
        TreeSet<Double> ys = new TreeSet<>(List.of(s.y(), s.y() + s.width()));
        for (CrateLayout.Slot o : bearing) {
            xs.add(Math.max(s.x(), Math.min(end(s), o.x())));
            xs.add(Math.max(s.x(), Math.min(end(s), end(o))));
            ys.add(Math.max(s.y(), Math.min(s.y() + s.width(), o.y())));
            ys.add(Math.max(s.y(), Math.min(s.y() + s.width(), o.y() + o.width())));
        }
        Double[] x = xs.toArray(Double[]::new);
        Double[] y = ys.toArray(Double[]::new);
        double area = 0;
        for (int a = 0; a + 1 < x.length; a++) {
            for (int b = 0; b + 1 < y.length; b++) {
                double mx = (x[a] + x[a + 1]) / 2;
                double my = (y[b] + y[b + 1]) / 2;
                if (bearing.stream().anyMatch(o -> o.x() <= mx && mx <= end(o) && o.y() <= my
                        && my <= o.y() + o.width())) {
                    area += (x[a + 1] - x[a]) * (y[b + 1] - y[b]);
                }
            }
        }
        return area >= BOX_SHARE * s.length() * s.width() - 1e-6;
    }

    private static double end(CrateLayout.Slot s) {
        return s.x() + s.length();
    }

    private static boolean covers(List<CrateLayout.Slot> slots, double x) {
        return slots.stream().anyMatch(o -> o.x() <= x && x <= end(o));
    }
}
