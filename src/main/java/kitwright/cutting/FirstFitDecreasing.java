package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Origin;
import kitwright.model.Status;

/**
 * First-fit decreasing, the baseline every plan is compared with.
 *
 * <p>Method: take the pieces by decreasing length; put each into the first opened stock piece (in opening order)
 * where it fits; otherwise open the stock length with the lowest price per millimetre among those still available
 * that can hold it. Ties go to rack offcuts before mill stock, then to the longer length, then to catalog order
 * (without prices every length costs the same per millimetre). The first fitting stock piece is found in
 * O(log n) with a tree of free capacities, so the rule runs in O(N log N) for N pieces.
 *
 * <p>Guarantee: for one stock length, FFD uses at most 11/9 OPT + 6/9 stock pieces (Dósa 2007, "The tight bound
 * of first fit decreasing bin-packing algorithm is FFD(I) &lt;= 11/9 OPT(I) + 6/9"). Its plan is FEASIBLE with the
 * simple bound of {@link AchievableValues}; it is OPTIMAL only when it meets that bound. When it cannot place a
 * piece (limited stock) it reports INFEASIBLE naming the pieces left over: this baseline's word is not a proof;
 * {@link CuttingStockOptimizer} proves infeasibility with the linear relaxation.
 */
public final class FirstFitDecreasing implements SectionSolver {

    @Override
    public SectionCutPlan solve(SectionProblem problem, CutProgress progress) {
        IntegerInstance instance = new IntegerInstance(problem);
        Result result = pack(instance, instance.demands(), instance.limits());
        if (!result.complete()) {
            return PlanAssembler.infeasible(problem, Shortage.reason(instance, result.unplaced(),
                    "first-fit decreasing found no stock for"));
        }
        long bound = AchievableValues.materialBound(instance, instance.demands());
        long cost = result.packing().cost(instance);
        long rounded = AchievableValues.trueLengthBound(instance,
                AchievableValues.nextAchievable(instance, bound, cost), cost);
        Status status = cost <= rounded ? Status.OPTIMAL : Status.FEASIBLE;
        return PlanAssembler.plan(instance, result.packing(), status, Math.min(rounded, cost));
    }

    /** The stock pieces opened, and the pieces per item type that found no stock. */
    record Result(Packing packing, int[] unplaced) {
        boolean complete() {
            for (int u : unplaced) {
                if (u > 0) {
                    return false;
                }
            }
            return true;
        }
    }

    /**
     * First-fit decreasing on the given demand per item type and stock left per stock type (-1 = unlimited).
     */
    static Result pack(IntegerInstance instance, int[] demand, int[] available) {
        int types = instance.types();
        int pieces = instance.totalPieces(demand);
        int[] left = available.clone();
        FreeTree tree = new FreeTree(Math.max(1, pieces));
        List<Integer> stockOf = new ArrayList<>();
        List<int[]> countsOf = new ArrayList<>();
        int[] unplaced = new int[types];
        // item types are already sorted by decreasing size
        for (int i = 0; i < types; i++) {
            for (int n = 0; n < demand[i]; n++) {
                int w = instance.size[i];
                int bin = tree.firstFit(w);
                if (bin < 0) {
                    int k = cheapestPerMillimetre(instance, left, w);
                    if (k < 0) {
                        unplaced[i]++;
                        continue;
                    }
                    if (left[k] > 0) {
                        left[k]--;
                    }
                    bin = stockOf.size();
                    stockOf.add(k);
                    countsOf.add(new int[types]);
                    tree.set(bin, instance.capacity[k]);
                }
                countsOf.get(bin)[i]++;
                tree.set(bin, tree.get(bin) - w);
            }
        }
        List<Pattern> opened = new ArrayList<>();
        for (int b = 0; b < stockOf.size(); b++) {
            opened.add(new Pattern(stockOf.get(b), countsOf.get(b)));
        }
        return new Result(new Packing(opened), unplaced);
    }

    private static int cheapestPerMillimetre(IntegerInstance instance, int[] left, int size) {
        int best = -1;
        for (int k = 0; k < instance.stocks(); k++) {
            if (left[k] == 0 || instance.capacity[k] < size) {
                continue;
            }
            if (best < 0 || better(instance, k, best)) {
                best = k;
            }
        }
        return best;
    }

    /** Lower price per millimetre; then rack before mill; then longer; then earlier in the catalog. */
    private static boolean better(IntegerInstance instance, int k, int best) {
        StockOption a = instance.problem.stock().get(k);
        StockOption b = instance.problem.stock().get(best);
        // compare cost_k / L_k with cost_best / L_best without division
        double left = instance.cost[k] * b.lengthMm();
        double right = instance.cost[best] * a.lengthMm();
        if (Math.abs(left - right) > 1e-9 * Math.max(1, Math.abs(left))) {
            return left < right;
        }
        if (a.origin() != b.origin()) {
            return a.origin() == Origin.RACK;
        }
        return a.lengthMm() > b.lengthMm();
    }

    /** A max-tree over the free capacity of opened stock pieces, to find the first piece with room. */
    private static final class FreeTree {
        private final int leaves;
        private final int[] max;

        FreeTree(int n) {
            int size = 1;
            while (size < n) {
                size <<= 1;
            }
            leaves = size;
            max = new int[2 * size];
            java.util.Arrays.fill(max, -1);
        }

        int get(int index) {
            return max[leaves + index];
        }

        void set(int index, int value) {
            int node = leaves + index;
            max[node] = value;
            for (node >>= 1; node >= 1; node >>= 1) {
                max[node] = Math.max(max[2 * node], max[2 * node + 1]);
            }
        }

        /** The leftmost index with free capacity at least {@code size}, or -1. */
        int firstFit(int size) {
            if (max[1] < size) {
                return -1;
            }
            int node = 1;
            while (node < leaves) {
                node = max[2 * node] >= size ? 2 * node : 2 * node + 1;
            }
            return node - leaves;
        }
    }
}
