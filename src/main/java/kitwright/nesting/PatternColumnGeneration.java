package kitwright.nesting;

import com.google.ortools.Loader;
import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The linear-programming relaxation of the nesting pattern model, solved by column generation (GLOP master,
 * knapsack pricing by {@link PatternPricing}), and the lower bound on bundles it proves.
 *
 * <p>Model (a Dantzig-Wolfe reformulation of recursive circle packing by host, after Gleixner, Maher, Muller and
 * Pedroso 2020, "Price-and-verify: a new algorithm for recursive circle packing using Dantzig-Wolfe decomposition",
 * Annals of Operations Research 284). Every tube, nested or not, uses exactly one pattern for its own bore (the empty
 * pattern included). Guests are strictly narrower than their hosts, so any pattern counts can be realised as a
 * forest, and the number of bundles is N - sum_t g_t with g_t the tubes of type t placed as guests:
 * <pre>
 *   max  sum_{h,p} (sum_t w_t a_tp) x_hp
 *   s.t. sum_{h,p} a_tp x_hp &lt;= n_t   for every type t   (supply of guests, dual pi_t)
 *        sum_p x_hp         &lt;= n_h   for every host type h (one pattern per host, dual mu_h)
 *        x_hp &gt;= 0
 * </pre>
 * Phase 1 uses w_t = 1 (tubes nested); phase 2 adds a little of each type's envelope volume to w_t to bring in
 * patterns that nest the bulky tubes, for the integer phase's second objective.
 *
 * <p>Bound: for any pi &gt;= 0, the Lagrangian relaxation gives nested &lt;= sum_t pi_t n_t + sum_h n_h
 * max(0, K_h(1 - pi)), with K_h the pricing bound; it holds whether or not column generation converged. Bundles
 * &gt;= N - that value.
 */
final class PatternColumnGeneration {

    /**
     * The columns generated (as layouts capped at the supply, and as the LP saw them, uncapped), the final LP
     * solution over them (phase 2 weights), the phase 1 LP value (tubes nested, over the columns known at its last
     * solve), the bound on tubes nested, and the rounds run.
     */
    record Result(List<Pattern> columns, List<List<Integer>> lpCounts, double[] lpValues, double phaseOneValue,
                  double nestedUpperBound, int iterations) {
    }

    private PatternColumnGeneration() {
    }

    static Result run(NestingProblem problem, List<TubeType> types, PatternPricing pricing, int maxIterations) {
        Loader.loadNativeLibraries();
        MPSolver solver = MPSolver.createSolver("GLOP");
        try {
            return run(solver, problem, types, pricing, maxIterations);
        } finally {
            solver.delete();
        }
    }

