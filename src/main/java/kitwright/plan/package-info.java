/**
 * Planning a kit from end to end. {@link kitwright.plan.KitSummary} states what a validated kit holds (marks, bars,
 * cut length and mass per section, joints, members per structure, reuse ratio, spares); later stages add the
 * cutting, nesting, crating and loading plans. Pure functions only: no files, no console.
 */
package kitwright.plan;
