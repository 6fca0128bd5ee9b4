package kitwright.packing;

import java.util.ArrayList;
import java.util.List;

/**
 * Lanes into a crate's cross-section on a skyline: the top of what is placed so far, as segments across the width,
 * each with its height and the length from the crate's front end over which it bears (its lane's full-diameter
 * length; the floor bears the crate length). Each lane, in the order given (the caller puts the lanes that bear
 * longest first), goes at the left end of the segment where it comes to rest lowest (then leftmost); it rests on
 * the highest segments under its width, and it may go only as far along as the segments under its axis band bear
 * ({@link Support}): what goes further is cut off and placed later as a lane of its own. Then joint boxes go on
 * top in the same way. Square rows only, but every row starts on what is really there, so lanes of several
 * diameters and lengths stack without the holes a fixed grid of rows leaves (the skyline of 2D strip packing,
 * Burke, Kendall &amp; Whitwell 2004, here across the crate with bearing lengths added).
 */
final class SkylineLanes {
    private static final double EPS = 1e-6;

    /** A stretch of the top surface: across [y0, y1) at height h, bearing from x = 0 to x = bearing. */
    private record Segment(double y0, double y1, double h, double bearing) {
    }

    private SkylineLanes() {
    }

    /**
     * Places the lanes between y0 and the crate's inner width from the floor up, then joint boxes from
     * {@code left} (taken from it as they go in) in rows along the crate on the skyline, upright, each where it
     * rests lowest and on items under its centre and half its footprint ({@link Support}); returns {end of the
     * longest lane or row, top of the highest}. Same contract as {@link RowGroupLanes#place}.
     */
    static double[] place(List<LaneBuilder.Lane> sorted, List<ItemType> types, double y0, double length,
                          double crateWidth, double height, double net, double[] mass, int[] counts,
                          List<CrateLayout.Slot> slots, int[] left) {
        List<Segment> sky = new ArrayList<>(List.of(new Segment(y0, crateWidth, 0, length)));
        List<LaneBuilder.Lane> lanes = new ArrayList<>(sorted);
        double endX = 0;
        double top = 0;
        for (int k = 0; k < lanes.size(); k++) {
            LaneBuilder.Lane lane = lanes.get(k);
            double d = lane.cellMm();
            if (mass[0] + lane.lightestKg() > net + EPS) {
                continue;
            }
            Spot spot = bestSpot(sky, crateWidth, d, d, height, lane.items().get(0).lengthMm(), lane.lengthMm());
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
                CrateLayout.Slot slot = new CrateLayout.Slot(t.index(), x, spot.y + d / 2 - r, spot.h, t.lengthMm(),
                        t.diameterMm(), t.diameterMm());
                if (x + t.lengthMm() > spot.bearing + EPS
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
            top = Math.max(top, spot.h + d);
            raise(sky, spot.y, spot.y + d, spot.h + d, bearing);
        }
        double[] boxes = placeBoxes(sky, types, length, crateWidth, height, net, mass, counts, slots, left);
        return new double[] {Math.max(endX, boxes[0]), Math.max(top, boxes[1])};
    }

    /** Joint boxes in rows along the crate on the skyline; returns {end of the longest row, top of the highest}. */
    private static double[] placeBoxes(List<Segment> sky, List<ItemType> types, double length, double crateWidth,
                                       double height, double net, double[] mass, int[] counts,
                                       List<CrateLayout.Slot> slots, int[] left) {
        double endX = 0;
        double top = 0;
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
            double rowLength = Math.min(length, wanted * size.lengthMm());
            Spot spot = bestSpot(sky, crateWidth, size.widthMm(), size.heightMm(), height, size.lengthMm(),
                    rowLength);
            if (spot == null) {
                break;
            }
            double x = 0;
            while (x + size.lengthMm() <= Math.min(length, spot.bearing) + EPS) {
                ItemType box = null;
                for (ItemType t : types) {
                    if (t.kind() == ItemKind.BOX && left[t.index()] > 0 && mass[0] + t.massKg() <= net + EPS) {
                        box = t;
                        break;
                    }
                }
                if (box == null) {
                    break;
                }
                CrateLayout.Slot slot = new CrateLayout.Slot(box.index(), x, spot.y, spot.h, box.lengthMm(),
                        box.widthMm(), box.heightMm());
                if (slot.z() > Support.TOUCH && !Support.supported(slot, slots, types, crateWidth)) {
                    break;
                }
                left[box.index()]--;
                counts[box.index()]++;
                mass[0] += box.massKg();
                slots.add(slot);
                x += box.lengthMm();
            }
            if (x <= EPS) {
                break;
            }
            endX = Math.max(endX, x);
            top = Math.max(top, spot.h + size.heightMm());
            raise(sky, spot.y, spot.y + size.widthMm(), spot.h + size.heightMm(), x);
        }
        return new double[] {endX, top};
    }

