package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Section;

/**
 * Every piece the cutting plan makes, kit bars and spares alike (each cut of a pattern, times the pattern's count),
 * as tubes with the sizes the fit rule uses and their masses (0 when the kit has no material for the section).
 * Sections are taken in the cutting plan's order, patterns and cuts in theirs, so the ids are stable.
 */
public final class TubeList {
    private TubeList() {
    }

    public static List<Tube> of(Kit kit, CutPlan cutPlan, FitRule rule) {
        List<Tube> tubes = new ArrayList<>();
        for (SectionCutPlan plan : cutPlan.sections()) {
            Section section = kit.catalog().section(plan.section()).orElseThrow(
                    () -> new IllegalArgumentException("cutting plan names unknown section " + plan.section()));
            TubeEnvelope envelope = rule.envelope(section);
            double massPerMetre = kit.material(section).map(m -> section.massPerMetreKg(m.densityKgM3())).orElse(0.0);
            for (CutPattern pattern : plan.patterns()) {
                for (int copy = 0; copy < pattern.count(); copy++) {
                    for (Cut cut : pattern.cuts()) {
                        tubes.add(new Tube(tubes.size(), cut.mark(), section.name(), envelope.outerDiameterMm(),
                                envelope.boreMm(), cut.lengthMm(), massPerMetre * cut.lengthMm() / 1000.0));
                    }
                }
            }
        }
        return tubes;
    }
}
