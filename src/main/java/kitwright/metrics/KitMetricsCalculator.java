package kitwright.metrics;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Joint;
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
 *   <li>Reuse ratio = members in all structures / bars in the kit (src/docs/sources.md, Reuse and spares).</li>
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
        int members = members(kit);
        int stockPieces = 0;
        int boughtPieces = 0;
        double stockLength = 0;
        double boughtLength = 0;
        double offcut = 0;
        double scrap = 0;
        double remnant = 0;
        boolean massKnown = !kit.materials().isEmpty();
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
                if (p.origin() == Origin.MILL) {
                    boughtPieces += p.count();
                    boughtLength += p.count() * p.stockLengthMm();
                    Optional<Material> material = sectionInfo.flatMap(kit::material);
                    if (material.isEmpty()) {
                        massKnown = false;
                        continue;
                    }
                    double mass = p.count() * p.stockLengthMm() / 1000.0
                            * sectionInfo.get().massPerMetreKg(material.get().densityKgM3());
                    boughtMassByMaterial.computeIfAbsent(material.get().name(), k -> new double[1])[0] += mass;
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
        return new KitMetrics(kit.bars().size(), bars, members, bars == 0 ? 0 : (double) members / bars,
                stockPieces, boughtPieces, stockLength, boughtLength, stockCost(kit, plan),
                percent(offcut, stockLength), percent(scrap, stockLength), percent(remnant, stockLength),
                kitMass(kit).orElse(null), boughtMass, co2e, massKnown ? carbon : List.of());
    }

    /** Members in all structures: the sum of structures.csv counts, or the bars the kit needs without it. */
    public static int members(Kit kit) {
        if (kit.structures().isEmpty()) {
            return kit.bars().stream().mapToInt(Bar::requiredQuantity).sum();
        }
        return kit.structures().stream().mapToInt(StructureCount::count).sum();
    }

    /** Mass of the kit's bars (quantity x cut length x mass per metre) plus its joints, when materials are known. */
    public static Optional<Double> kitMass(Kit kit) {
        double mass = 0;
        for (Bar bar : kit.bars()) {
            Optional<Double> one = kit.barMassKg(bar);
            if (one.isEmpty()) {
                return Optional.empty();
            }
            mass += bar.quantity() * one.get();
        }
        for (Joint joint : kit.joints()) {
            mass += joint.quantity() * joint.massKg();
        }
        return Optional.of(mass);
    }

    /**
     * Price of the stock a plan cuts, mill and rack rows at their catalog price; null when a mill row has no price,
     * while a rack offcut without a price costs nothing (as the cutting stage and the report count it).
     */
    public static Double stockCost(Kit kit, CutPlan plan) {
        double cost = 0;
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern p : section.patterns()) {
                Double price = stockRow(kit, section.section(), p).map(StockLength::price).orElse(null);
                if (price == null && p.origin() == Origin.MILL) {
                    return null;
                }
                if (price == null) {
                    continue;
                }
                cost += p.count() * price;
            }
        }
        return cost;
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
