package kitwright.cutting;

/**
 * How much work the optimiser may spend on one section. The work limits are deterministic (counted in
 * column-generation iterations and in CP-SAT's deterministic time units), so that the plan does not depend on the
 * speed of the machine; the wall-clock limit is a safety net only and, when it strikes, the best plan found so far
 * is returned as FEASIBLE with its gap.
 *
 * @param timeLimitSeconds      wall-clock safety net per section
 * @param columnIterations      master/pricing rounds of column generation over the whole solve (all dives)
 * @param divingNodes           relaxations solved by each dive of the diving heuristic
 * @param integerDeterministicTime CP-SAT deterministic time for each integer model over the generated patterns
 * @param exactDeterministicTime CP-SAT deterministic time for each arc-flow model
 * @param exactMaxArcs          largest arc-flow graph (arcs) worth handing to CP-SAT
 * @param stockCountSteps       steps (search nodes and dominance checks) of the stock-count bound's listing of
 *                              whole stock counts, which grows exponentially with the number of stock rows
 */
public record SearchLimits(double timeLimitSeconds, int columnIterations, int divingNodes,
                           double integerDeterministicTime, double exactDeterministicTime, int exactMaxArcs,
                           long stockCountSteps) {
    private static final long STOCK_COUNT_STEPS = 5_000_000L;

    public SearchLimits {
        if (!(timeLimitSeconds > 0)) {
            throw new IllegalArgumentException("time limit must be positive: " + timeLimitSeconds);
        }
        if (columnIterations < 1 || divingNodes < 0 || integerDeterministicTime < 0 || exactDeterministicTime < 0
                || exactMaxArcs < 0 || stockCountSteps < 0) {
            throw new IllegalArgumentException("work limits must not be negative");
        }
    }

    /** The given limits with the default steps for the stock-count bound. */
    public SearchLimits(double timeLimitSeconds, int columnIterations, int divingNodes,
                        double integerDeterministicTime, double exactDeterministicTime, int exactMaxArcs) {
        this(timeLimitSeconds, columnIterations, divingNodes, integerDeterministicTime, exactDeterministicTime,
                exactMaxArcs, STOCK_COUNT_STEPS);
    }

    /** The default work limits with the given safety-net time limit. */
    public static SearchLimits defaults(double timeLimitSeconds) {
        return new SearchLimits(timeLimitSeconds, 4000, 60, 1.0, 2.0, 40_000);
    }

    public SearchLimits withTimeLimitSeconds(double seconds) {
        return new SearchLimits(seconds, columnIterations, divingNodes, integerDeterministicTime,
                exactDeterministicTime, exactMaxArcs, stockCountSteps);
    }

    public SearchLimits withStockCountSteps(long steps) {
        return new SearchLimits(timeLimitSeconds, columnIterations, divingNodes, integerDeterministicTime,
                exactDeterministicTime, exactMaxArcs, steps);
    }
}
