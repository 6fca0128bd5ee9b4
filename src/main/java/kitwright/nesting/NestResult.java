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
 */
public record NestResult(NestPlan plan, String reason, String rule, int pieces, double looseVolumeM3,
                         double bundledVolumeM3) {
}
