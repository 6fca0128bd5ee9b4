package kitwright.metrics;

import java.util.List;

/**
 * Kit-level figures of one kit and its cutting plan. Lengths in millimetres, masses in kilograms, money in the
 * catalog's currency. A figure that cannot be known from the data (no prices, no materials) is null.
 *
 * @param marks            bar types in the kit
 * @param bars             bars in the kit (bars.csv quantities, surplus included)
 * @param members          members in all structures (structures.csv counts), null without structures.csv
 * @param reuseRatio       members / bars (src/docs/sources.md: 750 members on 300 bars is 2.5), null without
 *                         structures.csv: without structures there is no reuse to count
 * @param stockPieces      stock pieces cut, mill and rack
 * @param boughtPieces     mill pieces bought
 * @param stockLengthMm    length of all stock pieces cut, mill and rack
 * @param boughtLengthMm   length of the mill pieces bought
 * @param cost             price of the stock cut (mill and rack rows at their catalog price, an unpriced rack row
 *                         at 0), null when a mill row has no price
 * @param offcutPct        offcut length / stockLengthMm * 100 (offcut = remnant + scrap; kerf and trim not included)
 * @param scrapPct         scrap offcuts (shorter than minRemnant) / stockLengthMm * 100
 * @param remnantPct       remnant offcuts (back on the rack) / stockLengthMm * 100
 * @param kitMassKg        mass of the kit's bars, spares cut included, and joints ({@link KitMass}), null without
 *                         materials
 * @param boughtMassKg     mass of the mill stock bought, null without materials
 * @param usedStockMassKg  mass of all stock cut: the mill stock bought and the rack offcuts taken, null without
 *                         materials
 * @param co2eKg           embodied carbon of the mill stock bought, null without materials
 * @param carbon           embodied carbon per material, in the order materials first appear in the catalog
 */
public record KitMetrics(int marks, int bars, Integer members, Double reuseRatio, int stockPieces, int boughtPieces,
                         double stockLengthMm, double boughtLengthMm, Double cost, double offcutPct, double scrapPct,
                         double remnantPct, Double kitMassKg, Double boughtMassKg,
                         Double usedStockMassKg, Double co2eKg,
                         List<MaterialCarbon> carbon) {
    public KitMetrics {
        carbon = List.copyOf(carbon);
    }
}
