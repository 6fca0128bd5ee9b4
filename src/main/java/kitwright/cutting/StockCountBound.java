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
    /** Most count vectors kept, and most numbers they hold together (memory: 8 bytes each). */
    private static final int MAX_VECTORS = 20_000;
    private static final long MAX_CELLS = 4_000_000;
    /** The deadline is read once per this many steps of work. */
    private static final int CLOCK_EVERY = 1024;

    private StockCountBound() {
    }

    /**
     * @param bound    the raised lower bound, integer cost units
     * @param counts   a cheapest count vector whose relaxation covers the demand, or null when none was decided
     * @param timedOut whether the wall-clock deadline, rather than the work limits, ended the search early
     */
    record Result(long bound, int[] counts, boolean timedOut) {
    }

    /**
     * @param maxTests relaxations solved at most
     * @param maxWork  steps of the listing (search nodes and dominance checks) at most: a deterministic limit
     */
    static Result raise(IntegerInstance instance, ColumnGeneration generation, long lower, long incumbent,
                        int maxTests, long maxWork, Deadline deadline) {
        int[] demand = instance.demands();
        int pieces = instance.totalPieces(demand);
        int[] most = new int[instance.stocks()];
        for (int k = 0; k < most.length; k++) {
            most[k] = instance.limited(k) ? Math.min(instance.limit[k], pieces) : pieces;
        }
        if (deadline.passed()) {
            return new Result(lower, null, true);
        }
        Listing listing = new Listing(instance, most, instance.load(demand), lower, incumbent, maxWork, deadline);
        if (!listing.complete()) {
            return new Result(lower, null, listing.timedOut);
        }
        List<long[]> vectors = listing.out;
        vectors.sort(Comparator.<long[]>comparingLong(v -> v[0]).thenComparing(Arrays::compare));
        List<int[]> infeasible = new ArrayList<>();
        int tests = 0;
        for (long[] vector : vectors) {
            int[] counts = new int[instance.stocks()];
            for (int k = 0; k < counts.length; k++) {
                counts[k] = (int) vector[k + 1];
            }
            // every cheaper vector is decided here, so this vector's cost is a valid bound if the work stops now
            if (!listing.spend(infeasible.size())) {
                return new Result(vector[0], null, listing.timedOut);
            }
            if (infeasible.stream().anyMatch(known -> below(counts, known))) {
                continue;
            }
            if (tests >= maxTests || generation.exhausted() || deadline.passed()) {
                return new Result(vector[0], null, deadline.passed());
            }
            tests++;
            ColumnGeneration.Relaxation relaxation = generation.solve(demand, counts);
            if (relaxation.kind() == ColumnGeneration.Kind.INFEASIBLE) {
                infeasible.add(counts);
            } else if (relaxation.kind() == ColumnGeneration.Kind.UNDECIDED) {
                return new Result(vector[0], null, deadline.passed());
            } else {
                return new Result(vector[0], counts, false);
            }
        }
        return new Result(incumbent, null, false);
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
     * Lists count vectors with cost in [lower, incumbent) and capacity at least the pieces' size, depth first over
     * the stock types, free ones taken at their limit. A branch is cut when even the stock types after it at their
     * most cannot reach the size or the lower cost, which leaves the list unchanged. The listing stops, incomplete,
     * after more than MAX_VECTORS vectors, when the work limit is spent, or when the deadline has passed.
     */
    private static final class Listing {
        private final IntegerInstance instance;
        private final int[] most;
        private final long size;
        private final long lower;
        private final long incumbent;
        private final long[] capacityAfter;
        private final long[] costAfter;
        private final int maxVectors;
        private final Deadline deadline;
        private final long[] current;
        final List<long[]> out = new ArrayList<>(); // {cost, m_0, ..., m_K-1}
        private long work;
        private boolean timedOut;
        private boolean stopped;

        Listing(IntegerInstance instance, int[] most, long size, long lower, long incumbent, long maxWork,
                Deadline deadline) {
            this.instance = instance;
            this.most = most;
            this.size = size;
            this.lower = lower;
            this.incumbent = incumbent;
            this.deadline = deadline;
            this.work = maxWork;
            int stocks = instance.stocks();
            this.maxVectors = (int) Math.min(MAX_VECTORS, MAX_CELLS / (stocks + 1));
            this.current = new long[stocks + 1];
            capacityAfter = new long[stocks + 1];
            costAfter = new long[stocks + 1];
            for (int k = stocks - 1; k >= 0; k--) {
                capacityAfter[k] = capacityAfter[k + 1] + (long) most[k] * instance.capacity[k];
                costAfter[k] = costAfter[k + 1] + (instance.cost[k] == 0 ? 0 : most[k] * instance.cost[k]);
            }
            visit(0, 0, 0);
        }

        boolean complete() {
            return !stopped;
        }

        /** Takes {@code steps} steps of work (at least one); false when the work limit or the deadline ends it. */
        boolean spend(long steps) {
            long before = work;
            work -= Math.max(1, steps);
            if (work < 0) {
                stopped = true;
            } else if (before / CLOCK_EVERY != work / CLOCK_EVERY && deadline.passed()) {
                stopped = true;
                timedOut = true;
            }
            return !stopped;
        }

        private void visit(int k, long cost, long capacity) {
            if (stopped || !spend(1)) {
                return;
            }
            if (capacity + capacityAfter[k] < size || cost + costAfter[k] < lower) {
                return;
            }
            if (k == instance.stocks()) {
                if (cost < incumbent) {
                    current[0] = cost;
                    out.add(current.clone());
                    stopped = out.size() > maxVectors;
                }
                return;
            }
            if (instance.cost[k] == 0) {
                current[k + 1] = most[k];
                visit(k + 1, cost, capacity + (long) most[k] * instance.capacity[k]);
                return;
            }
            for (int m = 0; m <= most[k] && cost + m * instance.cost[k] < incumbent && !stopped; m++) {
                current[k + 1] = m;
                visit(k + 1, cost + m * instance.cost[k], capacity + (long) m * instance.capacity[k]);
            }
            current[k + 1] = 0;
        }
    }
}
