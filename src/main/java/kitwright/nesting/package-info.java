/**
 * Nesting (telescoping): thinner cut tubes slide inside thicker ones, several side by side and end to end, so the
 * kit travels in fewer bundles. The records here are the JSON contract of {@code plan.json -> "nesting"}.
 */
package kitwright.nesting;
