package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;

/**
 * Exact layout search for a few guests in one host: is there a {@link HostLoad} layout that carries all of them?
 * Each guest goes into a segment of k channels it fits (k from {@link EqualCirclePacking#CHANNEL_COUNTS}) and a
 * lane of that segment; one segment per k suffices (two segments of the same k can always be joined by putting their
 * lanes end to end), a segment is as long as its fullest lane, and the segments must fit the usable length.
 * Depth-first search over (k, lane) for each guest, widest and longest guests first, pruning as soon as the segments
 * outgrow the host; identical guests take non-decreasing (k, lane), and a new lane is only opened after the used
 * ones, so symmetric layouts are tried once. Exponential in the number of guests: meant for up to about ten, and
 * every node is counted against a {@link LayoutSearchWork} budget (a spent budget fails the search).
 */
final class SegmentPacker {
    private static final double EPS = 1e-9;

    private final double usableLengthMm;
    private final HostLoad shape;
    private final double[] outer;
    private final double[] length;
    private final int[] type;
    private final int[] channelCounts;
    private final double[][] fill;
    private final int[] lanesUsed;
    private final int[] chosenK;
    private final int[] chosenLane;
    private final LayoutSearchWork work;

    private SegmentPacker(double innerDiameterMm, double usableLengthMm, double[] outer, double[] length, int[] type,
                          LayoutSearchWork work) {
        this.work = work;
        this.usableLengthMm = usableLengthMm;
        this.shape = new HostLoad(usableLengthMm, innerDiameterMm);
        this.outer = outer;
        this.length = length;
        this.type = type;
        this.channelCounts = EqualCirclePacking.CHANNEL_COUNTS.stream().mapToInt(Integer::intValue).toArray();
        this.fill = new double[channelCounts.length][];
        for (int i = 0; i < channelCounts.length; i++) {
            fill[i] = new double[channelCounts[i]];
        }
        this.lanesUsed = new int[channelCounts.length];
        this.chosenK = new int[outer.length];
        this.chosenLane = new int[outer.length];
    }

    /**
     * A layout carrying every guest (lanes list guest types), or null when none exists.
     *
     * @param guests guest tubes with their type index, sorted widest, then longest first by the caller or here
     * @param work   the node budget this search draws on; when it runs out the answer is null as well
     */
    static List<Pattern.Segment> pack(double innerDiameterMm, double usableLengthMm, List<Tube> guests,
                                      int[] typeOfGuest, LayoutSearchWork work) {
        int n = guests.size();
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (a, b) -> TubeType.LARGEST_FIRST.compare(guests.get(a), guests.get(b)));
        double[] outer = new double[n];
        double[] length = new double[n];
        int[] type = new int[n];
        for (int i = 0; i < n; i++) {
            outer[i] = guests.get(order[i]).outerDiameterMm();
            length[i] = guests.get(order[i]).lengthMm();
            type[i] = typeOfGuest[order[i]];
        }
        SegmentPacker packer = new SegmentPacker(innerDiameterMm, usableLengthMm, outer, length, type, work);
        return packer.search(0, 0) ? packer.layout() : null;
    }

    private boolean search(int guest, double used) {
        if (!work.step()) {
            return false;
        }
        if (guest == outer.length) {
            return true;
        }
        boolean sameAsPrevious = guest > 0 && type[guest] == type[guest - 1];
        for (int ki = 0; ki < channelCounts.length; ki++) {
            if (outer[guest] > shape.channelDiameterMm(channelCounts[ki]) + EPS) {
                continue;
            }
            if (sameAsPrevious && ki < chosenK[guest - 1]) {
                continue;
            }
            double segmentLength = max(fill[ki]);
            int lanes = Math.min(lanesUsed[ki] + 1, channelCounts[ki]);
            for (int lane = 0; lane < lanes; lane++) {
                if (sameAsPrevious && ki == chosenK[guest - 1] && lane < chosenLane[guest - 1]) {
                    continue;
                }
                double newFill = fill[ki][lane] + length[guest];
                double newUsed = used - segmentLength + Math.max(segmentLength, newFill);
                if (newUsed > usableLengthMm + EPS) {
                    continue;
                }
                int lanesBefore = lanesUsed[ki];
                fill[ki][lane] = newFill;
                lanesUsed[ki] = Math.max(lanesUsed[ki], lane + 1);
                chosenK[guest] = ki;
                chosenLane[guest] = lane;
                if (search(guest + 1, newUsed)) {
                    return true;
                }
                fill[ki][lane] -= length[guest];
                lanesUsed[ki] = lanesBefore;
            }
        }
        return false;
    }

    private List<Pattern.Segment> layout() {
        List<Pattern.Segment> segments = new ArrayList<>();
        for (int ki = 0; ki < channelCounts.length; ki++) {
            if (lanesUsed[ki] == 0) {
                continue;
            }
            List<List<Integer>> lanes = new ArrayList<>();
            for (int lane = 0; lane < channelCounts[ki]; lane++) {
                lanes.add(new ArrayList<>());
            }
            for (int g = 0; g < outer.length; g++) {
                if (chosenK[g] == ki) {
                    lanes.get(chosenLane[g]).add(type[g]);
                }
            }
            segments.add(new Pattern.Segment(channelCounts[ki], lanes));
        }
        return segments;
    }

    private static double max(double[] values) {
        double m = 0;
        for (double v : values) {
            m = Math.max(m, v);
        }
        return m;
    }
}
