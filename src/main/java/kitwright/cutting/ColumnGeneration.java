package kitwright.cutting;

import com.google.ortools.linearsolver.MPConstraint;
import com.google.ortools.linearsolver.MPSolver;
import com.google.ortools.linearsolver.MPVariable;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.natives.SolverLibraries;

/**
 * The linear relaxation of cutting stock over all stock types, solved by column generation (Gilmore and Gomory
 * 1961, "A linear programming approach to the cutting-stock problem", Operations Research 9(6); several stock
 * lengths as in Gilmore and Gomory 1963, Operations Research 11(6), and Belov and Scheithauer 2002, EJOR 141).
 *
 * <p>Master (GLOP), over the patterns p generated so far, each of stock type k(p):
 * <pre>
 *   min  sum_p c_k(p) x_p
 *   s.t. sum_p a_ip x_p &gt;= r_i          for every item type i      (duals pi_i &gt;= 0)
 *        sum_{p of k} x_p &lt;= u_k         for every stock type k     (duals mu_k &lt;= 0; u_k = infinity
 *                                                                     for unlimited stock)
 *        x_p &gt;= 0
 * </pre>
 * Pricing ({@link KnapsackPricing}) finds, per stock type, the pattern of greatest {@code pi.a}; it enters when its
 * reduced cost {@code c_k - mu_k - pi.a} is negative. Every round also yields the Lagrangian bound
 * <pre>
 *   L(pi, mu) = sum_i pi_i r_i + sum_k mu_k u_k + sum_k U_k min(0, c_k - mu_k - max_p pi.a_p)
 * </pre>
 * with U_k = min(u_k, sum_i r_i) pieces of stock k (no optimal plan uses an empty stock piece). L is a valid lower
 * bound for any pi &gt;= 0, mu &lt;= 0, whether or not the generation has converged, and equals the LP optimum when it
 * has (Lübbecke and Desrosiers 2005, "Selected topics in column generation", Operations Research 53(6)).
 *
 * <p>When the master is infeasible (limited stock), a phase one minimises the bar length left without stock over
 * the same columns; a positive optimum proves that no plan exists. One instance serves one section's solve; the
 * master is reused across residual problems (the diving heuristic), with its iterations counted against the
 * deterministic work limit.
 */
final class ColumnGeneration implements AutoCloseable {
    private static final double REDUCED_COST_TOLERANCE = 1e-9;
    /** Weight of the stability centre in Wentges smoothing. */
    private static final double SMOOTHING = 0.5;

    private final IntegerInstance instance;
    private final MPSolver master;
    private final MPConstraint[] demandRows;
    private final MPConstraint[] limitRows;
    private final MPVariable[] shortage;
    private final List<Pattern> columns = new ArrayList<>();
    private final List<MPVariable> variables = new ArrayList<>();
    private final Map<Pattern, Integer> index = new HashMap<>();
    private final double costScale;
    private final KnapsackPricing pricing;
    private final int iterationLimit;
    private final Deadline deadline;
    private int iterations;
    private int seed;
    /** Whether the master minimises the shortage (phase one) rather than the cost. */
    private boolean phaseOne;

    /** Outcome of one relaxation: see {@link Kind}. Costs and bounds in integer cost units. */
    record Relaxation(Kind kind, double value, double bound, double[] x, double[] shortage) {
    }

    enum Kind {
        /** Converged: {@code value} is the LP optimum. */
        OPTIMAL,
        /** Stopped by the work or time limit: {@code bound} is still valid, {@code x} is the last master's. */
        STOPPED,
        /** No fractional plan exists: {@code shortage} holds the bars per type left without stock. */
        INFEASIBLE,
        /** Stopped by the limits before phase one decided whether a fractional plan exists. */
        UNDECIDED
    }

    ColumnGeneration(IntegerInstance instance, int iterationLimit, Deadline deadline) {
        SolverLibraries.load();
        this.instance = instance;
        this.iterationLimit = iterationLimit;
        this.deadline = deadline;
        this.pricing = new KnapsackPricing(instance);
        long maxCost = 1;
        for (long c : instance.cost) {
            maxCost = Math.max(maxCost, c);
        }
        this.costScale = maxCost; // GLOP sees costs in [0, 1]
        master = MPSolver.createSolver("GLOP");
        double inf = MPSolver.infinity();
        demandRows = new MPConstraint[instance.types()];
        shortage = new MPVariable[instance.types()];
        for (int i = 0; i < instance.types(); i++) {
            // sum_p a_ip x_p + s_i >= r_i; the shortage s_i is allowed in phase one only
            demandRows[i] = master.makeConstraint(instance.demand[i], inf, "demand_" + i);
            shortage[i] = master.makeNumVar(0, 0, "shortage_" + i);
            demandRows[i].setCoefficient(shortage[i], 1);
        }
        limitRows = new MPConstraint[instance.stocks()];
        for (int k = 0; k < instance.stocks(); k++) {
            // sum_{p of k} x_p <= u_k (infinite for unlimited stock, until a residual or a count test limits it)
            limitRows[k] = master.makeConstraint(-inf, instance.limited(k) ? instance.limit[k] : inf,
                    "available_" + k);
        }
        master.objective().setMinimization();
    }

