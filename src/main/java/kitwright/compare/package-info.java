/**
 * Comparing kit options: one {@link kitwright.compare.OptionSummary} per option (the keys of {@code compare.json}),
 * the best value of each figure and every option's difference to it, and the writers of {@code compare.json},
 * {@code compare.csv} and the self-contained {@code compare.html}. Planning an option is behind
 * {@link kitwright.compare.OptionPlanner}, so the comparison does not depend on how the plan is made.
 */
package kitwright.compare;
