package kitwright.packing;

import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import java.util.Arrays;
import kitwright.cutting.Deadline;
import kitwright.natives.SolverLibraries;

/**
 * Chooses how many times to use each candidate filling (a crate or vehicle pattern) so that every item type is
 * covered at least as often as it is demanded, at the least total cost, then with the fewest fillings:
 * <pre>
 *   minimise  sum_p (cost_p * K + 1) * x_p           (K larger than any count: cost first, then number)
 *   subject to sum_p a_ip * x_p >= d_i   for every item type i
 *              x_p integer, 0 <= x_p <= max_i ceil(d_i / a_ip)
 * </pre>
 * the integer phase of the set-covering formulation of bin packing and cutting stock (Gilmore &amp; Gomory 1961)
 * over the patterns generated so far ("price and branch"). Solved by CP-SAT with one worker, a fixed seed and a
 * deterministic work limit, started from a known cover (the construction), so the answer is never worse than the
 * hint and the same input gives the same answer. Costs are in hundredths of the currency.
 */
public final class PatternCover {

    /** The multiplicity of each pattern, and whether CP-SAT proved it optimal over these patterns. */
    public record Result(int[] uses, boolean provenOverPatterns) {
    }

    private final double deterministicTime;
    private final Deadline deadline;

    /**
     * @param deterministicTime CP-SAT deterministic work limit (about seconds on a fast machine)
     * @param safetySeconds     wall-clock safety net, from now
     */
    public PatternCover(double deterministicTime, double safetySeconds) {
        this(deterministicTime, Deadline.in(safetySeconds));
    }

    /**
     * @param deterministicTime CP-SAT deterministic work limit (about seconds on a fast machine)
     * @param deadline          the stage's deadline: each solve gets what is left of it as its wall-clock net
     */
    public PatternCover(double deterministicTime, Deadline deadline) {
        this.deterministicTime = deterministicTime;
        this.deadline = deadline;
    }

    /**
     * @param counts  counts[p][i]: items of type i in pattern p
     * @param cost    cost of one use of each pattern
     * @param demand  items of each type to cover
     * @param hint    a cover to start from (uses per pattern), or null
     * @return the cover found, or the hint when CP-SAT finds nothing better within its limits
     */
    public Result solve(int[][] counts, double[] cost, int[] demand, int[] hint) {
        SolverLibraries.load();
        int patterns = counts.length;
        int types = demand.length;
        long hintTotal = hint == null ? Arrays.stream(demand).asLongStream().sum() : Arrays.stream(hint).sum();
        long k = hintTotal + 1;

        CpModel model = new CpModel();
        // data -> variables: x_p = uses of pattern p
        IntVar[] x = new IntVar[patterns];
        for (int p = 0; p < patterns; p++) {
            long ub = 0;
            for (int i = 0; i < types; i++) {
                if (counts[p][i] > 0) {
                    ub = Math.max(ub, (demand[i] + counts[p][i] - 1) / counts[p][i]);
                }
            }
            x[p] = model.newIntVar(0, ub, "uses_" + p);
        }
        // sum_p a_ip x_p >= d_i
        for (int i = 0; i < types; i++) {
            if (demand[i] <= 0) {
                continue;
            }
            int n = 0;
            IntVar[] vars = new IntVar[patterns];
            long[] coefs = new long[patterns];
            for (int p = 0; p < patterns; p++) {
                if (counts[p][i] > 0) {
                    vars[n] = x[p];
                    coefs[n++] = counts[p][i];
                }
            }
            model.addGreaterOrEqual(LinearExpr.weightedSum(Arrays.copyOf(vars, n), Arrays.copyOf(coefs, n)),
                    demand[i]);
        }
        // minimise sum_p (cost_p * K + 1) x_p
        long[] weight = new long[patterns];
        for (int p = 0; p < patterns; p++) {
            weight[p] = Math.round(cost[p] * 100) * k + 1;
        }
        model.minimize(LinearExpr.weightedSum(x, weight));
        if (hint != null) {
            for (int p = 0; p < patterns; p++) {
                model.addHint(x[p], hint[p]);
            }
        }

        CpSolver solver = new CpSolver();
        solver.getParameters().setNumWorkers(1).setRandomSeed(1).setMaxDeterministicTime(deterministicTime)
                .setMaxTimeInSeconds(deadline.remainingSeconds());
        CpSolverStatus status = solver.solve(model);
        if (status != CpSolverStatus.OPTIMAL) {
            deadline.passed(); // remembers whether the clock rather than the deterministic limit stopped it
        }
        if (status != CpSolverStatus.OPTIMAL && status != CpSolverStatus.FEASIBLE) {
            return new Result(hint == null ? new int[patterns] : hint.clone(), false);
        }
        int[] uses = new int[patterns];
        long value = 0;
        long hintValue = 0;
        for (int p = 0; p < patterns; p++) {
            uses[p] = (int) solver.value(x[p]);
            value += weight[p] * uses[p];
            hintValue += hint == null ? 0 : weight[p] * hint[p];
        }
        if (hint != null && value > hintValue) {
            return new Result(hint.clone(), false);
        }
        return new Result(uses, status == CpSolverStatus.OPTIMAL);
    }
}
