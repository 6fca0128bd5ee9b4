package kitwright.cutting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.function.Consumer;

/**
 * Residual rounding with column generation, as a depth-first dive: fix whole stock pieces from the relaxation,
 * solve the relaxation of what is left, repeat, and finish the last few pieces directly.
 *
 * <p>At each node the candidates are: every column at its rounded-down value {@code floor(x_p)} (when some
 * column reaches 1; in large sections with many fractional columns, every column of value 1/2 or more rounded up
 * instead), then one piece of each of the columns with the largest fractional values (rounding up).
 * Fixed patterns are cut down to the residual demand. The residual relaxation is solved again by column
 * generation, reusing all columns. A node is cut off when its fixed cost plus the residual's lower bound
 * (rounded up) exceeds the goal. With one candidate per node this is the classic sequential rounding heuristic
 * (Wäscher and Gau 1996, "Heuristics for the integer one-dimensional cutting stock problem: a computational
 * study", OR Spektrum 18); with a few candidates and the goal set to the lower bound it becomes a limited
 * backtracking search for a plan that meets the bound, in the spirit of the diving heuristics of branch-and-price
 * (Sadykov, Vanderbeck et al. 2019, "Primal heuristics for branch and price: the assets of diving methods",
 * INFORMS Journal on Computing 31(2)). Residuals of a few pieces are finished by first-fit decreasing, or by the
 * exact {@link ArcFlowModel} when its graph is tiny.
 *
 * <p>Work is bounded by a number of nodes (each one relaxation), counted deterministically.
 */
final class DivingHeuristic {
    /** Residuals up to this many pieces are finished directly. */
    private static final int FINISH_PIECES = 24;
    private static final int FINISH_ARCS = 4_000;
    /** Above this many fractional columns a node rounds all columns of value 1/2 or more up at once. */
    private static final int MANY_FRACTIONAL = 20;

    private final IntegerInstance instance;
    private final ColumnGeneration generation;
    private final SearchLimits limits;
    private final Deadline deadline;
    private final Consumer<Packing> found;
    private final long goal;
    private final int branches;
    private final boolean roundNearest;
    private int nodes;
    private int nodeLimit;
    private boolean reached;

    /**
     * @param goal     the dive stops when it finds a plan costing at most this (integer cost units); nodes that
     *                 cannot reach it are cut off
     * @param branches candidates tried per node (1 = a single dive)
     * @param roundNearest with many fractional columns, round all columns of value 1/2 or more up at once (for
     *                 large sections, where a node per stock piece costs too much)
     * @param found    receives every complete plan found
     */
    DivingHeuristic(IntegerInstance instance, ColumnGeneration generation, SearchLimits limits, Deadline deadline,
                    long goal, int branches, boolean roundNearest, Consumer<Packing> found) {
        this.instance = instance;
        this.generation = generation;
        this.limits = limits;
        this.deadline = deadline;
        this.goal = goal;
        this.branches = branches;
        this.roundNearest = roundNearest;
        this.found = found;
    }

    /** Relaxations solved (and exact finishes) so far. */
    int nodes() {
        return nodes;
    }

    /**
     * Dives from the relaxation of the whole problem for at most {@code nodeLimit} nodes.
     *
     * @return whether a plan within the goal was found
     */
    boolean run(ColumnGeneration.Relaxation root, int nodeLimit) {
        this.nodeLimit = nodeLimit;
        node(instance.demands(), instance.limits(), new ArrayList<>(), 0, root);
        return reached;
    }

