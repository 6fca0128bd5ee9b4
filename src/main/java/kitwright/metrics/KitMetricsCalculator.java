package kitwright.metrics;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.StockLength;
import kitwright.model.StructureCount;

/**
 * Computes {@link KitMetrics} from a kit and its cutting plan.
 *
 * <ul>
 *   <li>Reuse ratio = members in all structures / bars in the kit (src/docs/sources.md, Reuse and spares); none
 *       (null) without structures.csv, as the kit summary has it.</li>
 *   <li>Kit mass: {@link KitMass}, the bars of bars.csv and the spares the plan cuts, plus the joints. Used stock
 *       mass: every stock piece cut, mill and rack; bought mass: the mill pieces only.</li>
 *   <li>Embodied carbon is counted on the stock bought, not on the kit: bought mass = sum over mill pieces of
 *       length x mass per metre (M = pi (D - T) T rho 1e-6 kg/m, the EN 10219-2 formula), times the material's
 *       factor from materials.csv. Rack offcuts carry no new carbon: it was counted when they were bought.</li>
 *   <li>Offcut, scrap and remnant percentages are of the stock length cut (mill and rack), which is the length
 *       bought when no rack offcuts are used.</li>
 * </ul>
 * Pure function: no state, no I/O.
 */
public final class KitMetricsCalculator {
    private static final double LENGTH_MATCH_MM = 1e-6;

    private KitMetricsCalculator() {
    }

    /** Metrics of a kit and its cutting plan. Infeasible sections contribute no stock. */
    public static KitMetrics of(Kit kit, CutPlan plan) {
        int bars = kit.bars().stream().mapToInt(Bar::quantity).sum();
        Integer members = members(kit);
        int stockPieces = 0;
        int boughtPieces = 0;
        double stockLength = 0;
        double boughtLength = 0;
        double offcut = 0;
        double scrap = 0;
        double remnant = 0;
        boolean massKnown = !kit.materials().isEmpty();
        double usedMass = 0;
        Map<String, double[]> boughtMassByMaterial = new LinkedHashMap<>();
        for (SectionCutPlan section : plan.sections()) {
            Optional<Section> sectionInfo = kit.catalog().section(section.section());
            for (CutPattern p : section.patterns()) {
                stockPieces += p.count();
                stockLength += p.count() * p.stockLengthMm();
                offcut += p.count() * p.offcutMm();
                if ("remnant".equals(p.offcutKind())) {
                    remnant += p.count() * p.offcutMm();
                } else {
                    scrap += p.count() * p.offcutMm();
                }
                Optional<Material> material = sectionInfo.flatMap(kit::material);
                if (material.isEmpty()) {
                    massKnown = false;
                }
                double mass = material.isEmpty() ? 0 : p.count() * p.stockLengthMm() / 1000.0
                        * sectionInfo.get().massPerMetreKg(material.get().densityKgM3());
                usedMass += mass;
                if (p.origin() == Origin.MILL) {
                    boughtPieces += p.count();
                    boughtLength += p.count() * p.stockLengthMm();
                    if (material.isPresent()) {
                        boughtMassByMaterial.computeIfAbsent(material.get().name(), k -> new double[1])[0] += mass;
                    }
                }
            }
        }
        List<MaterialCarbon> carbon = boughtMassByMaterial.entrySet().stream()
                .map(e -> {
                    Material m = kit.materials().get(e.getKey());
                    double mass = e.getValue()[0];
                    return new MaterialCarbon(m.name(), mass, m.co2eKgPerKg(), mass * m.co2eKgPerKg(), m.source());
                })
                .toList();
        Double boughtMass = massKnown ? carbon.stream().mapToDouble(MaterialCarbon::boughtMassKg).sum() : null;
        Double co2e = massKnown ? carbon.stream().mapToDouble(MaterialCarbon::co2eKg).sum() : null;
        Double reuseRatio = members == null || bars == 0 ? null : (double) members / bars;
        return new KitMetrics(kit.bars().size(), bars, members, reuseRatio,
                stockPieces, boughtPieces, stockLength, boughtLength, stockCost(kit, plan),
                payableCost(kit, plan),
                percent(offcut, stockLength), percent(scrap, stockLength), percent(remnant, stockLength),
                KitMass.of(kit, plan).totalKg(), boughtMass, massKnown ? usedMass : null, co2e,
                massKnown ? carbon : List.of());
    }

    /** Members in all structures: the sum of structures.csv counts, or null without structures.csv. */
    public static Integer members(Kit kit) {
        if (kit.structures().isEmpty()) {
            return null;
        }
        return kit.barCounts().stream().mapToInt(StructureCount::count).sum();
    }

    /**
     * Price of the stock a plan cuts, mill and rack rows at their catalog price per piece; null when a mill row has
     * no price, while a rack offcut without a price costs nothing (as the cutting stage and the report count it).
     * Null too when the stock cut is priced in more than one currency: a sum of two currencies means nothing.
     */
    public static Double stockCost(Kit kit, CutPlan plan) {
        return stockCost(kit, plan, EnumSet.allOf(Origin.class));
    }

    /**
     * Price of the mill stock a plan buys, the amount payable to suppliers, as an order adds it up: each line
     * (section and stock length) at pieces x price per piece rounded half-up to the cent, then the lines summed, so
     * that it equals the sum of order.csv's {@code total} column. Null as for {@link #stockCost}.
     */
    public static Double payableCost(Kit kit, CutPlan plan) {
        if (stockCost(kit, plan, EnumSet.of(Origin.MILL)) == null) {
            return null;
        }
        Map<StockLength, Integer> pieces = new LinkedHashMap<>();
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern p : section.patterns()) {
                if (p.origin() == Origin.MILL) {
                    pieces.merge(stockRow(kit, section.section(), p).orElseThrow(), p.count(), Integer::sum);
                }
            }
        }
        BigDecimal sum = BigDecimal.ZERO;
        for (Map.Entry<StockLength, Integer> line : pieces.entrySet()) {
            sum = sum.add(BigDecimal.valueOf(line.getValue() * line.getKey().price()).setScale(2, RoundingMode.HALF_UP));
        }
        return sum.doubleValue();
    }

    /** As {@link #stockCost(Kit, CutPlan)}, over the stock of the given origins only. */
    static Double stockCost(Kit kit, CutPlan plan, Set<Origin> origins) {
        double cost = 0;
        Set<String> currencies = new HashSet<>();
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern p : section.patterns()) {
                if (!origins.contains(p.origin())) {
                    continue;
                }
                Optional<StockLength> row = stockRow(kit, section.section(), p);
                row.ifPresent(r -> currencies.add(r.terms().currency()));
                Double price = row.map(StockLength::price).orElse(null);
                if (price == null && p.origin() == Origin.MILL) {
                    return null;
                }
                if (price == null) {
                    continue;
                }
                cost += p.count() * price;
            }
        }
        return currencies.size() > 1 ? null : cost;
    }

    private static Optional<StockLength> stockRow(Kit kit, String section, CutPattern pattern) {
        return kit.catalog().stockFor(section).stream()
                .filter(s -> s.origin() == pattern.origin()
                        && Math.abs(s.lengthMm() - pattern.stockLengthMm()) <= LENGTH_MATCH_MM)
                .findFirst();
    }

    private static double percent(double part, double whole) {
        return whole <= 0 ? 0 : 100.0 * part / whole;
    }
}
