package kitwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;

/**
 * A tube of a bundle in the bundle's own frame, for {@link BundleDrawing}: its nesting level (0 for the host), its
 * axis offset from the host's axis and its start from the host's start end, all summed down the nest.
 */
record PlacedTube(NestedTube tube, int level, double x, double y, double start) {
    double end() {
        return start + tube.lengthMm();
    }

    /** Every tube of a bundle, host first, each followed by its guests (depth first). */
    static List<PlacedTube> of(Bundle bundle) {
        List<PlacedTube> out = new ArrayList<>();
        place(bundle.host(), 0, 0, 0, 0, out);
        return out;
    }

    private static void place(NestedTube tube, int level, double x, double y, double start, List<PlacedTube> out) {
        out.add(new PlacedTube(tube, level, x, y, start));
        for (NestedTube g : tube.guests()) {
            place(g, level + 1, x + g.centerXMm(), y + g.centerYMm(), start + g.offsetMm(), out);
        }
    }

    /**
     * Positions along the bundle where the cross-section differs: {position, total length of that cross-section,
     * tubes in it, longest stretch}. Cross-sections over less than 2 % of the length (the end allowances) are left
     * out; of the rest the {@code max} fullest are kept (then the longest), in order along the bundle.
     */
    static List<double[]> slices(List<PlacedTube> tubes, int max) {
        TreeSet<Double> cuts = new TreeSet<>();
        for (PlacedTube p : tubes) {
            cuts.add(p.start());
            cuts.add(p.end());
        }
        Map<String, double[]> sets = new LinkedHashMap<>();
        Double previous = null;
        for (double c : cuts) {
            if (previous != null && c - previous > 1e-6) {
                double mid = (previous + c) / 2;
                StringBuilder key = new StringBuilder();
                int present = 0;
                for (PlacedTube p : tubes) {
                    if (p.start() < mid && mid < p.end()) {
                        present++;
                        key.append(p.tube().mark().length()).append(':').append(p.tube().mark()).append('@')
                                .append(NestingTables.number(p.x(), 1)).append(',')
                                .append(NestingTables.number(p.y(), 1)).append(';');
                    }
                }
                int count = present;
                double[] slice = sets.computeIfAbsent(key.toString(), k -> new double[] {mid, 0, count, 0});
                slice[1] += c - previous;
                if (c - previous > slice[3]) {
                    slice[0] = mid; // drawn in the middle of its longest stretch
                    slice[3] = c - previous;
                }
            }
            previous = c;
        }
        double length = cuts.last() - cuts.first();
        List<double[]> all = new ArrayList<>(sets.values().stream().filter(v -> v[1] >= 0.02 * length).toList());
        if (all.isEmpty()) {
            all.addAll(sets.values());
        }
        all.sort((a, b) -> a[2] != b[2] ? Double.compare(b[2], a[2]) : Double.compare(b[1], a[1]));
        List<double[]> kept = new ArrayList<>(all.subList(0, Math.min(max, all.size())));
        kept.sort((a, b) -> Double.compare(a[0], b[0]));
        return kept;
    }
}
