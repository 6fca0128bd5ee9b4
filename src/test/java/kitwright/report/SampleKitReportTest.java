package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import kitwright.cutting.CutPlan;
import kitwright.io.KitReader;
import kitwright.model.Bar;
import kitwright.model.Kit;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every sample kit read by the kit reader, planned by the tests' first-fit decreasing (not the optimizer) and
 * rendered: every distinct pattern has its drawing, every mark is in a legend, and the page is the same twice.
 */
class SampleKitReportTest {
    static Stream<Path> sampleKits() throws Exception {
        try (Stream<Path> kits = Files.list(Path.of("sample-kits"))) {
            return kits.filter(p -> Files.exists(p.resolve("bars.csv"))).sorted().toList().stream();
        }
    }

    private static long count(String html, String regex) {
        Matcher m = Pattern.compile(regex).matcher(html);
        long n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @ParameterizedTest
    @MethodSource("sampleKits")
    void rendersEverySampleKit(Path dir) throws Exception {
        Kit kit = KitReader.read(dir);
        CutPlan plan = new CutPlan(kit.usedSections().stream()
                .map(section -> ReportFixtures.firstFitDecreasing(kit, section)).toList());
        kitwright.validate.CutPlanValidator.validate(kit, plan);
        ReportModel model = ReportModel.of(kit, plan, LocalDate.of(2025, 3, 14));
        String html = HtmlReport.render(model);
        int distinct = plan.sections().stream().mapToInt(s -> SawSheetSection.distinct(s.patterns()).size()).sum();
        assertThat(count(html, "<figure class=\"pattern\"")).isEqualTo(distinct);
        assertThat(count(html, "<svg [^>]*class=\"saw-drawing\"")).isEqualTo(distinct);
        List<String> marks = kit.bars().stream().map(Bar::mark).toList();
        for (String mark : marks) {
            assertThat(html).contains("<tr class=\"legend-mark\" data-mark=\"" + Svg.escape(mark) + "\">");
        }
        assertThat(count(html, "<tr class=\"legend-mark\"")).isEqualTo(marks.size());
        assertThat(html).contains("<h1>" + Svg.escape(kit.name()) + "</h1>");
        assertThat(HtmlReport.render(model)).isEqualTo(html);
    }
}
