package kitwright.sweep;

import java.util.List;

/**
 * Problem: share K marks among the sections, each at least the marks its greedy count needs for the largest change
 * D, so that the sum of the sections' least squared changes is least.
 *
 * <p>Method: a dynamic programme over the sections (a knapsack over marks): G[s][m] = min over k of G[s-1][m-k] +
 * cost_s(k). O(S K²).
 *
 * <p>Guarantee: the least total over all shares that use exactly K marks (K at most the distinct lengths); as a
 * section's cost never rises with one more mark (a group split keeps the parent's mark feasible for both halves),
 * this is also the least over shares of at most K marks. Ties go to the share with fewer marks in earlier sections.
 */
final class MarkSplit {
    private MarkSplit() {
    }

    /**
     * @param sections each section's solved groupings
     * @param marks    K
     * @return the marks of each section, or null when no share exists
     */
    static int[] split(List<LeastSquaresGroups> sections, int marks) {
        int s = sections.size();
        long none = LeastSquaresGroups.NONE;
        long[][] best = new long[s + 1][marks + 1];
        int[][] take = new int[s + 1][marks + 1];
        for (int m = 1; m <= marks; m++) {
            best[0][m] = none;
        }
        for (int t = 1; t <= s; t++) {
            LeastSquaresGroups section = sections.get(t - 1);
            for (int m = 0; m <= marks; m++) {
                long value = none;
                int chosen = 0;
                for (int k = 1; k <= Math.min(m, section.maxGroups()); k++) {
                    long before = best[t - 1][m - k];
                    long cost = section.cost(k);
                    if (before == none || cost == none) {
                        continue;
                    }
                    if (before + cost < value) {
                        value = before + cost;
                        chosen = k;
                    }
                }
                best[t][m] = value;
                take[t][m] = chosen;
            }
        }
        if (best[s][marks] == none) {
            return null;
        }
        int[] share = new int[s];
        for (int t = s, m = marks; t >= 1; t--) {
            share[t - 1] = take[t][m];
            m -= share[t - 1];
        }
        return share;
    }
}