    List<Pattern> columns() {
        return List.copyOf(columns);
    }

    Pattern column(int j) {
        return columns.get(j);
    }

    int iterations() {
        return iterations;
    }

    boolean exhausted() {
        return iterations >= iterationLimit || deadline.passed();
    }

    /** Adds a pattern as a column unless it is already there; returns its index. */
    int add(Pattern p) {
        Integer known = index.get(p);
        if (known != null) {
            return known;
        }
        if (p.isEmpty() || !instance.fits(p)) {
            throw new IllegalArgumentException("not a feasible pattern: " + p);
        }
        MPVariable x = master.makeNumVar(0, MPSolver.infinity(), "x_" + columns.size());
        for (int i = 0; i < instance.types(); i++) {
            if (p.count(i) > 0) {
                demandRows[i].setCoefficient(x, p.count(i));
            }
        }
        limitRows[p.stock()].setCoefficient(x, 1);
        master.objective().setCoefficient(x, phaseOne ? 0 : coefficient(p.stock(), columns.size()));
        index.put(p, columns.size());
        columns.add(p);
        variables.add(x);
        return columns.size() - 1;
    }

    /**
     * Solves the relaxation for a residual demand and the stock left (-1 = unlimited), generating columns until
     * none prices out or the limits stop it.
     */
    Relaxation solve(int[] residual, int[] available) {
        for (int i = 0; i < instance.types(); i++) {
            demandRows[i].setLb(residual[i]);
        }
        for (int k = 0; k < instance.stocks(); k++) {
            limitRows[k].setUb(available[k] < 0 ? MPSolver.infinity() : available[k]);
        }
        int[] bound = new int[instance.types()];
        for (int i = 0; i < instance.types(); i++) {
            bound[i] = instance.size[i] == 0 ? 0 : Math.min(residual[i], instance.maxCapacity / instance.size[i]);
        }
        setPhase(false);
        double bestBound = Double.NEGATIVE_INFINITY;
        double[] centerPi = null;
        double[] centerMu = null;
        while (true) {
            MPSolver.ResultStatus status = master.solve();
            if (status != MPSolver.ResultStatus.OPTIMAL) {
                if (phaseOne) {
                    throw new IllegalStateException("phase one master not solved: " + status);
                }
                setPhase(true);
                continue;
            }
            double[] pi = new double[instance.types()];
            for (int i = 0; i < pi.length; i++) {
                pi[i] = Math.max(0, demandRows[i].dualValue());
            }
            double[] mu = new double[instance.stocks()];
            for (int k = 0; k < mu.length; k++) {
                mu[k] = available[k] < 0 ? 0 : Math.min(0, limitRows[k].dualValue());
            }
            double objective = master.objective().value();
            // Wentges smoothing: price at a point between the best-bound duals and the master's duals; when that
            // point yields no column that improves the master (a mis-price), price at the master's duals
            double alpha = phaseOne || centerPi == null ? 0 : SMOOTHING;
            Round round;
            while (true) {
                double[] pricePi = mix(centerPi, pi, alpha);
                double[] priceMu = mix(centerMu, mu, alpha);
                round = price(pricePi, priceMu, pi, mu, residual, available, bound, phaseOne);
                if (!phaseOne && round.lagrangian() * costScale > bestBound) {
                    bestBound = round.lagrangian() * costScale;
                    centerPi = pricePi;
                    centerMu = priceMu;
                }
                if (!round.entering().isEmpty() || alpha == 0 || exhausted()) {
                    break;
                }
                alpha = 0;
            }
            if (phaseOne) {
                if (objective <= 1e-6) {
                    setPhase(false); // a fractional plan covers the demand: back to the cost
                    continue;
                }
                if (round.entering().isEmpty()) {
                    return infeasible();
                }
                if (exhausted()) {
                    return new Relaxation(Kind.UNDECIDED, Double.NaN, Double.NaN, values(), new double[0]);
                }
            } else {
                if (round.entering().isEmpty() && alpha == 0) {
                    return new Relaxation(Kind.OPTIMAL, objective * costScale, Math.min(bestBound,
                            objective * costScale), values(), new double[instance.types()]);
                }
                if (exhausted()) {
                    return stopped(residual, bestBound);
                }
            }
            for (Pattern p : round.entering()) {
                add(p);
            }
        }
    }