    private void node(int[] residual, int[] available, List<Pattern> fixed, long fixedCost,
                      ColumnGeneration.Relaxation relaxation) {
        if (relaxation.kind() == ColumnGeneration.Kind.INFEASIBLE) {
            return;
        }
        if (fixedCost + ceil(relaxation.bound()) > goal) {
            return;
        }
        if (instance.totalPieces(residual) <= FINISH_PIECES || generation.exhausted() || deadline.passed()
                || nodes >= nodeLimit) {
            Packing rest = finish(residual, available, relaxation.bound());
            if (rest != null) {
                List<Pattern> all = new ArrayList<>(fixed);
                all.addAll(rest.pieces());
                Packing plan = new Packing(all);
                found.accept(plan);
                reached |= plan.cost(instance) <= goal;
            }
            return;
        }
        for (List<Pattern> candidate : candidates(relaxation.x())) {
            int[] childResidual = residual.clone();
            int[] childAvailable = available.clone();
            List<Pattern> childFixed = new ArrayList<>(fixed);
            long childCost = fixedCost;
            for (Pattern p : candidate) {
                Pattern piece = PatternSelection.capped(p, childResidual);
                if (childAvailable[p.stock()] == 0 || piece.isEmpty()) {
                    continue;
                }
                childFixed.add(piece);
                childCost += instance.cost[piece.stock()];
                for (int i = 0; i < childResidual.length; i++) {
                    childResidual[i] -= piece.count(i);
                }
                if (childAvailable[piece.stock()] > 0) {
                    childAvailable[piece.stock()]--;
                }
            }
            if (childFixed.size() == fixed.size()) {
                continue;
            }
            if (instance.totalPieces(childResidual) == 0) {
                Packing plan = new Packing(childFixed);
                found.accept(plan);
                reached |= plan.cost(instance) <= goal;
            } else {
                nodes++;
                node(childResidual, childAvailable, childFixed, childCost,
                        generation.solve(childResidual, childAvailable));
            }
            if (reached || nodes >= nodeLimit || generation.exhausted() || deadline.passed()) {
                return;
            }
        }
    }

    /** All columns at floor(x_p) when some reach 1; then single pieces of the largest fractional columns. */
    private List<List<Pattern>> candidates(double[] x) {
        List<List<Pattern>> candidates = new ArrayList<>();
        List<Pattern> floors = new ArrayList<>();
        List<Integer> fractional = new ArrayList<>();
        for (int j = 0; j < x.length; j++) {
            long whole = (long) Math.floor(x[j] + 1e-6);
            for (long t = 0; t < whole; t++) {
                floors.add(generation.column(j));
            }
            if (x[j] - whole > 1e-6) {
                fractional.add(j);
            }
        }
        if (!floors.isEmpty()) {
            candidates.add(floors);
        } else if (roundNearest && fractional.size() > MANY_FRACTIONAL) {
            // a large residual: round every column of value 1/2 or more up at once, not one piece per node
            List<Pattern> nearest = new ArrayList<>();
            for (int j : fractional) {
                if (x[j] >= 0.5) {
                    nearest.add(generation.column(j));
                }
            }
            if (!nearest.isEmpty()) {
                candidates.add(nearest);
            }
        }
        fractional.sort(Comparator.<Integer>comparingDouble(j -> -(x[j] - Math.floor(x[j] + 1e-6)))
                .thenComparingInt(j -> j));
        for (int c = 0; c < fractional.size() && candidates.size() < branches; c++) {
            candidates.add(List.of(generation.column(fractional.get(c))));
        }
        return candidates.subList(0, Math.min(branches, candidates.size()));
    }

    /** The residual: first-fit decreasing, then the exact model when its graph is tiny. */
    private Packing finish(int[] residual, int[] available, double bound) {
        FirstFitDecreasing.Result ffd = FirstFitDecreasing.pack(instance, residual, available);
        Packing best = ffd.complete() ? StockReassignment.cheapest(instance, ffd.packing(), available) : null;
        long lower = Math.max(0, ceil(bound));
        if ((best != null && best.cost(instance) <= lower) || deadline.passed()) {
            return best;
        }
        long upper = best == null ? Long.MAX_VALUE / 4 : best.cost(instance);
        ArcFlowModel.Outcome exact = ArcFlowModel.solve(instance, residual, available, best, lower, upper,
                limits.exactDeterministicTime() / 40, FINISH_ARCS, deadline);
        nodes++; // an exact finish costs about as much as a relaxation
        if (exact != null && exact.packing() != null
                && (best == null || exact.packing().cost(instance) < best.cost(instance))) {
            best = exact.packing();
        }
        return best;
    }

    private static long ceil(double bound) {
        return (long) Math.ceil(bound - 1e-9 * Math.max(1, Math.abs(bound)));
    }

    @Override
    public String toString() {
        return "dive to " + goal + " over " + Arrays.toString(instance.demand);
    }
}
