package kitwright.compare;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.report.Look;
import kitwright.testing.PageLook;
import kitwright.testing.Wcag;
import org.junit.jupiter.api.Test;

/**
 * compare.html in the report's look (kitwright/style/look.css): the shared stylesheet inlined, text contrast at least
 * 4.5:1 on every background (WCAG 2.1 AA, SC 1.4.3; WCAG 2.1, definitions of relative luminance and contrast
 * ratio), the best value marked by the word "best" (no pill), status words in the shared marks, nothing from the
 * network, and chart fills that read in greyscale: each fill at least 3:1 against the paper (WCAG 2.1, SC 1.4.11
 * non-text contrast), the parts of one chart at least 2:1 apart in luminance (kitwright's rule, so that neighbours
 * separate in a greyscale print), and every fill named in the chart's legend.
 */
class CompareLookTest {
    private static final double CHART_PARTS_APART = 2.0;

    @Test
    void comparePagesUseTheSharedLookWithAaContrastAndNoNetwork() throws Exception {
        String html = CompareHtml.render(CompareFixtures.three());
        assertThat(html).contains(Look.css());
        assertThat(PageLook.lowContrastPairs(PageLook.styles(html), Set.of(), Set.of())).isEmpty();
        PageLook.assertNoNetwork("compare.html", html);
        assertThat(html).doesNotContain("badge").contains("<span class=\"best-mark\">best</span>");
        Matcher status = Pattern.compile("<span class=\"status status-([a-z]+)\">([A-Z]+)</span>").matcher(html);
        int marks = 0;
        while (status.find()) {
            marks++;
            assertThat(status.group(2)).isEqualToIgnoringCase(status.group(1));
        }
        assertThat(marks).isEqualTo(CompareFixtures.three().size());
    }

    @Test
    void chartFillsStandOutFromThePaperAndFromEachOtherAndAreNamed() {
        String paper = PageLook.properties().get("--paper");
        for (CompareCharts.Spec spec : CompareCharts.specs()) {
            CompareCharts.Chart chart = CompareCharts.draw(spec, CompareFixtures.three());
            List<String> fills = new ArrayList<>();
            spec.series().forEach(s -> s.segments().forEach(seg -> fills.add(seg.color())));
            for (String fill : fills) {
                assertThat(Wcag.contrast(fill, paper)).as(spec.key() + " " + fill + " on the paper")
                        .isGreaterThanOrEqualTo(3.0);
            }
            for (int i = 0; i < fills.size(); i++) {
                for (int j = i + 1; j < fills.size(); j++) {
                    assertThat(Wcag.contrast(fills.get(i), fills.get(j)))
                            .as(spec.key() + ": " + fills.get(i) + " beside " + fills.get(j))
                            .isGreaterThanOrEqualTo(CHART_PARTS_APART);
                }
            }
            assertThat(chart.legend()).extracting(CompareCharts.LegendItem::color).containsExactlyElementsOf(fills);
            assertThat(chart.legend()).allSatisfy(l -> assertThat(l.name()).isNotBlank());
        }
    }
}
