package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;

/**
 * The pricing problem of column generation: for every stock type k, the pattern of greatest dual value
 * <pre>
 *   max  sum_i pi_i * a_i   s.t.  sum_i size_i * a_i &lt;= capacity_k,   0 &lt;= a_i &lt;= b_i,  a_i integer
 * </pre>
 * a bounded knapsack (Gilmore and Gomory 1961, "A linear programming approach to the cutting-stock problem",
 * Operations Research 9(6), solve it by dynamic programming).
 *
 * <p>Method: each bound b_i is split into parts 1, 2, 4, ..., rest, so every count 0..b_i is a sum of distinct
 * parts (Martello and Toth 1990, "Knapsack Problems", section 3.2); the parts form a 0/1 knapsack solved by one
 * dynamic programme over capacities 0..max_k capacity_k. Since {@code best[c]} is the best value within capacity c,
 * one table answers every stock type, and a bit per (part, capacity) recovers the pattern. Exact, in
 * O(C * sum_i log b_i) time and bits. The workspace lives for one solve.
 */
final class KnapsackPricing {
    private final IntegerInstance instance;
    private final double[] best;

    KnapsackPricing(IntegerInstance instance) {
        this.instance = instance;
        this.best = new double[instance.maxCapacity + 1];
    }

    /** The best pattern of every stock type, and its dual value. */
    record Priced(double[] value, Pattern[] pattern) {
    }

    /**
     * @param profit dual value per item type (pieces with no value are left out)
     * @param bound  most pieces of each type a pattern may hold
     */
    Priced price(double[] profit, int[] bound) {
        int capacity = instance.maxCapacity;
        List<int[]> parts = new ArrayList<>(); // {type, copies}
        for (int i = 0; i < instance.types(); i++) {
            int size = instance.size[i];
            if (profit[i] <= 1e-12 || bound[i] <= 0 || size > capacity) {
                continue;
            }
            int copies = Math.min(bound[i], capacity / size);
            for (int part = 1; copies > 0; part <<= 1) {
                int take = Math.min(part, copies);
                parts.add(new int[] {i, take});
                copies -= take;
            }
        }
        java.util.Arrays.fill(best, 0);
        int words = (capacity >>> 6) + 1;
        long[][] took = new long[parts.size()][words];
        for (int j = 0; j < parts.size(); j++) {
            int type = parts.get(j)[0];
            int weight = instance.size[type] * parts.get(j)[1];
            double gain = profit[type] * parts.get(j)[1];
            long[] mark = took[j];
            for (int c = capacity; c >= weight; c--) {
                double candidate = best[c - weight] + gain;
                if (candidate > best[c] + 1e-12) {
                    best[c] = candidate;
                    mark[c >>> 6] |= 1L << (c & 63);
                }
            }
        }
        double[] value = new double[instance.stocks()];
        Pattern[] pattern = new Pattern[instance.stocks()];
        for (int k = 0; k < instance.stocks(); k++) {
            int c = instance.capacity[k];
            value[k] = best[c];
            int[] counts = new int[instance.types()];
            for (int j = parts.size() - 1; j >= 0; j--) {
                if ((took[j][c >>> 6] & (1L << (c & 63))) != 0) {
                    counts[parts.get(j)[0]] += parts.get(j)[1];
                    c -= instance.size[parts.get(j)[0]] * parts.get(j)[1];
                }
            }
            pattern[k] = new Pattern(k, counts);
        }
        return new Priced(value, pattern);
    }
}
