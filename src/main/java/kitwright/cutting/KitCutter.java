package kitwright.cutting;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.StockLength;

/**
 * The cutting stage: a kit in, its cutting plan out, one problem per section the bars use, in catalog order.
 * Each section is planned by {@link CuttingStockOptimizer} with the kit's saw settings; with
 * {@code sparesFromOffcuts}, {@link OffcutFiller} then fills the offcuts with spare bars of the section's marks,
 * most-used marks (largest quantity) first. Pure: no files, no console; progress goes to the callback.
 */
public final class KitCutter {
    private KitCutter() {
    }

    /**
     * @param sparesFromOffcuts fill offcuts with spare bars, buying nothing more
     * @param limits            work and time limits per section, or null for the defaults with the kit's
     *                          {@code timeLimitSeconds}
     */
    public record Options(boolean sparesFromOffcuts, SearchLimits limits) {
        public static final Options DEFAULT = new Options(false, null);
    }

    public static CutPlan cut(Kit kit, Options options, CutProgress progress) {
        SearchLimits limits = options.limits() != null ? options.limits()
                : SearchLimits.defaults(kit.settings().timeLimitSeconds());
        SectionSolver solver = new CuttingStockOptimizer();
        List<SectionCutPlan> sections = new ArrayList<>();
        for (String section : kit.usedSections()) {
            SectionProblem problem = problem(kit, section, limits);
            SectionCutPlan plan = solver.solve(problem, progress);
            if (options.sparesFromOffcuts()) {
                plan = OffcutFiller.fill(plan, spareCandidates(kit, section));
            }
            sections.add(plan);
        }
        return new CutPlan(sections);
    }

    /**
     * The problem of one section: its marks (kit quantity plus the miscut allowance, {@link Kit#allowance}) and its
     * stock rows, with the kit's saw settings.
     */
    public static SectionProblem problem(Kit kit, String section, SearchLimits limits) {
        List<Demand> demands = new ArrayList<>();
        for (Bar bar : kit.bars()) {
            if (bar.section().equals(section)) {
                demands.add(new Demand(bar.mark(), bar.lengthMm(), bar.quantity() + kit.allowance(bar)));
            }
        }
        List<StockOption> stock = new ArrayList<>();
        for (StockLength row : kit.catalog().stockFor(section)) {
            stock.add(StockOption.of(row));
        }
        return new SectionProblem(section, demands, stock, kit.settings().kerfMm(), kit.settings().trimMm(),
                kit.settings().minRemnantMm(), limits);
    }

    /** Marks of a section by decreasing quantity (ties in bars order), with no limit on the count. */
    public static List<OffcutFiller.Candidate> spareCandidates(Kit kit, String section) {
        List<Bar> bars = new ArrayList<>(kit.bars().stream().filter(b -> b.section().equals(section)).toList());
        bars.sort(Comparator.comparingInt(Bar::quantity).reversed());
        return bars.stream().map(b -> new OffcutFiller.Candidate(b.mark(), b.lengthMm(), Integer.MAX_VALUE)).toList();
    }
}
