/**
 * One-dimensional cutting stock: which stock lengths to buy (and which rack offcuts to use) and how to saw each
 * piece into the kit's marks, one problem per section. The records here are the JSON contract of
 * {@code cut --json} and {@code plan.json -> "cutting"}.
 */
package kitwright.cutting;
