package kitwright.validate;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import kitwright.packing.CrateItem;
import kitwright.packing.ItemKind;

/**
 * The support rule of {@link CratePlanValidator}, from first principles: an item above the crate floor must rest
 * on items below it, as dunnage is not modelled. See the validator's description for the rule itself.
 */
final class SupportRule {
    private SupportRule() {
    }

    /** Whether item i (above the floor) is supported by the other items of its crate. */
    static boolean supported(CrateItem i, List<CrateItem> items, double width, double touch, double boxShare) {
        List<CrateItem> bearing = new ArrayList<>();
        for (CrateItem j : items) {
            if (j != i && Math.abs(j.zMm() + j.heightMm() - i.zMm()) <= touch
                    && j.xMm() < i.endXMm() - touch && i.xMm() < j.endXMm() - touch) {
                bearing.add(j);
            }
        }
        return i.kind() == ItemKind.BOX ? boxSupported(i, bearing, boxShare) : bundleSupported(i, items, bearing,
                width, touch);
    }

    private static boolean boxSupported(CrateItem box, List<CrateItem> bearing, double share) {
        double cx = box.xMm() + box.lengthMm() / 2;
        double cy = box.yMm() + box.widthMm() / 2;
        boolean centre = bearing.stream().anyMatch(j -> j.xMm() <= cx && cx <= j.endXMm()
                && j.yMm() <= cy && cy <= j.yMm() + j.widthMm());
        return centre && coveredArea(box, bearing) >= share * box.lengthMm() * box.widthMm() - 1e-6;
    }

    /** Area of the box's footprint under the union of the bearing items' footprints (coordinate compression). */
    private static double coveredArea(CrateItem box, List<CrateItem> bearing) {
        TreeSet<Double> xs = new TreeSet<>(List.of(box.xMm(), box.endXMm()));
        TreeSet<Double> ys = new TreeSet<>(List.of(box.yMm(), box.yMm() + box.widthMm()));
        for (CrateItem j : bearing) {
            xs.add(clamp(j.xMm(), box.xMm(), box.endXMm()));
            xs.add(clamp(j.endXMm(), box.xMm(), box.endXMm()));
            ys.add(clamp(j.yMm(), box.yMm(), box.yMm() + box.widthMm()));
            ys.add(clamp(j.yMm() + j.widthMm(), box.yMm(), box.yMm() + box.widthMm()));
        }
        Double[] x = xs.toArray(Double[]::new);
        Double[] y = ys.toArray(Double[]::new);
        double area = 0;
        for (int a = 0; a + 1 < x.length; a++) {
            for (int b = 0; b + 1 < y.length; b++) {
                double mx = (x[a] + x[a + 1]) / 2;
                double my = (y[b] + y[b + 1]) / 2;
                if (bearing.stream().anyMatch(j -> j.xMm() <= mx && mx <= j.endXMm() && j.yMm() <= my
                        && my <= j.yMm() + j.widthMm())) {
                    area += (x[a + 1] - x[a]) * (y[b + 1] - y[b]);
                }
            }
        }
        return area;
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    /** Every stretch of the bundle's length has a bearing item under its axis band or a cradle of bundles. */
    private static boolean bundleSupported(CrateItem b, List<CrateItem> items, List<CrateItem> bearing,
                                           double width, double touch) {
        double d = b.widthMm();
        double axisY = b.yMm() + d / 2;
        double axisZ = b.zMm() + d / 2;
        List<CrateItem> flat = bearing.stream().filter(j -> j.yMm() < axisY + d / 4 && axisY - d / 4
                < j.yMm() + j.widthMm()).toList();
        List<CrateItem> left = new ArrayList<>();
        List<CrateItem> right = new ArrayList<>();
        Map<CrateItem, Double> slack = new IdentityHashMap<>();
        for (CrateItem j : items) {
            if (j == b || j.kind() != ItemKind.BUNDLE) {
                continue;
            }
            double dy = j.yMm() + j.widthMm() / 2 - axisY;
            double dz = j.zMm() + j.heightMm() / 2 - axisZ;
            double reach = (d + j.widthMm()) / 2;
            if (dz < 0 && Math.abs(Math.hypot(dy, dz) - reach) <= touch) {
                slack.put(j, reach - Math.abs(dy));
                if (dy <= touch) {
                    left.add(j);
                }
                if (dy >= -touch) {
                    right.add(j);
                }
            }
        }
        TreeSet<Double> cuts = new TreeSet<>(List.of(b.xMm(), b.endXMm()));
        for (CrateItem j : items) {
            cuts.add(clamp(j.xMm(), b.xMm(), b.endXMm()));
            cuts.add(clamp(j.endXMm(), b.xMm(), b.endXMm()));
        }
        Double[] x = cuts.toArray(Double[]::new);
        for (int a = 0; a + 1 < x.length; a++) {
            if (x[a + 1] - x[a] <= touch) {
                continue;
            }
            double mx = (x[a] + x[a + 1]) / 2;
            if (covers(flat, mx) || (covers(left, mx) && covers(right, mx))) {
                continue;
            }
            // held on one side only: it rolls towards the other side, where the crate wall or the side of a box
            // (spanning the bundle's axis height) nearer than the contact's slack catches it
            double gapLeft = b.yMm();
            double gapRight = width - b.yMm() - d;
            for (CrateItem f : items) {
                if (f.kind() == ItemKind.BOX && f.xMm() <= mx && mx <= f.endXMm() && f.zMm() <= axisZ
                        && axisZ <= f.zMm() + f.heightMm()) {
                    if (f.yMm() + f.widthMm() <= b.yMm() + touch) {
                        gapLeft = Math.min(gapLeft, Math.max(0, b.yMm() - f.yMm() - f.widthMm()));
                    } else if (f.yMm() >= b.yMm() + d - touch) {
                        gapRight = Math.min(gapRight, Math.max(0, f.yMm() - b.yMm() - d));
                    }
                }
            }
            double gl = gapLeft;
            double gr = gapRight;
            boolean caught = left.stream().anyMatch(j -> j.xMm() <= mx && mx <= j.endXMm() && slack.get(j) > gr)
                    || right.stream().anyMatch(j -> j.xMm() <= mx && mx <= j.endXMm() && slack.get(j) > gl);
            if (!caught) {
                return false;
            }
        }
        return true;
    }

    private static boolean covers(List<CrateItem> items, double x) {
        return items.stream().anyMatch(j -> j.xMm() <= x && x <= j.endXMm());
    }
}
