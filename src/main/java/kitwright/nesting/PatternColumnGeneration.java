package kitwright.nesting;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPObjective;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import kitwright.cutting.Deadline;
import kitwright.natives.SolverLibraries;

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
 *   s.t. sum_{h,p} a_tp x_hp &lt;= s_t   for every type t   (guests still to place, dual pi_t)
 *        sum_p x_hp         &lt;= m_h   for every host type h (hosts still without a pattern, dual mu_h)
 *        x_hp &gt;= 0
 * </pre>
 * with s_t = m_t = n_t for the whole kit; {@link PatternDiving} lowers them as it fixes patterns. Weights w_t = 1
 * count the tubes nested; {@link #bulkyWeights} add a little of each type's envelope volume, to favour nesting the
 * bulky tubes among plans that nest as many.
 *
 * <p>Bound: for any pi &gt;= 0, the Lagrangian relaxation gives nested &lt;= sum_t pi_t n_t + sum_h n_h
 * max(0, K_h(1 - pi)), with K_h the pricing bound; it holds whether or not column generation converged. Bundles
 * &gt;= N - that value.
 *
 * <p>One object per nesting run (it owns a native solver: close it).
 */
final class PatternColumnGeneration implements AutoCloseable {

    /**
     * The columns generated (as layouts capped at the supply, and as the LP saw them, uncapped), the final LP
     * solution over them (phase 2 weights), the phase 1 LP value (tubes nested, over the columns known at its last
     * solve), the bound on tubes nested, and the rounds run.
     */
    record Result(List<Pattern> columns, List<TypeCounts> lpCounts, double[] lpValues, double phaseOneValue,
                  double nestedUpperBound, int iterations) {
    }

    private final List<TubeType> types;
    private final PatternPricing pricing;
    private final MPSolver solver;
    private final MPConstraint[] supply;
    private final MPConstraint[] hosts;
    private final MPObjective objective;
    /** Per column, the knapsack's rows of each guest type; sparse, as a kit may have thousands of types. */
    private final List<TypeCounts> rows = new ArrayList<>();
    private final List<Integer> hostOf = new ArrayList<>();
    private final List<TypeCounts> lpCounts = new ArrayList<>();
    private final List<MPVariable> variables = new ArrayList<>();
    /** The columns added so far, as (host type, guest counts). */
    private final Set<List<Object>> seen = new HashSet<>();
    private final int[] guestsLeft;
    private double[] weight;
    private double[] pi;
    private int iterations;

    PatternColumnGeneration(List<TubeType> types, PatternPricing pricing) {
        SolverLibraries.load();
        this.types = types;
        this.pricing = pricing;
        int n = types.size();
        solver = MPSolver.createSolver("GLOP");
        supply = new MPConstraint[n];
        hosts = new MPConstraint[n];
        for (int t = 0; t < n; t++) {
            supply[t] = solver.makeConstraint(-MPSolver.infinity(), types.get(t).count(), "supply_" + t);
            hosts[t] = solver.makeConstraint(-MPSolver.infinity(), types.get(t).count(), "hosts_" + t);
        }
        objective = solver.objective();
        objective.setMaximization();
        guestsLeft = pricing.supplyOfAll();
        weight = unitWeights(n);
        pi = new double[n];
    }

    /** Phase 1 to convergence (or the round limit), the bound, then phase 2 with bulky weights. */
    static Result run(NestingProblem problem, List<TubeType> types, PatternPricing pricing, int maxIterations) {
        try (PatternColumnGeneration cg = new PatternColumnGeneration(types, pricing)) {
            double phaseOne = cg.generate(unitWeights(types.size()), maxIterations);
            double bound = cg.lagrangianBound();
            cg.generate(bulkyWeights(types), Math.max(1, maxIterations / 4));
            List<Pattern> columns = new ArrayList<>();
            for (int c = 0; c < cg.size(); c++) {
                columns.add(cg.realisable(c, pricing.supplyOfAll()));
            }
            return new Result(columns, List.copyOf(cg.lpCounts), cg.values(), phaseOne, bound, cg.iterations);
        }
    }

    static double[] unitWeights(int n) {
        double[] w = new double[n];
        java.util.Arrays.fill(w, 1.0);
        return w;
    }

    /** 1 + 0.001 v_t / max v: as many tubes nested first, the bulkiest among them. */
    static double[] bulkyWeights(List<TubeType> types) {
        double volumeMax = types.stream().mapToDouble(t -> t.sample().envelopeVolumeMm3()).max().orElse(1);
        double[] w = new double[types.size()];
        for (int t = 0; t < w.length; t++) {
            w[t] = 1.0 + 1e-3 * types.get(t).sample().envelopeVolumeMm3() / volumeMax;
        }
        return w;
    }

    /** Sets the right-hand sides: guests still to place (s_t) and hosts still free (m_h). */
    void setSupply(int[] guests, int[] freeHosts) {
        for (int t = 0; t < types.size(); t++) {
            supply[t].setBounds(-MPSolver.infinity(), guests[t]);
            hosts[t].setBounds(-MPSolver.infinity(), freeHosts[t]);
            guestsLeft[t] = guests[t];
        }
    }

    /** Column generation with these weights for at most {@code maxRounds} LP solves; returns the LP value. */
    double generate(double[] weights, int maxRounds) {
        return generate(weights, maxRounds, Deadline.in(Double.POSITIVE_INFINITY));
    }

    /**
     * As {@link #generate(double[], int)}, stopping after the round in which the deadline passed (the duals of
     * that last solve still give a valid {@link #lagrangianBound()}).
     */
    double generate(double[] weights, int maxRounds, Deadline deadline) {
        weight = weights;
        for (int c = 0; c < variables.size(); c++) {
            objective.setCoefficient(variables.get(c), lpCounts.get(c).value(weight));
        }
        double value = 0;
        int n = types.size();
        for (int round = 0; round < maxRounds; round++) {
            iterations++;
            solveOrThrow();
            value = objective.value();
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
            pricing.price(reduced, false, best, guestsLeft);
            boolean added = false;
            for (int h : pricing.hostTypes()) {
                if (best[h] == null) {
                    continue;
                }
                TypeCounts columnRows = TypeCounts.of(best[h]);
                TypeCounts counts = pricing.rowCounts(h, columnRows);
                if (counts.value(reduced) - mu[h] > 1e-7 && seen.add(List.of(h, counts))) {
                    add(h, columnRows, counts);
                    added = true;
                }
            }
            if (!added || pricing.exhausted() || deadline.passed()) {
                break;
            }
        }
        return value;
    }

    private void add(int host, TypeCounts columnRows, TypeCounts counts) {
        MPVariable x = solver.makeNumVar(0, MPSolver.infinity(), "x_" + host + "_" + variables.size());
        for (int i = 0; i < counts.size(); i++) {
            supply[counts.type(i)].setCoefficient(x, counts.count(i)); // a_tp in sum_{h,p} a_tp x_hp <= s_t
        }
        hosts[host].setCoefficient(x, 1); // in sum_p x_hp <= m_h
        objective.setCoefficient(x, counts.value(weight));
        rows.add(columnRows);
        hostOf.add(host);
        lpCounts.add(counts);
        variables.add(x);
    }

    int size() {
        return variables.size();
    }

    /** True when the pricing work budget is spent. */
    boolean exhausted() {
        return pricing.exhausted();
    }

    int hostOf(int column) {
        return hostOf.get(column);
    }

    /** The LP solution of the last solve. */
    double[] values() {
        return variables.stream().mapToDouble(MPVariable::solutionValue).toArray();
    }

    /** Column c as a layout a host can carry with the given guests left (rows capped at the supply). */
    Pattern realisable(int column, int[] guests) {
        return pricing.rowPattern(hostOf.get(column), rows.get(column), guests);
    }

    /** sum_t pi_t n_t + sum_h n_h max(0, K_h(1 - pi)) with the last duals: an upper bound on tubes nested. */
    double lagrangianBound() {
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

    private void solveOrThrow() {
        MPSolver.ResultStatus status = solver.solve();
        if (status != MPSolver.ResultStatus.OPTIMAL) {
            throw new IllegalStateException("nesting master LP: GLOP returned " + status);
        }
    }

    @Override
    public void close() {
        solver.delete();
    }
}
