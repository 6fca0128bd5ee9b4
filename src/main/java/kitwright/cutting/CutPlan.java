package kitwright.cutting;

import java.util.List;

/** Cutting plans of all sections of a kit, in catalog order. */
public record CutPlan(List<SectionCutPlan> sections) {
    public CutPlan {
        sections = List.copyOf(sections);
    }
}
