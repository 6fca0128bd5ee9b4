/**
 * Kit-level figures for comparing kit options and for the plan report: reuse ratio, stock bought, offcut waste,
 * masses and embodied carbon. Pure functions of the kit and its cutting plan.
 */
package kitwright.metrics;