    /** Where a lane goes: its left edge, the height it rests at and how far along the surface under it bears. */
    private record Spot(double y, double h, double bearing) {
    }

    /**
     * The lowest (then leftmost) spot at a segment's left end where a row d wide and {@code up} high fits between
     * the walls and under the lid, borne at least {@code first} along; of those that bear it {@code whole} along,
     * else the one that bears most.
     */
    private static Spot bestSpot(List<Segment> sky, double wall, double d, double up, double height, double first,
                                 double whole) {
        Spot best = null;
        boolean bestWhole = false;
        for (Segment s : sky) {
            double y = s.y0();
            if (y + d > wall + EPS) {
                break;
            }
            double h = 0;
            for (Segment o : sky) {
                if (o.y1() > y + EPS && o.y0() < y + d - EPS) {
                    h = Math.max(h, o.h());
                }
            }
            if (h + up > height + EPS) {
                continue;
            }
            // bears where a segment at the resting height lies under the axis band (axis +- d/4)
            double bearing = 0;
            for (Segment o : sky) {
                if (Math.abs(o.h() - h) <= Support.TOUCH && o.y1() > y + d / 4 + EPS && o.y0() < y + 3 * d / 4 - EPS) {
                    bearing = Math.max(bearing, o.bearing());
                }
            }
            if (bearing < first - EPS) {
                continue;
            }
            boolean holdsAll = bearing >= whole - EPS;
            boolean better = best == null
                    || (holdsAll && !bestWhole)
                    || (holdsAll == bestWhole && (h < best.h - EPS
                        || (!holdsAll && Math.abs(h - best.h) <= EPS && bearing > best.bearing + EPS)));
            if (better) {
                best = new Spot(y, h, bearing);
                bestWhole = holdsAll;
            }
        }
        return best;
    }

    /** The surface across [a, b) becomes height h bearing to {@code bearing}; equal neighbours merge. */
    private static void raise(List<Segment> sky, double a, double b, double h, double bearing) {
        Segment raised = new Segment(a, b, h, bearing);
        List<Segment> next = new ArrayList<>();
        boolean inserted = false;
        for (Segment s : sky) {
            if (s.y1() <= a + EPS) {
                next.add(s);
                continue;
            }
            if (s.y0() < a - EPS) {
                next.add(new Segment(s.y0(), a, s.h(), s.bearing()));
            }
            if (!inserted && s.y0() < b - EPS) {
                next.add(raised);
                inserted = true;
            }
            if (s.y0() >= b - EPS) {
                if (!inserted) {
                    next.add(raised);
                    inserted = true;
                }
                next.add(s);
            } else if (s.y1() > b + EPS) {
                next.add(new Segment(b, s.y1(), s.h(), s.bearing()));
            }
        }
        if (!inserted) {
            next.add(raised);
        }
        sky.clear();
        for (Segment s : next) {
            Segment last = sky.isEmpty() ? null : sky.get(sky.size() - 1);
            if (last != null && Math.abs(last.h() - s.h()) <= EPS && Math.abs(last.bearing() - s.bearing()) <= EPS) {
                sky.set(sky.size() - 1, new Segment(last.y0(), s.y1(), s.h(), s.bearing()));
            } else {
                sky.add(s);
            }
        }
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
