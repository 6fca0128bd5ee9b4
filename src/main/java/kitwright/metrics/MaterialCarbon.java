package kitwright.metrics;

/**
 * Embodied carbon of the stock bought in one material.
 *
 * @param boughtMassKg mass of the mill stock bought in this material
 * @param co2eKgPerKg  the material's factor from materials.csv
 * @param co2eKg       boughtMassKg * co2eKgPerKg
 * @param source       where the factor comes from (materials.csv {@code source})
 */
public record MaterialCarbon(String material, double boughtMassKg, double co2eKgPerKg, double co2eKg,
                             String source) {
}
