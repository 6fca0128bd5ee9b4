package kitwright.loading;

import java.util.ArrayList;
import java.util.List;

/**
 * The maximal ways to fill one lane of a deck with crates end to end: multisets of crate lengths whose sum stays
 * within the deck length and to which no further crate fits. Crates that stand in one orientation only and never
 * more than k side by side (each wider than W / (k + 1)) split into k such lanes: their extents along the deck form
 * an interval graph of clique number at most k, which k colours colour (interval graphs are perfect), and each
 * colour is a lane. So "lanes used <= k per vehicle, each a pattern" is a valid relaxation.
 */
final class LanePatterns {
    private static final double EPS = 1e-6;

    private LanePatterns() {
    }

    /**
     * @param lengths along-deck length of each class
     * @param limit   the most patterns to list
     * @return counts per class of each maximal pattern, or null when there are more than {@code limit}
     */
    static List<int[]> maximal(double[] lengths, double deckLength, int limit) {
        List<int[]> patterns = new ArrayList<>();
        double shortest = Double.POSITIVE_INFINITY;
        for (double l : lengths) {
            shortest = Math.min(shortest, l);
        }
        boolean complete = fill(lengths, deckLength, shortest, 0, new int[lengths.length], 0, patterns, limit);
        return complete ? patterns : null;
    }

    private static boolean fill(double[] lengths, double deckLength, double shortest, int from, int[] counts,
                                double used, List<int[]> patterns, int limit) {
        if (from == lengths.length) {
            if (used > EPS && used + shortest > deckLength + EPS) {
                patterns.add(counts.clone());
            } else if (used > EPS && isMaximal(lengths, deckLength, used)) {
                patterns.add(counts.clone());
            }
            return patterns.size() <= limit;
        }
        int most = (int) Math.floor((deckLength - used) / lengths[from] + EPS);
        for (int n = most; n >= 0; n--) {
            counts[from] = n;
            if (!fill(lengths, deckLength, shortest, from + 1, counts, used + n * lengths[from], patterns, limit)) {
                counts[from] = 0;
                return false;
            }
        }
        counts[from] = 0;
        return true;
    }

    private static boolean isMaximal(double[] lengths, double deckLength, double used) {
        for (double l : lengths) {
            if (used + l <= deckLength + EPS) {
                return false;
            }
        }
        return true;
    }
}
