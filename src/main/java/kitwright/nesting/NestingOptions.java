package kitwright.nesting;

/**
 * Work limits of {@link PatternNester}. The deterministic limits decide the answer; the wall-clock limit is only a
 * safety net: one deadline for the whole nesting stage, which the enumeration, every column-generation round, every
 * dive and every CP-SAT call check (a plan it cut short says "stopped by the time limit").
 *
 * @param deterministicSeconds CP-SAT deterministic time per integer phase [0.5]
 * @param wallSeconds          wall-clock safety net of the whole nesting stage [10, kit.json timeLimitSeconds]
 * @param maxColumnIterations  column-generation rounds per LP (the bound's, and each dive's) [100]
 * @param maxDives             patterns fixed one after another by diving, at most [200]
 * @param maxExactPatterns     largest pattern set enumerated for an exact answer [3000]
 * @param maxExactGuests       most guests per host for the exact enumeration [8]
 * @param maxPricingWork       knapsack cells per pricing round; lengths are coarsened above it [2e7]
 * @param maxPricingCells      knapsack cells in all, column generation and diving together; past it they stop and
 *                             best-fit decreasing places what is left (the bound stays valid) [1e9]
 * @param maxExactNodes        search nodes of the exact layout searches of the enumeration, in all; past it the
 *                             enumeration is given up and column generation takes over [1e6]
 */
public record NestingOptions(double deterministicSeconds, double wallSeconds, int maxColumnIterations,
                             int maxDives, int maxExactPatterns, int maxExactGuests, double maxPricingWork,
                             double maxPricingCells, long maxExactNodes) {
    private static final long EXACT_NODES = 1_000_000L;
    public static final NestingOptions DEFAULT = new NestingOptions(0.5, 10.0, 100, 200, 3000, 8, 2e7, 1e9);

    public NestingOptions {
        if (!(deterministicSeconds > 0) || !(wallSeconds > 0) || maxColumnIterations < 1 || maxDives < 1
                || maxExactPatterns < 0 || maxExactGuests < 0 || !(maxPricingWork > 0) || !(maxPricingCells > 0)
                || maxExactNodes < 0) {
            throw new IllegalArgumentException("bad nesting options");
        }
    }

    /** The given limits with the default node budget of the exact enumeration. */
    public NestingOptions(double deterministicSeconds, double wallSeconds, int maxColumnIterations, int maxDives,
                          int maxExactPatterns, int maxExactGuests, double maxPricingWork, double maxPricingCells) {
        this(deterministicSeconds, wallSeconds, maxColumnIterations, maxDives, maxExactPatterns, maxExactGuests,
                maxPricingWork, maxPricingCells, EXACT_NODES);
    }

    public NestingOptions withWallSeconds(double seconds) {
        return new NestingOptions(deterministicSeconds, seconds, maxColumnIterations, maxDives, maxExactPatterns,
                maxExactGuests, maxPricingWork, maxPricingCells, maxExactNodes);
    }

    public NestingOptions withMaxExactNodes(long nodes) {
        return new NestingOptions(deterministicSeconds, wallSeconds, maxColumnIterations, maxDives, maxExactPatterns,
                maxExactGuests, maxPricingWork, maxPricingCells, nodes);
    }

    /** Without the exact enumeration (for comparing methods). */
    public NestingOptions withoutExactEnumeration() {
        return new NestingOptions(deterministicSeconds, wallSeconds, maxColumnIterations, maxDives, 0, 0,
                maxPricingWork, maxPricingCells, maxExactNodes);
    }
}
