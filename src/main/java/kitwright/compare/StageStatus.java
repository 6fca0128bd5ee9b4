package kitwright.compare;

import kitwright.model.Status;

/**
 * One stage of an option's plan with its status and its gap to the proven bound, for {@code compare.json ->
 * stages}.
 *
 * @param stage  "cutting SECTION", "nesting", "crates", "loads" (the trips for these crates) or "crates and trips"
 *               (crate price plus trips against the bound over every crate plan and loading)
 * @param gap    (value - bound) / value, null when INFEASIBLE or not known
 */
public record StageStatus(String stage, Status status, Double gap) {

    /** "crates 12.5 % above their bound", "nesting INFEASIBLE", or null when OPTIMAL. */
    String reason() {
        if (status == Status.OPTIMAL) {
            return null;
        }
        if (status == Status.INFEASIBLE || gap == null) {
            return stage + " " + status;
        }
        return String.format(java.util.Locale.ROOT, "%s %.1f %% above the bound", stage, 100 * gap);
    }
}
