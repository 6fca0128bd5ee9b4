package kitwright.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.Spare;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.Status;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;
import kitwright.validate.CutPlanValidator;

/**
 * Hand-made kits and cutting plans for the report tests. All data is invented for the tests. Plans are made by a
 * plain first-fit decreasing here (not the project's optimizer) and checked against the saw model before use, so
 * the report is always drawn from plans that could be sawn.
 */
final class ReportFixtures {
    static final String HOSTILE = "<b>&\"";
    static final double KERF = 2;
    static final double TRIM = 5;
    static final double MIN_REMNANT = 500;

    private ReportFixtures() {
    }

    static final Section CHS_60 = new Section("CHS 60.3x3.2", "steel", 60.3, 3.2, null, null, null);
    static final Section CHS_48 = new Section("CHS 48.3x3.2", "steel", 48.3, 3.2, null, null, null);
    static final Section CHS_33 = new Section("CHS 33.7x2.6", "steel", 33.7, 2.6, null, null, null);
    static final Section CHS_26 = new Section("CHS 26.9x2.3", "steel", 26.9, 2.3, null, null, null);

    /** A touring-cinema-like kit of 16 marks in four steel sections (invented), with a hostile mark name. */
    static Kit sampleKit() {
        List<Bar> bars = List.of(
                bar("S1", CHS_60, 2400, 24, 1.0), bar("S2", CHS_60, 1800, 36, 1.0), bar("S3", CHS_60, 3150, 12, 1.0),
                bar("B1", CHS_48, 2900, 18, 0.5), bar("B2", CHS_48, 2250, 30, 0.5), bar("B3", CHS_48, 1650, 40, 0.5),
                bar("B4", CHS_48, 1200, 26, 0.5), bar("B5", CHS_48, 980, 14, 0.5),
                bar("D1", CHS_33, 900, 40, 1.0), bar("D2", CHS_33, 640, 60, 1.0), bar("D3", CHS_33, 410, 48, 1.0),
                bar("D4", CHS_33, 275, 30, null), bar(HOSTILE, CHS_33, 650, 8, 1.0),
                bar("E1", CHS_26, 350, 40, 1.0), bar("E2", CHS_26, 220, 28, 1.0), bar("E3", CHS_26, 140, 5, 1.0));
        Map<String, Section> sections = new LinkedHashMap<>();
        sections.put(CHS_60.name(), CHS_60);
        sections.put(CHS_48.name(), CHS_48);
        sections.put(CHS_33.name(), CHS_33);
        sections.put(CHS_26.name(), CHS_26);
        List<StockLength> stock = List.of(
                new StockLength(CHS_60.name(), 6000, 62.40, null, Origin.MILL),
                new StockLength(CHS_60.name(), 12000, 118.80, null, Origin.MILL),
                new StockLength(CHS_48.name(), 6000, 49.20, null, Origin.MILL),
                new StockLength(CHS_48.name(), 12000, 93.60, null, Origin.MILL),
                new StockLength(CHS_48.name(), 3400, 0.0, 3, Origin.RACK),
                new StockLength(CHS_33.name(), 6000, 27.60, null, Origin.MILL),
                new StockLength(CHS_26.name(), 6000, 21.00, null, Origin.MILL),
                new StockLength(CHS_26.name(), 12000, 40.80, null, Origin.MILL));
        KitSettings settings = new KitSettings("Touring cinema kit (test data)",
                "Invented test kit: screen frame, ticket canopy and lighting mast.", KERF, TRIM, MIN_REMNANT, 10,
                false, 0, null, 2.0, 10, null, null, null);
        TubeCatalog catalog = new TubeCatalog(Path.of("/kits/cinema/../catalogs/steel-chs.csv"), sections, stock);
        return new Kit(Path.of("/kits/cinema"), settings, bars, List.of(), List.of(), catalog,
                Map.of("steel", new Material("steel", 7850, 1.55, "EN 1993-1-1 3.2.6; factor invented")),
                List.of(), List.of());
    }

    private static Bar bar(String mark, Section section, double length, int quantity, Double tolerance) {
        return new Bar(mark, section.name(), length, quantity, quantity, null, tolerance, "");
    }

    /**
     * Plans for every section of the kit (first-fit decreasing), checked by the shared validator before use. The
     * second section also cuts two spares of B5. Each section's status and gap are the ones its continuous bound
     * proves (for the status wording, the first sections are FEASIBLE with a gap, whatever the optimum is).
     */
    static CutPlan samplePlan(Kit kit) {
        List<SectionCutPlan> plans = new ArrayList<>();
        for (String section : kit.usedSections()) {
            plans.add(section.equals(CHS_48.name())
                    ? firstFitDecreasing(kit, section, List.of(new Spare("B5", 2)))
                    : firstFitDecreasing(kit, section));
        }
        CutPlan plan = new CutPlan(plans);
        CutPlanValidator.validate(kit, plan);
        return plan;
    }

    /** The kit with only the pieces of each section's first first-fit-decreasing pattern (times its count). */
    static Kit firstPatternsOnly(Kit kit) {
        Map<String, Integer> keep = new LinkedHashMap<>();
        for (String section : kit.usedSections()) {
            CutPattern first = firstFitDecreasing(kit, section).patterns().get(0);
            first.cuts().forEach(c -> keep.merge(c.mark(), first.count(), Integer::sum));
        }
        List<Bar> bars = kit.bars().stream().filter(b -> keep.containsKey(b.mark()))
                .map(b -> new Bar(b.mark(), b.section(), b.lengthMm(), keep.get(b.mark()), keep.get(b.mark()),
                        b.nodeToNodeMm(), b.toleranceMm(), b.note()))
                .toList();
        return new Kit(kit.dir(), kit.settings(), bars, kit.structures(), kit.joints(), kit.catalog(),
                kit.materials(), kit.crates(), kit.vehicles());
    }

