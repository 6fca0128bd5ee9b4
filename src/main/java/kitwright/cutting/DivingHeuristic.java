package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;

/**
 * Residual rounding with column generation, a diving heuristic: fix whole stock pieces from the relaxation, solve
 * the relaxation of what is left, repeat, and finish the last few pieces exactly.
 *
 * <p>Each step fixes every column at its rounded-down value {@code floor(x_p)}; when no column reaches 1, it fixes
 * one piece of the column with the largest value (rounding up). Fixed patterns are cut down to the residual
 * demand. The residual relaxation is solved again by column generation, reusing all columns. A dive stops as soon
 * as its fixed cost plus the residual's lower bound cannot beat the best plan at hand. When the residual is small
 * enough for the exact arc-flow model it is finished by {@link ArcFlowModel} (from a first-fit decreasing start),
 * otherwise by first-fit decreasing. This is the "sequential rounding with residual solved again" family that
 * reaches the optimum on almost all one-dimensional instances (Wäscher and Gau 1996, "Heuristics for the integer
 * one-dimensional cutting stock problem: a computational study", OR Spektrum 18; Belov and Scheithauer 2006,
 * EJOR 171, for the residual finish).
 */
final class DivingHeuristic {
    /** Residuals up to this many pieces are finished exactly when their graph is small. */
    private static final int EXACT_FINISH_PIECES = 60;

    private DivingHeuristic() {
    }

    /**
     * @param root      the relaxation of the whole problem (from {@code generation})
     * @param incumbent cost of the best plan at hand (integer cost units), or Long.MAX_VALUE
     * @return a plan covering the whole demand, or null when the dive found none better than the incumbent
     */
    static Packing dive(IntegerInstance instance, ColumnGeneration generation, ColumnGeneration.Relaxation root,
                        long incumbent, SearchLimits limits, Deadline deadline) {
        int[] residual = instance.demands();
        int[] available = instance.limits();
        List<Pattern> fixed = new ArrayList<>();
        long fixedCost = 0;
        ColumnGeneration.Relaxation relaxation = root;
        for (int step = 0; instance.totalPieces(residual) > 0; step++) {
            if (relaxation.kind() == ColumnGeneration.Kind.INFEASIBLE) {
                return null;
            }
            if (fixedCost + Math.ceil(relaxation.bound() - 1e-9 * Math.max(1, relaxation.bound())) >= incumbent) {
                return null;
            }
            if (step >= limits.divingSteps() || generation.exhausted() || smallEnough(instance, residual, limits)) {
                break;
            }
            List<Pattern> chosen = choose(generation, relaxation.x());
            boolean progress = false;
            for (Pattern p : chosen) {
                if (available[p.stock()] == 0) {
                    continue;
                }
                Pattern piece = PatternSelection.capped(p, residual);
                if (piece.isEmpty()) {
                    continue;
                }
                fixed.add(piece);
                fixedCost += instance.cost[piece.stock()];
                for (int i = 0; i < residual.length; i++) {
                    residual[i] -= piece.count(i);
                }
                if (available[piece.stock()] > 0) {
                    available[piece.stock()]--;
                }
                progress = true;
            }
            if (!progress) {
                break;
            }
            if (instance.totalPieces(residual) > 0) {
                relaxation = generation.solve(residual, available);
            }
        }
        if (instance.totalPieces(residual) == 0) {
            return new Packing(fixed);
        }
        Packing rest = finish(instance, residual, available, relaxation.bound(), limits, deadline);
        if (rest == null) {
            return null;
        }
        List<Pattern> all = new ArrayList<>(fixed);
        all.addAll(rest.pieces());
        return new Packing(all);
    }

    /** Whole pieces to fix: floor(x_p) of every column, or one piece of the largest fractional column. */
    private static List<Pattern> choose(ColumnGeneration generation, double[] x) {
        List<Pattern> chosen = new ArrayList<>();
        int largest = -1;
        for (int j = 0; j < x.length; j++) {
            long whole = (long) Math.floor(x[j] + 1e-6);
            for (long t = 0; t < whole; t++) {
                chosen.add(generation.column(j));
            }
            if (x[j] > 1e-6 && (largest < 0 || x[j] > x[largest] + 1e-9)) {
                largest = j;
            }
        }
        if (chosen.isEmpty() && largest >= 0) {
            chosen.add(generation.column(largest));
        }
        return chosen;
    }

    private static boolean smallEnough(IntegerInstance instance, int[] residual, SearchLimits limits) {
        return instance.totalPieces(residual) <= EXACT_FINISH_PIECES
                && ArcFlowModel.arcs(instance, residual, limits.exactMaxArcs() / 4) <= limits.exactMaxArcs() / 4;
    }

    /** The residual: first-fit decreasing, then the exact model when its graph is small. */
    static Packing finish(IntegerInstance instance, int[] residual, int[] available, double bound,
                          SearchLimits limits, Deadline deadline) {
        FirstFitDecreasing.Result ffd = FirstFitDecreasing.pack(instance, residual, available);
        Packing best = ffd.complete() ? ffd.packing() : null;
        long lower = (long) Math.max(0, Math.ceil(bound - 1e-9 * Math.max(1, bound)));
        if (best != null && best.cost(instance) <= lower) {
            return best;
        }
        long upper = best == null ? Long.MAX_VALUE / 4 : best.cost(instance);
        ArcFlowModel.Outcome exact = ArcFlowModel.solve(instance, residual, available, best, lower, upper,
                limits.exactDeterministicTime(), limits.exactMaxArcs() / 4, deadline);
        if (exact != null && exact.packing() != null
                && (best == null || exact.packing().cost(instance) < best.cost(instance))) {
            best = exact.packing();
        }
        return best;
    }
}
