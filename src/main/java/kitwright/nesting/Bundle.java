package kitwright.nesting;

/**
 * A host tube with everything nested in it: one handling unit.
 *
 * @param envelopeDiameterMm outside diameter of the host (the bundle's envelope)
 * @param massKg             mass of all tubes in the bundle
 */
public record Bundle(String id, double lengthMm, double envelopeDiameterMm, double massKg, NestedTube host) {
}
