/**
 * A tour's legs in the plan folder: {@code legs.csv} (one row per leg), {@code leg-packing-lists.csv} and
 * {@code leg-load-lists.csv} (the packing and load lists of every leg, with a {@code leg} column), the
 * {@code legs} of plan.json, and the report's tour section and one section per leg. Pure functions.
 */
package kitwright.report.tour;
