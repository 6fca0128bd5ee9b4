package kitwright.cutting;

/**
 * Progress of the optimiser, for a command line to show on stderr. Values are in the section's objective unit.
 */
@FunctionalInterface
public interface CutProgress {
    /** Ignores every report. */
    CutProgress NONE = (stage, section, lowerBound, bestValue) -> { };

    /**
     * @param stage      what runs now, e.g. "lower bound", "integer", "exact"
     * @param section    the section being planned
     * @param lowerBound best proven lower bound so far
     * @param bestValue  value of the best plan so far, or null when there is none yet
     */
    void report(String stage, String section, double lowerBound, Double bestValue);
}
