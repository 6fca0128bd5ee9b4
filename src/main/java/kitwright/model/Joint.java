package kitwright.model;

/** A joint type of the kit (spherical node or plate), shipped in joint boxes. */
public record Joint(String mark, double diameterMm, double massKg, int quantity) {
}
