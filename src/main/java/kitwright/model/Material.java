package kitwright.model;

/** A tube material from {@code materials.csv}: density and embodied-carbon factor, with the source of both. */
public record Material(String name, double densityKgM3, double co2eKgPerKg, String source) {
    public Material {
        if (densityKgM3 <= 0) {
            throw new IllegalArgumentException("density must be positive: " + densityKgM3);
        }
    }
}
