package kitwright.cutting;

import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import kitwright.natives.SolverLibraries;

/**
 * The integer phase over the generated patterns: the master problem of column generation with whole counts,
 * solved by CP-SAT ("price-and-branch", the restricted master heuristic of Gilmore and Gomory 1961 with a modern
 * integer solver; see Delorme, Iori and Martello 2016, "Bin packing and cutting stock problems: mathematical models
 * and exact algorithms", EJOR 255(1), section 5).
 * <pre>
 *   min  sum_p c_k(p) x_p
 *   s.t. sum_p a_ip x_p &gt;= r_i,   sum_{p of k} x_p &lt;= u_k,   x_p &gt;= 0 integer
 * </pre>
 * Patterns are first cut down to the residual demand. The pool omits most patterns, so CP-SAT's OPTIMAL here
 * proves nothing about the whole problem; the plan is taken when it is cheaper, and the proof comes from the bound.
 */
final class PatternSelection {
    private PatternSelection() {
    }

    /**
     * @param pool  patterns to choose from (the hint's patterns are added)
     * @param hint  a plan for the same residual problem, or null
     * @param lower a valid lower bound, in integer cost units
     * @param upper the most a plan may cost, in integer cost units
     * @return the best plan found, or null when none was found
     */
    static Packing solve(IntegerInstance instance, List<Pattern> pool, int[] demand, int[] available, Packing hint,
                         long lower, long upper, double deterministicTime, Deadline deadline) {
        SolverLibraries.load(); // the model objects need the natives, not only the solver
        Set<Pattern> unique = new LinkedHashSet<>();
        for (Pattern p : pool) {
            Pattern capped = capped(p, demand);
            if (!capped.isEmpty() && (available[p.stock()] != 0)) {
                unique.add(capped);
            }
        }
        if (hint != null) {
            unique.addAll(hint.pieces());
        }
        List<Pattern> patterns = new ArrayList<>(unique);
        if (patterns.isEmpty()) {
            return null;
        }
        CpModel model = new CpModel();
        IntVar[] x = new IntVar[patterns.size()];
        for (int j = 0; j < x.length; j++) {
            Pattern p = patterns.get(j);
            int most = 0;
            for (int i = 0; i < instance.types(); i++) {
                if (p.count(i) > 0) {
                    most = Math.max(most, (demand[i] + p.count(i) - 1) / p.count(i));
                }
            }
            x[j] = model.newIntVar(0, Math.min(most, instance.usable(p.stock(), demand, available)), "x_" + j);
        }
        for (int i = 0; i < instance.types(); i++) {
            if (demand[i] == 0) {
                continue;
            }
            // sum_p a_ip x_p >= r_i
            LinearExprBuilder made = LinearExpr.newBuilder();
            for (int j = 0; j < x.length; j++) {
                if (patterns.get(j).count(i) > 0) {
                    made.addTerm(x[j], patterns.get(j).count(i));
                }
            }
            model.addGreaterOrEqual(made, demand[i]);
        }
        for (int k = 0; k < instance.stocks(); k++) {
            if (available[k] < 0) {
                continue;
            }
            // sum_{p of k} x_p <= u_k
            LinearExprBuilder used = LinearExpr.newBuilder();
            for (int j = 0; j < x.length; j++) {
                if (patterns.get(j).stock() == k) {
                    used.add(x[j]);
                }
            }
            model.addLessOrEqual(used, available[k]);
        }
        long divisor = CpSatRun.costDivisor(instance);
        LinearExprBuilder cost = LinearExpr.newBuilder();
        for (int j = 0; j < x.length; j++) {
            cost.addTerm(x[j], instance.cost[patterns.get(j).stock()] / divisor);
        }
        model.addLinearConstraint(cost, -Math.floorDiv(-lower, divisor), Math.floorDiv(upper, divisor));
        model.minimize(cost);
        if (hint != null) {
            Map<Pattern, Integer> counts = new HashMap<>();
            for (Pattern p : hint.pieces()) {
                counts.merge(p, 1, Integer::sum);
            }
            for (int j = 0; j < x.length; j++) {
                model.addHint(x[j], counts.getOrDefault(patterns.get(j), 0));
            }
        }
        CpSolver solver = CpSatRun.solver(deterministicTime, deadline);
        CpSolverStatus status = solver.solve(model);
        if (status != CpSolverStatus.OPTIMAL && status != CpSolverStatus.FEASIBLE) {
            return null;
        }
        List<Pattern> pieces = new ArrayList<>();
        for (int j = 0; j < x.length; j++) {
            for (long n = solver.value(x[j]); n > 0; n--) {
                pieces.add(patterns.get(j));
            }
        }
        return new Packing(pieces);
    }

    /** The pattern with no more pieces of a type than the demand. */
    static Pattern capped(Pattern p, int[] demand) {
        int[] counts = p.counts();
        for (int i = 0; i < counts.length; i++) {
            counts[i] = Math.min(counts[i], demand[i]);
        }
        return new Pattern(p.stock(), counts);
    }
}
