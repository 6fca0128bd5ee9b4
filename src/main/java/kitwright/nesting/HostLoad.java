package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;

/**
 * What one host carries in its bore, as segments along its usable length. A segment is a stretch of the host in
 * which the bore is divided into k equal channels laid out by {@link EqualCirclePacking}; each channel holds guests
 * end to end. A guest fits a channel when its outside diameter is at most the channel's diameter, so its circle
 * stays inside the bore less the clearance and clear of the other channels. Segments follow each other along the
 * host from the end allowance on; their lengths add up to at most the usable length.
 *
 * <p>Mutable working state of one nesting run, never shared between runs.
 */
final class HostLoad {
    private static final double EPS = 1e-9;

    private final double usableLengthMm;
    private final double innerDiameterMm;
    private final List<Segment> segments = new ArrayList<>();

    /** One stretch of the host with its channels. */
    static final class Segment {
        final int channels;
        final double channelDiameterMm;
        double lengthMm;
        final List<List<Integer>> lanes = new ArrayList<>();
        final List<List<Double>> laneLengths = new ArrayList<>();
        /** Length taken in each channel, kept up to date so that placing n guests stays O(n), not O(n^2). */
        private final double[] fills;

        Segment(int channels, double channelDiameterMm) {
            this.channels = channels;
            this.channelDiameterMm = channelDiameterMm;
            this.fills = new double[channels];
            for (int i = 0; i < channels; i++) {
                lanes.add(new ArrayList<>());
                laneLengths.add(new ArrayList<>());
            }
        }

        /** The sum of the channel's guest lengths, added in lane order (the same sum a loop over the lane gives). */
        double fill(int channel) {
            return fills[channel];
        }

        void add(int channel, int tube, double lengthMm) {
            lanes.get(channel).add(tube);
            laneLengths.get(channel).add(lengthMm);
            fills[channel] += lengthMm;
        }

        void removeAt(int channel, int index) {
            lanes.get(channel).remove(index);
            laneLengths.get(channel).remove(index);
            double sum = 0;
            for (double length : laneLengths.get(channel)) {
                sum += length;
            }
            fills[channel] = sum;
        }
    }

    HostLoad(double usableLengthMm, double innerDiameterMm) {
        this.usableLengthMm = usableLengthMm;
        this.innerDiameterMm = innerDiameterMm;
    }

    double usableLengthMm() {
        return usableLengthMm;
    }

    double usedLengthMm() {
        double sum = 0;
        for (Segment s : segments) {
            sum += s.lengthMm;
        }
        return sum;
    }

    List<Segment> segments() {
        return segments;
    }

    boolean isEmpty() {
        return segments.stream().allMatch(s -> s.lanes.stream().allMatch(List::isEmpty));
    }

    /** Diameter of each channel when the bore (less the clearance) is split into k equal channels. */
    double channelDiameterMm(int channels) {
        return innerDiameterMm / EqualCirclePacking.ratio(channels);
    }

    /** The most channels a guest of this outside diameter can share the bore with, or 0 when it does not fit. */
    int mostChannels(double outerMm) {
        int best = 0;
        for (int k : EqualCirclePacking.CHANNEL_COUNTS) {
            if (outerMm <= channelDiameterMm(k) + EPS) {
                best = k;
            }
        }
        return best;
    }

