package kitwright.spares;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SawArithmetic;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.Status;
import kitwright.model.StockLength;

/**
 * A small test stand-in for the cutting stage: first-fit decreasing over mill stock (the README's saw model, cheapest
 * price per millimetre first, honouring {@code available}) and a greedy offcut filler (longest bar that fits, on
 * each stock piece in turn). Saw model (src/docs/sources.md): a piece holds
 * sum(length + kerf) <= stock - 2 trim + kerf, summed in exact decimals ({@link SawArithmetic}).
 */
final class SimpleCutting implements CuttingSteps {

    @Override
    public CutPlan plan(Kit kit) {
        List<SectionCutPlan> sections = new ArrayList<>();
        for (String section : kit.usedSections()) {
            List<Cut> pieces = new ArrayList<>();
            for (Bar bar : kit.bars()) {
                if (bar.section().equals(section)) {
                    for (int i = 0; i < bar.quantity(); i++) {
                        pieces.add(new Cut(bar.mark(), bar.lengthMm()));
                    }
                }
            }
            pieces.sort(Comparator.comparingDouble(Cut::lengthMm).reversed());
            List<StockLength> stock = kit.catalog().stockFor(section).stream()
                    .sorted(Comparator.comparingDouble(s -> s.price() / s.lengthMm())).toList();
            Map<StockLength, Integer> opened = new LinkedHashMap<>();
            List<StockLength> pieceStock = new ArrayList<>();
            List<List<Cut>> pieceCuts = new ArrayList<>();
            boolean feasible = true;
            for (Cut cut : pieces) {
                int at = -1;
                for (int i = 0; i < pieceCuts.size() && at < 0; i++) {
                    if (fits(kit, pieceStock.get(i), pieceCuts.get(i), cut)) {
                        at = i;
                    }
                }
                if (at < 0) {
                    StockLength choice = stock.stream()
                            .filter(s -> s.unlimited() || opened.getOrDefault(s, 0) < s.available())
                            .filter(s -> fits(kit, s, List.of(), cut)).findFirst().orElse(null);
                    if (choice == null) {
                        feasible = false;
                        break;
                    }
                    opened.merge(choice, 1, Integer::sum);
                    pieceStock.add(choice);
                    pieceCuts.add(new ArrayList<>());
                    at = pieceCuts.size() - 1;
                }
                pieceCuts.get(at).add(cut);
            }
            sections.add(feasible ? section(kit, section, pieceStock, pieceCuts)
                    : new SectionCutPlan(section, kit.settings().kerfMm(), kit.settings().trimMm(),
                            kit.settings().minRemnantMm(), "cost", Status.INFEASIBLE, "stock too short", null, null,
                            null, 0, List.of(), List.of()));
        }
        return new CutPlan(sections);
    }

    @Override
    public CutPlan fillOffcuts(Kit kit, CutPlan plan, Map<String, Integer> maxExtra) {
        Map<String, Integer> left = new LinkedHashMap<>(maxExtra);
        List<Bar> byLength = kit.bars().stream().sorted(Comparator.comparingDouble(Bar::lengthMm).reversed()).toList();
        List<SectionCutPlan> sections = new ArrayList<>();
        for (SectionCutPlan s : plan.sections()) {
            if (s.status() == Status.INFEASIBLE) {
                sections.add(s);
                continue;
            }
            List<StockLength> pieceStock = new ArrayList<>();
            List<List<Cut>> pieceCuts = new ArrayList<>();
            for (CutPattern p : s.patterns()) {
                StockLength row = kit.catalog().stockFor(s.section()).stream()
                        .filter(r -> r.lengthMm() == p.stockLengthMm() && r.origin() == p.origin()).findFirst()
                        .orElseThrow();
                for (int i = 0; i < p.count(); i++) {
                    List<Cut> cuts = new ArrayList<>(p.cuts());
                    for (Bar bar : byLength) {
                        Cut extra = new Cut(bar.mark(), bar.lengthMm());
                        while (bar.section().equals(s.section()) && left.getOrDefault(bar.mark(), 0) > 0
                                && fits(kit, row, cuts, extra)) {
                            cuts.add(extra);
                            left.merge(bar.mark(), -1, Integer::sum);
                        }
                    }
                    pieceStock.add(row);
                    pieceCuts.add(cuts);
                }
            }
            sections.add(section(kit, s.section(), pieceStock, pieceCuts));
        }
        return new CutPlan(sections);
    }

    private static boolean fits(Kit kit, StockLength stock, List<Cut> cuts, Cut extra) {
        List<Cut> all = new ArrayList<>(cuts);
        all.add(extra);
        return SawArithmetic.fits(kit.settings().kerfMm(), kit.settings().trimMm(), stock.lengthMm(), all);
    }

    private static SectionCutPlan section(Kit kit, String section, List<StockLength> stock, List<List<Cut>> cuts) {
        Map<String, CutPattern> patterns = new LinkedHashMap<>();
        double value = 0;
        for (int i = 0; i < stock.size(); i++) {
            StockLength s = stock.get(i);
            List<Cut> c = cuts.get(i);
            double offcut = SawArithmetic.offcut(kit.settings().kerfMm(), kit.settings().trimMm(), s.lengthMm(), c);
            String key = s.lengthMm() + "|" + s.origin() + "|" + c;
            CutPattern old = patterns.get(key);
            patterns.put(key, new CutPattern(s.lengthMm(), s.origin(), old == null ? 1 : old.count() + 1, c, offcut,
                    offcut >= kit.settings().minRemnantMm() ? "remnant" : "scrap"));
            value += s.price();
        }
        return new SectionCutPlan(section, kit.settings().kerfMm(), kit.settings().trimMm(),
                kit.settings().minRemnantMm(), "cost", Status.FEASIBLE, null, value, 0.0, 1.0, stock.size(),
                List.copyOf(patterns.values()), List.of());
    }
}
