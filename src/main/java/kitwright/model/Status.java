package kitwright.model;

/**
 * Outcome of an optimising stage. {@code OPTIMAL} only when proven; {@code FEASIBLE} is a valid plan with a stated
 * gap to the lower bound (for example when a time or work limit stopped the search); {@code INFEASIBLE} means no
 * plan exists with the data given (never "gave up").
 */
public enum Status {
    OPTIMAL, FEASIBLE, INFEASIBLE
}
