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
 */
public record SearchLimits(double timeLimitSeconds, int columnIterations, int divingNodes,
                           double integerDeterministicTime, double exactDeterministicTime, int exactMaxArcs) {

    public SearchLimits {
        if (!(timeLimitSeconds > 0)) {
            throw new IllegalArgumentException("time limit must be positive: " + timeLimitSeconds);
        }
        if (columnIterations < 1 || divingNodes < 0 || integerDeterministicTime < 0 || exactDeterministicTime < 0
                || exactMaxArcs < 0) {
            throw new IllegalArgumentException("work limits must not be negative");
        }
    }

    /** The default work limits with the given safety-net time limit. */
    public static SearchLimits defaults(double timeLimitSeconds) {
        return new SearchLimits(timeLimitSeconds, 4000, 60, 1.0, 2.0, 40_000);
    }

    public SearchLimits withTimeLimitSeconds(double seconds) {
        return new SearchLimits(seconds, columnIterations, divingNodes, integerDeterministicTime,
                exactDeterministicTime, exactMaxArcs);
    }
}
