package kitwright.packing;

import java.util.ArrayList;
import java.util.List;

/**
 * The top of what is placed in a crate so far, as segments across the width, each with its height and the length
 * from the crate's front end over which it bears (the skyline of 2D strip packing, Burke, Kendall &amp; Whitwell
 * 2004, here across the crate with bearing lengths added). A guide for where the next lane or box row goes; the
 * support of what goes there is checked on the items themselves ({@link Support}).
 */
final class Skyline {
    private static final double EPS = 1e-6;

    /** A stretch of the top surface: across [y0, y1) at height h, bearing from x = 0 to x = bearing. */
    record Segment(double y0, double y1, double h, double bearing) {
    }

    /** Where a row goes: its left edge, the height it rests at and how far along the surface under it bears. */
    record Spot(double y, double h, double bearing) {
    }

    private final List<Segment> segments = new ArrayList<>();

    /** A flat floor across [y0, width) bearing {@code length}. */
    Skyline(double y0, double width, double length) {
        segments.add(new Segment(y0, width, 0, length));
    }

    private Skyline(List<Segment> segments) {
        this.segments.addAll(segments);
    }

    Skyline copy() {
        return new Skyline(segments);
    }

    List<Segment> segments() {
        return List.copyOf(segments);
    }

    /**
     * A spot at a segment's left end where a row {@code across} wide and {@code up} high fits between the walls and
     * under the lid, borne at least {@code first} along: the lowest (then leftmost) of those that bear it
     * {@code whole} along; when none does, the lowest, then the one that bears most, then the leftmost. Null when
     * there is none.
     */
    Spot bestSpot(double wall, double across, double up, double height, double first, double whole) {
        Spot best = null;
        boolean bestWhole = false;
        for (Segment s : segments) {
            double y = s.y0();
            if (y + across > wall + EPS) {
                break;
            }
            double h = restingHeight(y, across);
            if (h + up > height + EPS) {
                continue;
            }
            // bears where a segment at the resting height lies under the axis band (axis +- across/4)
            double bearing = 0;
            for (Segment o : segments) {
                if (Math.abs(o.h() - h) <= Support.TOUCH && o.y1() > y + across / 4 + EPS
                        && o.y0() < y + 3 * across / 4 - EPS) {
                    bearing = Math.max(bearing, o.bearing());
                }
            }
            if (bearing < first - EPS) {
                continue;
            }
            boolean holdsAll = bearing >= whole - EPS;
            boolean better = best == null
                    || (holdsAll && !bestWhole)
                    || (holdsAll == bestWhole && (h < best.h() - EPS
                        || (!holdsAll && Math.abs(h - best.h()) <= EPS && bearing > best.bearing() + EPS)));
            if (better) {
                best = new Spot(y, h, bearing);
                bestWhole = holdsAll;
            }
        }
        return best;
    }

    /** The height a row across [y, y + across) rests at: the highest segment under it. */
    private double restingHeight(double y, double across) {
        double h = 0;
        for (Segment o : segments) {
            if (o.y1() > y + EPS && o.y0() < y + across - EPS) {
                h = Math.max(h, o.h());
            }
        }
        return h;
    }

    /** The surface across [a, b) becomes height h bearing to {@code bearing}; equal neighbours merge. */
    void raise(double a, double b, double h, double bearing) {
        Segment raised = new Segment(a, b, h, bearing);
        List<Segment> next = new ArrayList<>();
        boolean inserted = false;
        for (Segment s : segments) {
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
        segments.clear();
        for (Segment s : next) {
            Segment last = segments.isEmpty() ? null : segments.get(segments.size() - 1);
            if (last != null && Math.abs(last.h() - s.h()) <= EPS
                    && Math.abs(last.bearing() - s.bearing()) <= EPS) {
                segments.set(segments.size() - 1, new Segment(last.y0(), s.y1(), s.h(), s.bearing()));
            } else {
                segments.add(s);
            }
        }
    }

    /**
     * Gives up the lowest segment under [y, y + across) as waste: it is raised to the lowest of its neighbours
     * that stand higher, or to {@code lid} when none does, and bears nothing (nothing is there to rest on), so
     * that the next search looks elsewhere (the waste step of the skyline heuristic). Every call raises a
     * segment, so repeated calls end.
     */
    void waste(double y, double across, double lid) {
        int lowest = -1;
        for (int k = 0; k < segments.size(); k++) {
            Segment o = segments.get(k);
            if (o.y1() > y + EPS && o.y0() < y + across - EPS
                    && (lowest < 0 || o.h() < segments.get(lowest).h() - EPS)) {
                lowest = k;
            }
        }
        if (lowest < 0) {
            return;
        }
        Segment s = segments.get(lowest);
        Segment to = null;
        for (int k : new int[] {lowest - 1, lowest + 1}) {
            if (k >= 0 && k < segments.size() && segments.get(k).h() > s.h() + EPS
                    && (to == null || segments.get(k).h() < to.h())) {
                to = segments.get(k);
            }
        }
        raise(s.y0(), s.y1(), to == null ? lid : to.h(), 0);
    }
}
