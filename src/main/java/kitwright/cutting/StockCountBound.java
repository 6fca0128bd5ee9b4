package kitwright.cutting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * A lower bound from whole stock counts: every plan buys a whole number {@code m_k} of pieces of each stock type,
 * and its patterns then cover the demand within those counts. So
 * <pre>
 *   OPT &gt;= min { sum_k c_k m_k : m integer, m_k &lt;= u_k, the relaxation with sum_{p of k} x_p &lt;= m_k is feasible }
 * </pre>
 * a relaxation between the linear programme (fractional counts) and the integer problem, which for several stock
 * lengths closes much of the gap the LP bound leaves (for one length and price it is the rounded-up LP bound).
 *
 * <p>Method: all count vectors costing between the LP bound and the best plan's cost are listed (free stock types
 * at their limit), those whose capacity cannot hold the pieces' total size dropped; they are tested in order of
 * cost by the phase one of {@link ColumnGeneration}. A vector below an infeasible one is infeasible too and is
 * skipped. The first feasible vector's cost is the bound; when the work runs out, the cost of the first vector not
 * yet decided is still a valid bound, since every cheaper one was shown infeasible. When every vector is
 * infeasible, the best plan is optimal. In the spirit of the "integer round-up" arguments for cutting stock
 * (Scheithauer and Terno 1995, EJOR 84) applied to the stock counts.
 */
final class StockCountBound {
    private static final int MAX_VECTORS = 20_000;

    private StockCountBound() {
    }

    /**
     * @param bound  the raised lower bound, integer cost units
     * @param counts a cheapest count vector whose relaxation covers the demand, or null when none was decided
     */
    record Result(long bound, int[] counts) {
    }

    static Result raise(IntegerInstance instance, ColumnGeneration generation, long lower, long incumbent,
                        int maxTests, Deadline deadline) {
        int[] demand = instance.demands();
        int pieces = instance.totalPieces(demand);
        int[] most = new int[instance.stocks()];
        for (int k = 0; k < most.length; k++) {
            most[k] = instance.limited(k) ? Math.min(instance.limit[k], pieces) : pieces;
        }
        List<long[]> vectors = new ArrayList<>(); // {cost, m_0, ..., m_K-1}
        long[] current = new long[instance.stocks() + 1];
        if (!enumerate(instance, most, instance.load(demand), lower, incumbent, 0, 0, 0, current, vectors)) {
            return new Result(lower, null);
        }
        vectors.sort(Comparator.<long[]>comparingLong(v -> v[0]).thenComparing(Arrays::compare));
        List<int[]> infeasible = new ArrayList<>();
        int tests = 0;
        for (long[] vector : vectors) {
            int[] counts = new int[instance.stocks()];
            for (int k = 0; k < counts.length; k++) {
                counts[k] = (int) vector[k + 1];
            }
            if (infeasible.stream().anyMatch(known -> below(counts, known))) {
                continue;
            }
            if (tests >= maxTests || generation.exhausted() || deadline.passed()) {
                return new Result(vector[0], null);
            }
            tests++;
            ColumnGeneration.Relaxation relaxation = generation.solve(demand, counts);
            if (relaxation.kind() == ColumnGeneration.Kind.INFEASIBLE) {
                infeasible.add(counts);
            } else if (relaxation.kind() == ColumnGeneration.Kind.UNDECIDED) {
                return new Result(vector[0], null);
            } else {
                return new Result(vector[0], counts);
            }
        }
        return new Result(incumbent, null);
    }

    private static boolean below(int[] counts, int[] other) {
        for (int k = 0; k < counts.length; k++) {
            if (counts[k] > other[k]) {
                return false;
            }
        }
        return true;
    }

    /**
     * Lists count vectors with cost in [lower, incumbent) and capacity at least the pieces' size; false when there
     * are more than MAX_VECTORS of them. Free stock types are taken at their limit.
     */
    private static boolean enumerate(IntegerInstance instance, int[] most, long size, long lower, long incumbent,
                                     int k, long cost, long capacity, long[] current, List<long[]> out) {
        if (k == instance.stocks()) {
            if (cost >= lower && cost < incumbent && capacity >= size) {
                current[0] = cost;
                out.add(current.clone());
            }
            return out.size() <= MAX_VECTORS;
        }
        if (instance.cost[k] == 0) {
            current[k + 1] = most[k];
            return enumerate(instance, most, size, lower, incumbent, k + 1, cost,
                    capacity + (long) most[k] * instance.capacity[k], current, out);
        }
        for (int m = 0; m <= most[k] && cost + m * instance.cost[k] < incumbent; m++) {
            current[k + 1] = m;
            if (!enumerate(instance, most, size, lower, incumbent, k + 1, cost + m * instance.cost[k],
                    capacity + (long) m * instance.capacity[k], current, out)) {
                return false;
            }
        }
        current[k + 1] = 0;
        return true;
    }
}
