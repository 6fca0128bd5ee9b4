package kitwright.packing;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Bundles into lanes along a crate: one-dimensional bin packing by best-fit decreasing. Each bundle goes into the
 * open lane with the least length left that still takes it, else opens a lane. Offered in order of decreasing
 * diameter (and length), so a lane's first bundle is its widest and sets its cell, and thinner bundles fill the
 * far ends of wider lanes. Like first-fit decreasing, best-fit decreasing opens at most 11/9 OPT + 4 lanes
 * (Johnson 1973; the tight additive constant 6/9 for first-fit decreasing is Dósa 2007); O(n log n) with the open
 * lanes kept by length left.
 */
final class LaneBuilder {
    private static final double EPS = 1e-6;

    /** A lane: its cell diameter and the bundles in it, end to end from x = 0, {@code lengthMm} long. */
    record Lane(double cellMm, List<ItemType> items, double lengthMm) {
        Lane {
            double sum = items.stream().mapToDouble(ItemType::lengthMm).sum();
            if (Math.abs(lengthMm - sum) > EPS * Math.max(1, sum)) {
                throw new IllegalArgumentException("a lane's length is the sum of its bundles' lengths");
            }
        }

        Lane(double cellMm, List<ItemType> items) {
            this(cellMm, items, items.stream().mapToDouble(ItemType::lengthMm).sum());
        }

        double lightestKg() {
            return items.stream().mapToDouble(ItemType::massKg).min().orElse(0);
        }
    }

    /** Lanes of capacity {@code length} for the bundles, in the order they were opened. */
    List<Lane> build(List<ItemType> bundles, double length) {
        List<Lane> lanes = new ArrayList<>();
        TreeMap<Double, ArrayDeque<Integer>> byLengthLeft = new TreeMap<>();
        List<Double> left = new ArrayList<>();
        for (ItemType t : bundles) {
            Map.Entry<Double, ArrayDeque<Integer>> fit = byLengthLeft.ceilingEntry(t.lengthMm() - EPS);
            int lane;
            if (fit == null) {
                lane = lanes.size();
                lanes.add(new Lane(t.diameterMm(), new ArrayList<>()));
                left.add(length);
            } else {
                lane = fit.getValue().pollFirst();
                if (fit.getValue().isEmpty()) {
                    byLengthLeft.remove(fit.getKey());
                }
            }
            lanes.get(lane).items().add(t);
            double rest = left.get(lane) - t.lengthMm();
            left.set(lane, rest);
            byLengthLeft.computeIfAbsent(rest, k -> new ArrayDeque<>()).addLast(lane);
        }
        return lanes.stream().map(l -> new Lane(l.cellMm(), List.copyOf(l.items()))).toList();
    }
}
