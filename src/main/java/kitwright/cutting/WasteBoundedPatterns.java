package kitwright.cutting;

import com.google.ortools.sat.CpModel;
import com.google.ortools.sat.CpSolver;
import com.google.ortools.sat.CpSolverStatus;
import com.google.ortools.sat.IntVar;
import com.google.ortools.sat.LinearExpr;
import com.google.ortools.sat.LinearExprBuilder;
import java.util.ArrayList;
import java.util.List;
import kitwright.natives.SolverLibraries;

/**
 * Decides whether one stock length can cover the demand with T pieces, by a complete model over the only patterns
 * such a plan can use.
 *
 * <p>With T pieces of capacity C, the waste of the whole plan is at most {@code W = T*C - sum_i size_i d_i}, so every
 * pattern of the plan wastes at most W. All patterns of load at least C - W (and at most C) are enumerated
 * (depth first over the item types, at most {@code maxPatterns} of them in at most 1,000 nodes per pattern, while
 * the deadline has not passed); then CP-SAT solves
 * <pre>
 *   sum_p a_ip x_p &gt;= d_i  for every item type i,   sum_p x_p &lt;= T,   sum_p (C - load_p) x_p &lt;= W,
 *   x_p &gt;= 0 integer
 * </pre>
 * A solution is a plan of T pieces; INFEASIBLE proves that no plan has T pieces or fewer. When the IRUP gap is
 * zero (the LP bound rounded up is the optimum, which is almost always so: Scheithauer and Terno 1995), W is small
 * and so is the set of patterns; for the triplet instances of Falkenauer (1996) W = 0 and only perfect patterns
 * remain. The waste-bounded enumeration follows the "reduced pattern set" idea of exact cutting-stock methods
 * (Delorme, Iori and Martello 2016, EJOR 255, section 4).
 */
final class WasteBoundedPatterns {
    /** Search nodes allowed for each pattern the enumeration may keep (a deterministic work limit). */
    private static final long STEPS_PER_PATTERN = 1000;
    /** The deadline is read once per this many nodes. */
    private static final long CLOCK_EVERY = 1024;
    private WasteBoundedPatterns() {
    }

    /**
     * @param found      the plan of T pieces, or null
     * @param infeasible proven: no plan of T pieces or fewer
     */
    record Outcome(Packing found, boolean infeasible) {
    }

    /**
     * @return the outcome, or null when there are more than {@code maxPatterns} patterns or the listing ran out of
     *         steps or time
     */
    static Outcome solve(IntegerInstance instance, int stock, int[] demand, long pieces, int maxPatterns,
                         double deterministicTime, Deadline deadline) {
        SolverLibraries.load(); // the model objects need the natives, not only the solver
        long capacity = instance.capacity[stock];
        long waste = pieces * capacity - instance.load(demand);
        if (waste < 0) {
            return new Outcome(null, true);
        }
        List<int[]> patterns = new ArrayList<>();
        // the search may visit many nodes for each pattern it keeps: bound its steps, and watch the clock
        long[] steps = {STEPS_PER_PATTERN * maxPatterns};
        if (!enumerate(instance, demand, capacity - waste, capacity, 0, 0, new int[instance.types()], patterns,
                maxPatterns, steps, deadline)) {
            return null;
        }
        if (patterns.isEmpty()) {
            return new Outcome(null, true);
        }
        CpModel model = new CpModel();
        IntVar[] x = new IntVar[patterns.size()];
        for (int j = 0; j < x.length; j++) {
            x[j] = model.newIntVar(0, pieces, "x_" + j);
        }
        for (int i = 0; i < instance.types(); i++) {
            if (demand[i] == 0) {
                continue;
            }
            // sum_p a_ip x_p >= d_i
            LinearExprBuilder made = LinearExpr.newBuilder();
            for (int j = 0; j < x.length; j++) {
                if (patterns.get(j)[i] > 0) {
                    made.addTerm(x[j], patterns.get(j)[i]);
                }
            }
            if (waste == 0) {
                model.addEquality(made, demand[i]); // no room for a surplus piece either
            } else {
                model.addGreaterOrEqual(made, demand[i]);
            }
        }
        // sum_p x_p <= T and sum_p (C - load_p) x_p <= W
        LinearExprBuilder count = LinearExpr.newBuilder();
        LinearExprBuilder wasted = LinearExpr.newBuilder();
        for (int j = 0; j < x.length; j++) {
            count.add(x[j]);
            wasted.addTerm(x[j], capacity - instance.load(patterns.get(j)));
        }
        model.addLessOrEqual(count, pieces);
        model.addLessOrEqual(wasted, waste);
        CpSolver solver = CpSatRun.solver(deterministicTime, deadline);
        CpSolverStatus status = solver.solve(model);
        if (status == CpSolverStatus.INFEASIBLE) {
            return new Outcome(null, true);
        }
        if (status != CpSolverStatus.OPTIMAL && status != CpSolverStatus.FEASIBLE) {
            return new Outcome(null, false);
        }
        List<Pattern> plan = new ArrayList<>();
        for (int j = 0; j < x.length; j++) {
            for (long n = solver.value(x[j]); n > 0; n--) {
                plan.add(new Pattern(stock, patterns.get(j)));
            }
        }
        return new Outcome(new Packing(plan), false);
    }

    /**
     * Depth first over the types from {@code type} on; false when the pattern limit is passed, the steps left
     * ({@code steps[0]}) are spent or the deadline has passed.
     */
    private static boolean enumerate(IntegerInstance instance, int[] demand, long minLoad, long capacity, int type,
                                     long load, int[] counts, List<int[]> out, int maxPatterns, long[] steps,
                                     Deadline deadline) {
        if (--steps[0] < 0 || (steps[0] % CLOCK_EVERY == 0 && deadline.passed())) {
            return false;
        }
        if (type == instance.types()) {
            if (load >= minLoad && load > 0) {
                out.add(counts.clone());
                return out.size() <= maxPatterns;
            }
            return true;
        }
        // the load can still grow by at most what the remaining types and the capacity allow
        long reachable = load;
        for (int i = type; i < instance.types() && reachable < capacity; i++) {
            reachable += (long) demand[i] * instance.size[i];
        }
        if (Math.min(reachable, capacity) < minLoad) {
            return true;
        }
        int size = instance.size[type];
        int most = (int) Math.min(demand[type], (capacity - load) / size);
        for (int c = most; c >= 0; c--) {
            counts[type] = c;
            if (!enumerate(instance, demand, minLoad, capacity, type + 1, load + (long) c * size, counts, out,
                    maxPatterns, steps, deadline)) {
                counts[type] = 0;
                return false;
            }
        }
        counts[type] = 0;
        return true;
    }
}