    /** First-fit decreasing of the section's bars alone (no spares). */
    static SectionCutPlan firstFitDecreasing(Kit kit, String section) {
        return firstFitDecreasing(kit, section, List.of());
    }

    /**
     * First-fit decreasing with the kit's saw settings: pieces longest first into the first open stock piece where
     * they fit; a new piece is taken from the rack rows (in catalog order, while any are left and the piece fits),
     * else the mill stock with the lowest price per millimetre (or the longest, without prices). Its lower bound is
     * the continuous one: every piece with its kerf bought at the lowest price per usable millimetre. OPTIMAL only
     * when the plan meets that bound.
     */
    static SectionCutPlan firstFitDecreasing(Kit kit, String section, List<Spare> spares) {
        double kerf = kit.settings().kerfMm();
        double trim = kit.settings().trimMm();
        List<Bar> bars = kit.bars().stream().filter(b -> b.section().equals(section))
                .sorted(Comparator.comparingDouble(Bar::lengthMm).reversed()).toList();
        List<StockLength> rows = kit.catalog().stockFor(section);
        boolean priced = rows.stream().allMatch(r -> r.price() != null);
        Map<StockLength, Integer> rackLeft = new LinkedHashMap<>();
        rows.stream().filter(r -> r.origin() == Origin.RACK)
                .forEach(r -> rackLeft.put(r, r.available() == null ? 0 : r.available()));
        StockLength mill = rows.stream().filter(r -> r.origin() == Origin.MILL)
                .min(Comparator.comparingDouble(r -> priced ? r.price() / r.lengthMm() : -r.lengthMm()))
                .orElseThrow();
        List<StockLength> used = new ArrayList<>();
        List<List<Cut>> bins = new ArrayList<>();
        double demand = 0;
        for (Bar bar : bars) {
            int pieces = bar.quantity() + spares.stream().filter(x -> x.mark().equals(bar.mark()))
                    .mapToInt(Spare::count).sum();
            for (int n = 0; n < pieces; n++) {
                demand += bar.lengthMm() + kerf;
                int target = -1;
                for (int i = 0; i < bins.size() && target < 0; i++) {
                    if (fits(used.get(i).lengthMm(), bins.get(i), bar.lengthMm(), kerf, trim)) {
                        target = i;
                    }
                }
                if (target < 0) {
                    StockLength open = rackLeft.entrySet().stream()
                            .filter(e -> e.getValue() > 0 && fits(e.getKey().lengthMm(), List.of(), bar.lengthMm(),
                                    kerf, trim))
                            .map(Map.Entry::getKey).findFirst().orElse(mill);
                    rackLeft.computeIfPresent(open, (r, left) -> left - 1);
                    used.add(open);
                    bins.add(new ArrayList<>());
                    target = bins.size() - 1;
                }
                bins.get(target).add(new Cut(bar.mark(), bar.lengthMm()));
            }
        }
        Map<List<Object>, CutPattern> patterns = new LinkedHashMap<>();
        double value = 0;
        for (int i = 0; i < bins.size(); i++) {
            StockLength s = used.get(i);
            value += priced ? s.price() : s.lengthMm();
            List<Cut> cuts = bins.get(i);
            patterns.merge(List.of(s.lengthMm(), s.origin(), cuts), pattern(kit, s, cuts, 1),
                    (a, b) -> pattern(kit, s, a.cuts(), a.count() + 1));
        }
        double bound = Math.min(value, continuousBound(rows, demand, priced, kerf, trim));
        double gap = value == 0 ? 0 : (value - bound) / value;
        return new SectionCutPlan(section, kerf, trim, kit.settings().minRemnantMm(), priced ? "cost" : "length",
                gap < 1e-9 ? Status.OPTIMAL : Status.FEASIBLE, null, value, bound, gap, bins.size(),
                List.copyOf(patterns.values()), spares);
    }

    /**
     * The continuous bound: the demand (pieces with their kerfs) bought by the usable millimetre, cheapest rows
     * first, limited rows up to their count. No plan can cost less.
     */
    static double continuousBound(List<StockLength> rows, double demandMm, boolean priced, double kerf, double trim) {
        List<StockLength> byUnitPrice = rows.stream().sorted(Comparator.comparingDouble(
                r -> (priced ? r.price() : r.lengthMm()) / (r.lengthMm() - 2 * trim + kerf))).toList();
        double left = demandMm;
        double bound = 0;
        for (StockLength r : byUnitPrice) {
            double usable = r.lengthMm() - 2 * trim + kerf;
            double take = r.available() == null ? left : Math.min(left, usable * r.available());
            bound += take / usable * (priced ? r.price() : r.lengthMm());
            left -= take;
            if (left <= 0) {
                break;
            }
        }
        return bound;
    }

    /** The saw model: sum(length + kerf) <= stock - 2 trim + kerf. */
    static boolean fits(double stockMm, List<Cut> cuts, double lengthMm, double kerf, double trim) {
        double used = cuts.stream().mapToDouble(c -> c.lengthMm() + kerf).sum();
        return used + lengthMm + kerf <= stockMm - 2 * trim + kerf + 1e-9;
    }

    static CutPattern pattern(Kit kit, StockLength stock, List<Cut> cuts, int count) {
        KitSettings s = kit.settings();
        double offcut = Math.max(0, stock.lengthMm() - 2 * s.trimMm()
                - cuts.stream().mapToDouble(Cut::lengthMm).sum() - cuts.size() * s.kerfMm());
        return new CutPattern(stock.lengthMm(), stock.origin(), count, cuts, offcut,
                offcut >= s.minRemnantMm() ? "remnant" : "scrap");
    }
}