    private static Result run(MPSolver solver, NestingProblem problem, List<TubeType> types, PatternPricing pricing,
                              int maxIterations) {
        int n = types.size();
        MPConstraint[] supply = new MPConstraint[n];
        MPConstraint[] hosts = new MPConstraint[n];
        for (int t = 0; t < n; t++) {
            // sum_{h,p} a_tp x_hp <= n_t
            supply[t] = solver.makeConstraint(-MPSolver.infinity(), types.get(t).count(), "supply_" + t);
            // sum_p x_hp <= n_h
            hosts[t] = solver.makeConstraint(-MPSolver.infinity(), types.get(t).count(), "hosts_" + t);
        }
        MPObjective objective = solver.objective();
        objective.setMaximization();
        List<Pattern> columns = new ArrayList<>();
        List<List<Integer>> lpCounts = new ArrayList<>();
        List<MPVariable> variables = new ArrayList<>();
        Set<List<Integer>> seen = new HashSet<>();
        double[] unit = new double[n];
        java.util.Arrays.fill(unit, 1.0);
        double volumeMax = types.stream().mapToDouble(t -> t.sample().envelopeVolumeMm3()).max().orElse(1);
        double[] bulky = new double[n];
        for (int t = 0; t < n; t++) {
            bulky[t] = 1.0 + 1e-3 * types.get(t).sample().envelopeVolumeMm3() / volumeMax;
        }
        double[] pi = new double[n];
        double nestedBound = Double.POSITIVE_INFINITY;
        double phaseOneValue = 0;
        int iterations = 0;
        for (int phase = 1; phase <= 2; phase++) {
            double[] weight = phase == 1 ? unit : bulky;
            for (int c = 0; c < columns.size(); c++) {
                objective.setCoefficient(variables.get(c), value(lpCounts.get(c), weight));
            }
            int limit = phase == 1 ? maxIterations : Math.max(1, maxIterations / 4);
            for (int round = 0; round < limit; round++) {
                iterations++;
                solveOrThrow(solver);
                if (phase == 1) {
                    phaseOneValue = objective.value();
                }
                double[] mu = new double[n];
                for (int t = 0; t < n; t++) {
                    pi[t] = Math.max(0, supply[t].dualValue());
                    mu[t] = Math.max(0, hosts[t].dualValue());
                }
                double[] reduced = new double[n];
                for (int t = 0; t < n; t++) {
                    reduced[t] = weight[t] - pi[t];
                }
                int[][] best = new int[n][];
                pricing.price(reduced, false, best);
                boolean added = false;
                for (int h : pricing.hostTypes()) {
                    if (best[h] == null) {
                        continue;
                    }
                    List<Integer> counts = pricing.rowCounts(h, best[h]);
                    List<Integer> key = new ArrayList<>(counts);
                    key.add(h);
                    if (value(counts, reduced) - mu[h] <= 1e-7 || !seen.add(key)) {
                        continue;
                    }
                    MPVariable x = solver.makeNumVar(0, MPSolver.infinity(), "x_" + h + "_" + columns.size());
                    for (int t = 0; t < n; t++) {
                        if (counts.get(t) > 0) {
                            supply[t].setCoefficient(x, counts.get(t)); // a_tp in sum_{h,p} a_tp x_hp <= n_t
                        }
                    }
                    hosts[h].setCoefficient(x, 1); // in sum_p x_hp <= n_h
                    objective.setCoefficient(x, value(counts, weight));
                    columns.add(pricing.rowPattern(h, best[h]));
                    lpCounts.add(counts);
                    variables.add(x);
                    added = true;
                }
                if (!added) {
                    break;
                }
            }
            if (phase == 1) {
                nestedBound = lagrangianBound(types, pricing, pi);
            }
        }
        solveOrThrow(solver);
        double[] values = variables.stream().mapToDouble(MPVariable::solutionValue).toArray();
        return new Result(columns, lpCounts, values, phaseOneValue, nestedBound, iterations);
    }

    private static double value(List<Integer> counts, double[] weight) {
        double sum = 0;
        for (int t = 0; t < counts.size(); t++) {
            sum += weight[t] * counts.get(t);
        }
        return sum;
    }

    /** sum_t pi_t n_t + sum_h n_h max(0, K_h(1 - pi)): an upper bound on the tubes any plan nests. */
    static double lagrangianBound(List<TubeType> types, PatternPricing pricing, double[] pi) {
        int n = types.size();
        double[] reduced = new double[n];
        double bound = 0;
        for (int t = 0; t < n; t++) {
            reduced[t] = 1.0 - pi[t];
            bound += pi[t] * types.get(t).count();
        }
        double[] hostValue = pricing.price(reduced, true, null);
        for (int h : pricing.hostTypes()) {
            bound += types.get(h).count() * Math.max(0, hostValue[h]);
        }
        return bound;
    }

    private static void solveOrThrow(MPSolver solver) {
        MPSolver.ResultStatus status = solver.solve();
        if (status != MPSolver.ResultStatus.OPTIMAL) {
            throw new IllegalStateException("nesting master LP: GLOP returned " + status);
        }
    }
}
