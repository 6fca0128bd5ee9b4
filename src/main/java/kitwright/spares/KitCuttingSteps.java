package kitwright.spares;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import kitwright.cutting.CutPlan;
import kitwright.cutting.CutProgress;
import kitwright.cutting.KitCutter;
import kitwright.cutting.OffcutFiller;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.SearchLimits;
import kitwright.model.Kit;

/**
 * {@link CuttingSteps} over the cutting stage: {@link KitCutter} plans the demand (without its own offcut filling)
 * and {@link OffcutFiller} fills offcuts with at most the spares asked for, marks taking turns most-used first as
 * {@link KitCutter#spareCandidates} orders them.
 */
public final class KitCuttingSteps implements CuttingSteps {
    private final SearchLimits limits;
    private final CutProgress progress;

    /**
     * @param limits   work and time limits per section, or null for the defaults with the kit's timeLimitSeconds
     * @param progress where the optimiser reports progress
     */
    public KitCuttingSteps(SearchLimits limits, CutProgress progress) {
        this.limits = limits;
        this.progress = progress;
    }

    @Override
    public CutPlan plan(Kit kit) {
        return KitCutter.cut(kit, new KitCutter.Options(false, limits), progress);
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
