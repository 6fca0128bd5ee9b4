package kitwright.packing;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import kitwright.natives.SolverLibraries;

/**
 * The linear relaxation of the pattern cover (the restricted master problem of column generation, Gilmore &amp;
 * Gomory 1961), solved by GLOP:
 * <pre>
 *   minimise sum_p cost_p x_p   subject to   sum_p a_ip x_p >= d_i  (dual pi_i >= 0),   x_p >= 0
 * </pre>
 * The duals price the item types: a new pattern of cost c is worth adding when c - sum_i pi_i a_i &lt; 0.
 */
public final class CoverRelaxation {

    /** LP value and the dual price of each item type (null when GLOP did not reach an optimum). */
    public record Solution(double value, double[] duals) {
    }

    public Solution solve(int[][] counts, double[] cost, int[] demand) {
        SolverLibraries.load();
        MPSolver solver = MPSolver.createSolver("GLOP");
        try {
            MPVariable[] x = new MPVariable[counts.length];
            for (int p = 0; p < counts.length; p++) {
                x[p] = solver.makeNumVar(0, Double.POSITIVE_INFINITY, "uses_" + p);
            }
            MPConstraint[] cover = new MPConstraint[demand.length];
            for (int i = 0; i < demand.length; i++) {
                // sum_p a_ip x_p >= d_i
                cover[i] = solver.makeConstraint(demand[i], Double.POSITIVE_INFINITY, "cover_" + i);
                for (int p = 0; p < counts.length; p++) {
                    if (counts[p][i] != 0) {
                        cover[i].setCoefficient(x[p], counts[p][i]);
                    }
                }
            }
            MPObjective objective = solver.objective();
            for (int p = 0; p < counts.length; p++) {
                objective.setCoefficient(x[p], cost[p]);
            }
            objective.setMinimization();
            if (solver.solve() != MPSolver.ResultStatus.OPTIMAL) {
                return null;
            }
            double[] duals = new double[demand.length];
            for (int i = 0; i < demand.length; i++) {
                duals[i] = Math.max(0, cover[i].dualValue());
            }
            return new Solution(objective.value(), duals);
        } finally {
            solver.delete();
        }
    }
}
