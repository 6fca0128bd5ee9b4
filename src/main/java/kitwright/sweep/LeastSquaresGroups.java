package kitwright.sweep;

import java.util.ArrayList;
import java.util.List;

/**
 * Problem: split one section's distinct target lengths into exactly k contiguous groups, each served by one mark
 * within the largest change D, with the least total sum of squared changes; for every k up to a bound at once.
 *
 * <p>Method: the dynamic programme of optimal 1D k-means over sorted values (Wang and Song, "Ckmeans.1d.dp:
 * Optimal k-means clustering in one dimension by dynamic programming", The R Journal 3(2), 2011): F[k][j] = min over
 * i of F[k-1][i-1] + cost(i..j), with two changes. A group may span at most 2D (so i starts at the first length
 * within 2D of length j), and its mark is the mean clamped to [max - D, min + D] in whole tenths
 * ({@link GroupCost}) instead of the plain mean. Optimal groups of sorted values are contiguous for this cost too:
 * in any grouping the marks can be sorted and every length sent to its nearest mark without raising the largest
 * or the squared changes. O(k n w) time for w lengths within 2D of each other.
 *
 * <p>Guarantee: for each k the least sum of squared changes over all groupings into k groups within D (no grouping
 * when fewer than the greedy count); ties go to the grouping whose last group starts earliest, deterministically.
 */
final class LeastSquaresGroups {
    /** No grouping. */
    static final long NONE = Long.MAX_VALUE;

    private final GroupCost costs;
    private final long change;
    private final long[][] best;
    private final int[][] start;

    private LeastSquaresGroups(GroupCost costs, long change, int maxGroups) {
        this.costs = costs;
        this.change = change;
        int n = costs.size();
        int groups = Math.min(maxGroups, n);
        best = new long[groups + 1][n];
        start = new int[groups + 1][n];
        int[] first = new int[n];
        for (int j = 0, i = 0; j < n; j++) {
            while (!costs.fits(i, j, change)) {
                i++;
            }
            first[j] = i;
        }
        for (int k = 1; k <= groups; k++) {
            for (int j = 0; j < n; j++) {
                long value = NONE;
                int from = -1;
                for (int i = Math.max(first[j], k - 1); i <= j; i++) {
                    long before = k == 1 ? (i == 0 ? 0 : NONE) : (i == 0 ? NONE : best[k - 1][i - 1]);
                    if (before == NONE) {
                        continue;
                    }
                    long total = before + costs.cost(i, j, change);
                    if (total < value) {
                        value = total;
                        from = i;
                    }
                }
                best[k][j] = value;
                start[k][j] = from;
            }
        }
    }

    /**
     * @param section   the section's lengths
     * @param change    the largest change D in tenths
     * @param maxGroups the largest k wanted
     */
    static LeastSquaresGroups solve(SectionLengths section, long change, int maxGroups) {
        return new LeastSquaresGroups(new GroupCost(section.values(), section.weights()), change, maxGroups);
    }

    /** The largest k solved: the bound, or the number of distinct lengths when fewer. */
    int maxGroups() {
        return best.length - 1;
    }

    /** The least sum of squared changes (tenths²) with exactly k groups, or {@link #NONE}. */
    long cost(int k) {
        return k < 1 || k > maxGroups() ? NONE : best[k][costs.size() - 1];
    }

    /** The k groups of the optimum, ascending; k must have a grouping. */
    List<Group> groups(int k) {
        List<Group> groups = new ArrayList<>();
        int j = costs.size() - 1;
        for (int g = k; g >= 1; g--) {
            int i = start[g][j];
            groups.add(0, new Group(costs.value(i), costs.value(j), costs.mark(i, j, change)));
            j = i - 1;
        }
        return groups;
    }

    /**
     * One group of target lengths and its mark.
     *
     * @param shortestTenths the group's shortest target length
     * @param longestTenths  its longest
     * @param markTenths     the mark's node-to-node length
     */
    record Group(long shortestTenths, long longestTenths, long markTenths) {
    }
}
