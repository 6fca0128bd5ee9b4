package kitwright.cutting;

/**
 * The wall-clock safety net of one section's solve, or of one stage (nesting, crating, loading): one deadline per
 * section or stage, set when it starts, that every loop and solver call of it checks. The deadline remembers that
 * it was seen passed ({@link #struck()}), so that the stage can say its plan was {@link #STOPPED_BY_TIME_LIMIT}
 * (such a plan may differ from machine to machine, unlike one the deterministic work limits ended).
 */
public final class Deadline {
    /** The reason a FEASIBLE plan gives when the wall-clock limit, not a work limit, ended a search. */
    public static final String STOPPED_BY_TIME_LIMIT = SectionCutPlan.STOPPED_BY_TIME_LIMIT;

    private final long endNanos;
    private boolean struck;

    private Deadline(long endNanos) {
        this.endNanos = endNanos;
    }

    public static Deadline in(double seconds) {
        long nanos = (long) Math.min(Long.MAX_VALUE / 4.0, seconds * 1e9);
        return new Deadline(System.nanoTime() + nanos);
    }

    /** True once the time is up; from then on {@link #struck()} is true too. */
    public boolean passed() {
        if (!struck && System.nanoTime() >= endNanos) {
            struck = true;
        }
        return struck;
    }

    /** True when some check found the time up: a search may have been cut short by the clock. */
    public boolean struck() {
        return struck;
    }

    /** Seconds left, at least a millisecond so that a solver given it still returns at once. */
    public double remainingSeconds() {
        return Math.max(0.001, (endNanos - System.nanoTime()) / 1e9);
    }
}
