/**
 * The ids of what a plan ships: bundles, joint boxes, crates and trips. {@link kitwright.ids.IdScheme} chooses
 * their stems so that no id reads like a mark of the kit; {@link kitwright.ids.IdOrder} is the number order every
 * printed list of ids is sorted by.
 */
package kitwright.ids;