    /**
     * Places a guest where it fits, first in a channel with room in an existing segment (tightest first), then by
     * lengthening a segment or opening a new one with as many channels as the guest allows, whichever takes less of
     * the free length (a new segment on a tie, for its spare channels). Returns false and changes nothing when the
     * guest does not fit.
     */
    boolean tryAdd(int tube, double outerMm, double lengthMm) {
        int bestSegment = -1;
        int bestChannel = -1;
        double bestLeft = Double.POSITIVE_INFINITY;
        for (int s = 0; s < segments.size(); s++) {
            Segment seg = segments.get(s);
            if (outerMm > seg.channelDiameterMm + EPS) {
                continue;
            }
            for (int c = 0; c < seg.channels; c++) {
                double left = seg.lengthMm - seg.fill(c) - lengthMm;
                if (left >= -EPS && left < bestLeft - EPS) {
                    bestLeft = left;
                    bestSegment = s;
                    bestChannel = c;
                }
            }
        }
        if (bestSegment >= 0) {
            append(bestSegment, bestChannel, tube, lengthMm);
            return true;
        }
        double free = usableLengthMm - usedLengthMm();
        double bestGrowth = Double.POSITIVE_INFINITY;
        for (int s = 0; s < segments.size(); s++) {
            Segment seg = segments.get(s);
            if (outerMm > seg.channelDiameterMm + EPS) {
                continue;
            }
            for (int c = 0; c < seg.channels; c++) {
                double growth = seg.fill(c) + lengthMm - seg.lengthMm;
                if (growth <= free + EPS && growth < bestGrowth - EPS) {
                    bestGrowth = growth;
                    bestSegment = s;
                    bestChannel = c;
                }
            }
        }
        int channels = mostChannels(outerMm);
        boolean newSegmentFits = channels > 0 && lengthMm <= free + EPS;
        if (bestSegment >= 0 && (!newSegmentFits || bestGrowth < lengthMm - EPS)) {
            append(bestSegment, bestChannel, tube, lengthMm);
            return true;
        }
        if (newSegmentFits) {
            append(addSegment(channels), 0, tube, lengthMm);
            return true;
        }
        return false;
    }

    /** Opens an empty segment of k channels at the far end; returns its index. */
    int addSegment(int channels) {
        segments.add(new Segment(channels, channelDiameterMm(channels)));
        return segments.size() - 1;
    }

    /**
     * Appends a guest to the end of a channel, lengthening the segment when needed. Returns false and changes
     * nothing when the guest is too wide for the channel or the host's usable length would be exceeded.
     */
    boolean appendIfFits(int segment, int channel, int tube, double outerMm, double lengthMm) {
        Segment seg = segments.get(segment);
        if (outerMm > seg.channelDiameterMm + EPS) {
            return false;
        }
        double growth = Math.max(0, seg.fill(channel) + lengthMm - seg.lengthMm);
        if (usedLengthMm() + growth > usableLengthMm + EPS) {
            return false;
        }
        append(segment, channel, tube, lengthMm);
        return true;
    }

    private void append(int segment, int channel, int tube, double lengthMm) {
        Segment seg = segments.get(segment);
        seg.add(channel, tube, lengthMm);
        seg.lengthMm = Math.max(seg.lengthMm, seg.fill(channel));
    }

    /** Takes a guest out; the guests behind it in its channel move up. Returns false when it is not here. */
    boolean remove(int tube) {
        for (Segment seg : segments) {
            for (int c = 0; c < seg.channels; c++) {
                List<Integer> lane = seg.lanes.get(c);
                for (int i = 0; i < lane.size(); i++) {
                    if (lane.get(i) == tube) {
                        seg.removeAt(c, i);
                        seg.lengthMm = 0;
                        for (int other = 0; other < seg.channels; other++) {
                            seg.lengthMm = Math.max(seg.lengthMm, seg.fill(other));
                        }
                        return true;
                    }
                }
            }
        }
        return false;
    }

    /**
     * Final positions of the guests: {tube, centre x, centre y, offset from the host's end}, in segment, channel and
     * lane order. Segments start at the end allowance and follow each other without gaps.
     */
    List<double[]> positions(double endAllowanceMm) {
        List<double[]> out = new ArrayList<>();
        double start = endAllowanceMm;
        for (Segment seg : segments) {
            double[][] centres = EqualCirclePacking.centres(seg.channels);
            double radius = seg.channelDiameterMm / 2;
            for (int c = 0; c < seg.channels; c++) {
                double along = start;
                List<Integer> lane = seg.lanes.get(c);
                for (int i = 0; i < lane.size(); i++) {
                    out.add(new double[] {lane.get(i), centres[c][0] * radius, centres[c][1] * radius, along});
                    along += seg.laneLengths.get(c).get(i);
                }
            }
            start += seg.lengthMm;
        }
        return out;
    }
}
