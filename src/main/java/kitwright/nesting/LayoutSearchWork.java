package kitwright.nesting;

import kitwright.cutting.Deadline;

/**
 * The work of the exact layout searches ({@link SegmentPacker}) of one pattern enumeration, counted in search
 * nodes against a deterministic budget ({@link NestingOptions#maxExactNodes()}) and the nesting stage's deadline.
 * The search is exponential in the guests per host, so without a budget a kit of many thin tubes in wide hosts
 * could run for hours. Once spent, every search fails and the enumeration is given up as incomplete (column
 * generation takes over); the budget ends it at the same node on every machine, the deadline (checked every
 * 1,024 nodes) only on a slow one.
 */
final class LayoutSearchWork {
    private static final int CLOCK_EVERY = 1024;
    private final long budget;
    private final Deadline deadline;
    private long nodes;
    private boolean stopped;

    LayoutSearchWork(long budget, Deadline deadline) {
        this.budget = budget;
        this.deadline = deadline;
    }

    /** Counts one node; false when the budget or the time is spent (and from then on). */
    boolean step() {
        if (stopped) {
            return false;
        }
        nodes++;
        if (nodes > budget || (nodes % CLOCK_EVERY == 0 && deadline.passed())) {
            stopped = true;
        }
        return !stopped;
    }

    /** Nodes searched so far (the deterministic step counter). */
    long nodes() {
        return nodes;
    }

    /** True when the budget or the deadline stopped a search. */
    boolean stopped() {
        return stopped;
    }
}
