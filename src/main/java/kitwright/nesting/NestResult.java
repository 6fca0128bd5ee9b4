package kitwright.nesting;

/**
 * The nesting stage's answer with what the report says about it.
 *
 * @param plan              the plan.json record
 * @param reason            null unless the plan is INFEASIBLE: what breaks the limit
 * @param rule              the fit rule used, in words (for the report)
 * @param pieces            tubes nested (every cut piece)
 * @param looseVolumeM3     total envelope volume if no tube were nested, m^3
 * @param bundledVolumeM3   total envelope volume of the bundles, m^3
 * @param limitReason       "stopped by the time limit" when the stage's wall-clock limit, not its work limits, cut
 *                          the search short (the plan may then differ from machine to machine), else null; not in
 *                          plan.json, whose "nesting" keys stay as they are
 */
public record NestResult(NestPlan plan, String reason, String rule, int pieces, double looseVolumeM3,
                         double bundledVolumeM3, String limitReason) {

    /** An answer that no time limit cut short. */
    public NestResult(NestPlan plan, String reason, String rule, int pieces, double looseVolumeM3,
                      double bundledVolumeM3) {
        this(plan, reason, rule, pieces, looseVolumeM3, bundledVolumeM3, null);
    }

    /** The status with the time-limit reason when there is one: "FEASIBLE, stopped by the time limit". */
    public String statusText() {
        return plan.status() + (limitReason == null ? "" : ", " + limitReason);
    }
}
