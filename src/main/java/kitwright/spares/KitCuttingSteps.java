package kitwright.spares;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.cutting.CuttingStockOptimizer;
import kitwright.cutting.KitCutter;
import kitwright.cutting.OffcutFiller;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.SectionProblem;
import kitwright.cutting.SearchLimits;
import kitwright.model.Kit;

/**
 * {@link CuttingSteps} over the cutting stage: {@link KitCutter} plans the demand (without its own offcut filling)
 * and {@link OffcutFiller} fills offcuts with at most the spares asked for, marks taking turns most-used first as
 * {@link KitCutter#spareCandidates} orders them.
 *
 * <p>A re-plan for spares changes the demand of some sections only, so each instance remembers the plan of every
 * section problem it has solved (same marks, quantities, stock, saw settings and limits) and solves only the
 * sections whose problem changed. The optimiser is deterministic, so a remembered plan is the plan it would find
 * again; only the time differs. Use one instance per kit run (not thread-safe).
 */
public final class KitCuttingSteps implements CuttingSteps {
    private final SearchLimits limits;
    private final CutProgress progress;
    private final Map<SectionProblem, SectionCutPlan> solved = new HashMap<>();

    /**
     * @param limits   work and time limits per section, or null for the defaults with the kit's timeLimitSeconds
     * @param progress where the optimiser reports progress
     */
    public KitCuttingSteps(SearchLimits limits, CutProgress progress) {
        this.limits = limits;
        this.progress = progress;
    }

    /** As {@link KitCutter#cut} without offcut filling, section by section in catalog order. */
    @Override
    public CutPlan plan(Kit kit) {
        SearchLimits sectionLimits = limits != null ? limits : SearchLimits.defaults(kit.settings().timeLimitSeconds());
        CuttingStockOptimizer optimizer = new CuttingStockOptimizer();
        List<SectionCutPlan> sections = new ArrayList<>();
        for (String section : kit.usedSections()) {
            SectionProblem problem = KitCutter.problem(kit, section, sectionLimits);
            sections.add(solved.computeIfAbsent(problem, p -> optimizer.solve(p, progress)));
        }
        return new CutPlan(sections);
    }

    @Override
    public CutPlan fillOffcuts(Kit kit, CutPlan plan, Map<String, Integer> maxExtra) {
        List<SectionCutPlan> sections = new ArrayList<>();
        for (SectionCutPlan section : plan.sections()) {
            List<OffcutFiller.Candidate> candidates = KitCutter.spareCandidates(kit, section.section()).stream()
                    .map(c -> new OffcutFiller.Candidate(c.mark(), c.lengthMm(), maxExtra.getOrDefault(c.mark(), 0)))
                    .filter(c -> c.maxCount() > 0)
                    .toList();
            sections.add(OffcutFiller.fill(section, candidates));
        }
        return new CutPlan(sections);
    }
}
