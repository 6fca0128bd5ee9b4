package kitwright.nesting;

import java.util.List;

/**
 * A nesting pattern: which guests one host of a given type carries directly, and how they lie in its bore.
 *
 * @param hostType index of the host's {@link TubeType}
 * @param counts   guests of each type, the types with none left out
 * @param segments the layout, in order along the host: each segment's channel count and, per channel, the guest
 *                 types end to end
 */
record Pattern(int hostType, TypeCounts counts, List<Segment> segments) {
    Pattern {
        java.util.Objects.requireNonNull(counts, "counts");
        segments = List.copyOf(segments);
    }

    /** One segment of a layout. */
    record Segment(int channels, List<List<Integer>> lanes) {
        Segment {
            lanes = lanes.stream().map(List::copyOf).toList();
            if (lanes.size() != channels) {
                throw new IllegalArgumentException(channels + " channels but " + lanes.size() + " lanes");
            }
        }
    }

    int guests() {
        return counts.total();
    }
}