    /** One pricing: the Lagrangian bound at the pricing duals, and the columns that improve the master. */
    private record Round(double lagrangian, List<Pattern> entering) {
    }

    private Round price(double[] pi, double[] mu, double[] masterPi, double[] masterMu, int[] residual,
                        int[] available, int[] bound, boolean phaseOne) {
        KnapsackPricing.Priced priced = pricing.price(pi, bound);
        iterations++;
        List<Pattern> entering = new ArrayList<>();
        double lagrangian = 0;
        for (int i = 0; i < pi.length; i++) {
            lagrangian += pi[i] * residual[i];
        }
        for (int k = 0; k < instance.stocks(); k++) {
            double cost = phaseOne ? 0 : instance.cost[k] / costScale;
            double reduced = cost - mu[k] - priced.value()[k];
            if (available[k] >= 0) {
                lagrangian += mu[k] * available[k];
            }
            lagrangian += instance.usable(k, residual, available) * Math.min(0, reduced);
            // the column enters when it prices out at the master's own duals
            Pattern p = priced.pattern()[k];
            double masterReduced = cost - masterMu[k];
            for (int i = 0; i < masterPi.length; i++) {
                masterReduced -= masterPi[i] * p.count(i);
            }
            if (masterReduced < -REDUCED_COST_TOLERANCE && !p.isEmpty() && !index.containsKey(p)
                    && !entering.contains(p)) {
                entering.add(p);
            }
        }
        return new Round(lagrangian, entering);
    }

    /** alpha * center + (1 - alpha) * current; the current duals when there is no center. */
    private static double[] mix(double[] center, double[] current, double alpha) {
        if (center == null || alpha == 0) {
            return current;
        }
        double[] mixed = new double[current.length];
        for (int i = 0; i < mixed.length; i++) {
            mixed[i] = alpha * center[i] + (1 - alpha) * current[i];
        }
        return mixed;
    }

    private Relaxation stopped(int[] residual, double bound) {
        double value = master.objective().value() * costScale;
        return new Relaxation(Kind.STOPPED, value, Math.max(0, bound), values(), new double[residual.length]);
    }

    private Relaxation infeasible() {
        double[] missing = new double[instance.types()];
        for (int i = 0; i < missing.length; i++) {
            missing[i] = shortage[i].solutionValue();
        }
        return new Relaxation(Kind.INFEASIBLE, Double.NaN, Double.NaN, values(), missing);
    }

    private double[] values() {
        double[] x = new double[variables.size()];
        for (int j = 0; j < x.length; j++) {
            x[j] = variables.get(j).solutionValue();
        }
        return x;
    }

    /** Phase one: minimise the size left without stock; phase two: minimise cost, no shortage. */
    private void setPhase(boolean one) {
        phaseOne = one;
        double maxSize = instance.size.length == 0 ? 1 : instance.size[0];
        for (int i = 0; i < shortage.length; i++) {
            shortage[i].setUb(one ? MPSolver.infinity() : 0);
            master.objective().setCoefficient(shortage[i], one ? instance.size[i] / maxSize : 0);
        }
        for (int j = 0; j < variables.size(); j++) {
            master.objective().setCoefficient(variables.get(j), one ? 0 : coefficient(columns.get(j).stock(), j));
        }
    }

    /**
     * Perturbs the master's costs by up to 1e-4 of their value, by a fixed pseudo-random rule per seed (0 = none),
     * so that a degenerate relaxation shows another of its optimal vertices to the next dive. Bounds stay valid:
     * they are computed with the true costs.
     */
    void perturb(int seed) {
        this.seed = seed;
        for (int j = 0; j < variables.size(); j++) {
            master.objective().setCoefficient(variables.get(j), coefficient(columns.get(j).stock(), j));
        }
    }

    private double coefficient(int stock, int column) {
        double cost = instance.cost[stock] / costScale;
        if (seed == 0) {
            return cost;
        }
        long h = (column + 1) * 0x9E3779B97F4A7C15L ^ seed * 0xC2B2AE3D27D4EB4FL;
        h ^= h >>> 31;
        h *= 0xBF58476D1CE4E5B9L;
        h ^= h >>> 29;
        double unit = (h >>> 11) / (double) (1L << 53);
        return cost * (1 + 1e-4 * unit) + 1e-6 * unit;
    }

    @Override
    public void close() {
        master.delete();
    }
}
