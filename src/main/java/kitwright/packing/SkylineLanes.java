package kitwright.packing;

import java.util.ArrayList;
import java.util.List;

/**
 * Lanes into a crate's cross-section on a {@link Skyline}: the top of what is placed so far, as segments across the
 * width, each with its height and the length from the crate's front end over which it bears (its lane's
 * full-diameter length; the floor bears the crate length). Each lane, in the order given (the caller puts the
 * lanes that bear longest first), goes at the left end of the segment where it comes to rest lowest (then
 * leftmost); it rests on the highest segments under its width, and it may go only as far along as the segments
 * under its axis band bear ({@link Support}): what goes further is cut off and placed later as a lane of its own.
 * Then joint boxes go on top in the same way ({@link SkylineBoxes}). Square rows only, but every row starts on
 * what is really there, so lanes of several diameters and lengths stack without the holes a fixed grid of rows
 * leaves (the skyline of 2D strip packing, Burke, Kendall &amp; Whitwell 2004, here across the crate with bearing
 * lengths added).
 */
final class SkylineLanes {
    private static final double EPS = 1e-6;

    private SkylineLanes() {
    }

    /**
     * Places the lanes between y0 and the crate's inner width from the floor up, then joint boxes from
     * {@code left} (taken from it as they go in) in rows along the crate on the skyline, upright or on their side
     * ({@link SkylineBoxes}), each where it rests lowest and on items under its centre and half its footprint
     * ({@link Support}); returns {end of the longest lane or row, top of the highest}. Same contract as
     * {@link RowGroupLanes#place}.
     */
    static double[] place(List<LaneBuilder.Lane> sorted, List<ItemType> types, double y0, double length,
                          double crateWidth, double height, double net, double[] mass, int[] counts,
                          List<CrateLayout.Slot> slots, int[] left) {
        Skyline sky = new Skyline(y0, crateWidth, length);
        List<LaneBuilder.Lane> lanes = new ArrayList<>(sorted);
        double endX = 0;
        double top = 0;
        for (int k = 0; k < lanes.size(); k++) {
            LaneBuilder.Lane lane = lanes.get(k);
            double d = lane.cellMm();
            if (mass[0] + lane.lightestKg() > net + EPS) {
                continue;
            }
            Skyline.Spot spot = sky.bestSpot(crateWidth, d, d, height, lane.items().get(0).lengthMm(),
                    lane.lengthMm());
            if (spot == null) {
                continue;
            }
            double x = 0;
            List<ItemType> items = lane.items();
            int placed = 0;
            double bearing = 0;
            boolean full = true;
            for (int i = 0; i < items.size(); i++) {
                ItemType t = items.get(i);
                if (mass[0] + t.massKg() > net + EPS) {
                    continue;
                }
                double r = t.diameterMm() / 2;
                CrateLayout.Slot slot = new CrateLayout.Slot(t.index(), x, spot.y() + d / 2 - r, spot.h(), t.lengthMm(),
                        t.diameterMm(), t.diameterMm());
                if (x + t.lengthMm() > spot.bearing() + EPS
                        || (slot.z() > Support.TOUCH && !Support.supported(slot, slots, types, crateWidth))) {
                    if (placed > 0) {
                        requeue(lanes, k, new LaneBuilder.Lane(t.diameterMm(), List.copyOf(items.subList(i,
                                items.size()))));
                    }
                    break;
                }
                mass[0] += t.massKg();
                counts[t.index()]++;
                slots.add(slot);
                x += t.lengthMm();
                placed++;
                if (full && t.diameterMm() >= d - Support.TOUCH / 2) {
                    bearing = x;
                } else {
                    full = false;
                }
            }
            if (placed == 0) {
                continue;
            }
            endX = Math.max(endX, x);
            top = Math.max(top, spot.h() + d);
            sky.raise(spot.y(), spot.y() + d, spot.h() + d, bearing);
        }
        double[] boxes = SkylineBoxes.place(sky, types, length, crateWidth, height, net, mass, counts, slots, left);
        return new double[] {Math.max(endX, boxes[0]), Math.max(top, boxes[1])};
    }

    /**
     * What is left of a lane cut short goes back among the lanes still to place, before the first shorter one (the
     * order the caller gave, longest first); it has fewer bundles than the lane it came from, so placing ends.
     */
    private static void requeue(List<LaneBuilder.Lane> lanes, int k, LaneBuilder.Lane rest) {
        int at = k + 1;
        while (at < lanes.size() && lanes.get(at).lengthMm() >= rest.lengthMm() - EPS) {
            at++;
        }
        lanes.add(at, rest);
    }
}
