/**
 * Nesting (telescoping): thinner cut tubes slide inside thicker ones, several side by side and end to end, so the
 * kit travels in fewer bundles. The records {@link kitwright.nesting.NestPlan}, {@link kitwright.nesting.Bundle}
 * and {@link kitwright.nesting.NestedTube} are the JSON contract of {@code plan.json -> "nesting"}.
 *
 * <p>The stage is {@link kitwright.nesting.Nester} (kit and cutting plan in, plan out). Inside: the fit rule
 * ({@link kitwright.nesting.FitRule}, EN 10219-2 worst case or nominal), the channel layouts of a bore
 * ({@link kitwright.nesting.EqualCirclePacking}), best-fit decreasing
 * ({@link kitwright.nesting.BestFitDecreasingNester}) and the pattern optimiser
 * ({@link kitwright.nesting.PatternNester}: exact enumeration for small kits, column generation with a Lagrangian
 * bound, diving and CP-SAT otherwise).
 */
package kitwright.nesting;
