package kitwright.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.Bar;
import kitwright.model.Kit;

/**
 * One tint per tube section a kit uses, given to every mark of that section, for the drawings of bundles and crates:
 * a tube size keeps its tint in every drawing, so a reader can follow the 88.9 hosts from the bundle figures to the
 * lanes of the crates. The tints are muted and light enough for black text; every drawing also labels in text, so
 * the tint only helps the eye (the saw sheets colour by mark instead, see {@link MarkPalette}).
 */
final class SectionTints {
    private static final List<String> TINTS = List.of("#c5d3e4", "#e8d5b0", "#c6ddc0", "#e5c6d4", "#d6cfea",
            "#f1e1a6", "#bddfdb", "#dcc8ba");

    private SectionTints() {
    }

    /** Fill by mark: the tint of the mark's section, the sections taken in catalog order. */
    static Map<String, String> byMark(Kit kit) {
        Map<String, String> tint = new LinkedHashMap<>();
        for (String section : kit.usedSections()) {
            int n = tint.size();
            tint.put(section, n < TINTS.size() ? TINTS.get(n) : MarkPalette.colour(n));
        }
        Map<String, String> fills = new LinkedHashMap<>();
        for (Bar b : kit.bars()) {
            fills.put(b.mark(), tint.getOrDefault(b.section(), "#d9d9d9"));
        }
        return fills;
    }
}
