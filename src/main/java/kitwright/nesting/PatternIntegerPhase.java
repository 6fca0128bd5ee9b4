package kitwright.nesting;

import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.natives.SolverLibraries;

/**
 * The integer phase: how many hosts of each type use each known pattern, solved by CP-SAT over the pattern columns
 * (the restricted master problem as an integer programme):
 * <pre>
 *   max  sum_p (sum_t a_tp (M + v_t)) x_p         (tubes nested first, then the bulkiest ones)
 *   s.t. sum_p a_tp x_p        &lt;= n_t   for every type t
 *        sum_{p of host h} x_p &lt;= n_h   for every host type h
 *        0 &lt;= x_p &lt;= min(n_h, min_t floor(n_t / a_tp)),  integer
 * </pre>
 * with v_t the type's envelope volume scaled to 0..1000 and M = 1000 (N + 1), so that one more tube nested always
 * outweighs any volume. One worker, a fixed seed and a deterministic time limit make the answer independent of the
 * machine; the wall-clock limit is only a safety net. Over the complete set of patterns (small kits,
 * {@link PatternEnumeration}) an OPTIMAL answer proves the fewest bundles of the channel model.
 */
final class PatternIntegerPhase {

    /**
     * The pattern counts found, whether CP-SAT proved them optimal over the given columns, and its bound on the
     * tubes nested (floor of the objective bound over M).
     */
    record Result(long[] counts, boolean proven, long nestedUpperBound) {
    }

    private PatternIntegerPhase() {
    }

    /** Returns null when CP-SAT found no solution within its limits; what is left of the deadline is its net. */
    static Result solve(List<TubeType> types, List<Pattern> columns, double[] hint, double deterministicSeconds,
                        Deadline deadline) {
        SolverLibraries.load();
        int n = types.size();
        long tubes = types.stream().mapToLong(TubeType::count).sum();
        long big = 1000 * (tubes + 1);
        double volumeMax = types.stream().mapToDouble(t -> t.sample().envelopeVolumeMm3()).max().orElse(1);
        long[] weight = new long[n];
        for (int t = 0; t < n; t++) {
            weight[t] = big + Math.round(1000 * types.get(t).sample().envelopeVolumeMm3() / volumeMax);
        }
        CpModel model = new CpModel();
        IntVar[] x = new IntVar[columns.size()];
        for (int p = 0; p < columns.size(); p++) {
            Pattern pattern = columns.get(p);
            long upper = types.get(pattern.hostType()).count();
            TypeCounts counts = pattern.counts();
            for (int i = 0; i < counts.size(); i++) {
                upper = Math.min(upper, types.get(counts.type(i)).count() / counts.count(i));
            }
            x[p] = model.newIntVar(0, upper, "x_" + pattern.hostType() + "_" + p);
            if (hint != null) {
                model.addHint(x[p], Math.min(upper, (long) Math.floor(hint[p] + 1e-9)));
            }
        }
        LinearExprBuilder[] supply = new LinearExprBuilder[n];
        LinearExprBuilder[] hosts = new LinearExprBuilder[n];
        LinearExprBuilder objective = LinearExpr.newBuilder();
        for (int t = 0; t < n; t++) {
            supply[t] = LinearExpr.newBuilder();
            hosts[t] = LinearExpr.newBuilder();
        }
        for (int p = 0; p < columns.size(); p++) {
            Pattern pattern = columns.get(p);
            hosts[pattern.hostType()].add(x[p]);
            long value = 0;
            TypeCounts counts = pattern.counts();
            for (int i = 0; i < counts.size(); i++) {
                int t = counts.type(i);
                int a = counts.count(i);
                supply[t].addTerm(x[p], a);
                value += a * weight[t];
            }
            objective.addTerm(x[p], value);
        }
        for (int t = 0; t < n; t++) {
            model.addLessOrEqual(supply[t], types.get(t).count()); // sum_p a_tp x_p <= n_t
            model.addLessOrEqual(hosts[t], types.get(t).count());  // sum_{p of h} x_p <= n_h
        }
        model.maximize(objective);

        CpSolver solver = new CpSolver();
        solver.getParameters().setNumWorkers(1).setRandomSeed(20260101)
                .setMaxDeterministicTime(deterministicSeconds).setMaxTimeInSeconds(deadline.remainingSeconds());
        CpSolverStatus status = solver.solve(model);
        if (status != CpSolverStatus.OPTIMAL) {
            deadline.passed(); // remembers whether the clock rather than the deterministic limit stopped it
        }
        if (status != CpSolverStatus.OPTIMAL && status != CpSolverStatus.FEASIBLE) {
            return null;
        }
        long[] counts = new long[columns.size()];
        for (int p = 0; p < columns.size(); p++) {
            counts[p] = solver.value(x[p]);
        }
        long nestedBound = (long) Math.floor(solver.bestObjectiveBound() / big + 1e-9);
        return new Result(counts, status == CpSolverStatus.OPTIMAL, nestedBound);
    }
}
