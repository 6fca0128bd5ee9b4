package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.model.StockLength;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HtmlReportTest {
    private static final LocalDate DATE = LocalDate.of(2025, 3, 14);

    private static String sampleHtml() {
        Kit kit = ReportFixtures.sampleKit();
        return HtmlReport.render(ReportModel.of(kit, ReportFixtures.samplePlan(kit), DATE));
    }

    private static List<String> all(String html, String regex) {
        Matcher m = Pattern.compile(regex).matcher(html);
        List<String> found = new java.util.ArrayList<>();
        while (m.find()) {
            found.add(m.group(1));
        }
        return found;
    }

    @Test
    void aHostileMarkAppearsAsTextEverywhere() {
        String html = sampleHtml();
        assertThat(html).doesNotContain(ReportFixtures.HOSTILE).doesNotContain("<b>");
        assertThat(html).contains("<td class=\"mark\">&lt;b&gt;&amp;&quot;</td>");
        assertThat(html).contains("data-mark=\"&lt;b&gt;&amp;&quot;\"");
    }

    @Test
    void aHostileKitNameCannotLeaveTheTitleOrTheStylesheet() {
        Kit sample = ReportFixtures.sampleKit();
        String name = "</style><script>alert(1)</script>\"{{x}}";
        Kit kit = sample.withSettings(new kitwright.model.KitSettings(name, "</p>", 2, 5, 500, 10, false, 0,
                null, 2, 10, null, null, null));
        String html = HtmlReport.render(ReportModel.of(kit, ReportFixtures.samplePlan(kit), DATE));
        assertThat(html).doesNotContain("<script").doesNotContain("</p></p>");
        assertThat(html.indexOf("</style>")).isEqualTo(html.lastIndexOf("</style>"));
        assertThat(html).contains("<h1>&lt;/style&gt;&lt;script&gt;alert(1)&lt;/script&gt;&quot;{{x}}</h1>");
    }

    @Test
    void theCssStringEscapesEverythingButPlainText() {
        assertThat(HtmlReport.cssString("Kit A-1, 2025")).isEqualTo("\"Kit A-1, 2025\"");
        assertThat(HtmlReport.cssString("a\"</style>\\"))
                .isEqualTo("\"a\\000022 \\00003c \\00002f style\\00003e \\00005c \"");
    }

    @Test
    void thePageIsSelfContained() {
        String html = sampleHtml();
        assertThat(html).doesNotContainIgnoringCase("<script").doesNotContainIgnoringCase("<link")
                .doesNotContainIgnoringCase("<img").doesNotContainIgnoringCase("@import")
                .doesNotContainIgnoringCase("@font-face").doesNotContain(" src=");
        assertThat(all(html, "(https?://[^\"' )]*)")).containsOnly("http://www.w3.org/2000/svg");
        assertThat(html).startsWith("<!DOCTYPE html>").contains("<meta charset=\"utf-8\">");
    }

    @Test
    void sectionsComeInReadingOrderWithEveryPatternDrawnAndEveryMarkInALegend() {
        Kit kit = ReportFixtures.sampleKit();
        CutPlan plan = ReportFixtures.samplePlan(kit);
        String html = HtmlReport.render(ReportModel.of(kit, plan, DATE));
        assertThat(all(html, "<section id=\"([a-z-]+)\"")).containsExactly(
                "summary", "purchase-order", "saw-sheets", "cautions", "inputs");
        int distinct = plan.sections().stream().mapToInt(s -> SawSheetSection.distinct(s.patterns()).size()).sum();
        List<String> figures = all(html, "<figure class=\"pattern\" id=\"[^\"]+\" data-pattern=\"([^\"]+)\"");
        List<String> drawings = all(html, "<svg [^>]*data-pattern=\"([^\"]+)\"");
        assertThat(figures).hasSize(distinct).doesNotHaveDuplicates();
        assertThat(drawings).containsExactlyElementsOf(figures);
        List<String> legend = all(html, "<tr class=\"legend-mark\" data-mark=\"([^\"]*)\"");
        assertThat(legend).containsExactlyInAnyOrderElementsOf(
                kit.bars().stream().map(b -> Svg.escape(b.mark())).toList());
    }

    @Test
    void theSummaryAddsTheCatalogPricesOfEveryStockPiece() {
        Kit kit = ReportFixtures.sampleKit();
        CutPlan plan = ReportFixtures.samplePlan(kit);
        double cost = 0;
        int mill = 0;
        for (SectionCutPlan section : plan.sections()) {
            for (CutPattern p : section.patterns()) {
                StockLength row = kit.catalog().stockFor(section.section()).stream()
                        .filter(s -> s.lengthMm() == p.stockLengthMm() && s.origin() == p.origin())
                        .findFirst().orElseThrow();
                cost += row.price() * p.count();
                mill += p.origin() == Origin.MILL ? p.count() : 0;
            }
        }
        String html = HtmlReport.render(ReportModel.of(kit, plan, DATE));
        assertThat(html).contains("<div class=\"figure-value\">" + ShopFormat.money(cost) + "</div>");
        assertThat(html).contains("<div class=\"figure-value\">" + ShopFormat.count(mill) + " pieces</div>");
        // the gap of the first section that has one, as the fixture's own bound gives it, to 0.01 %
        double gap = plan.sections().stream().filter(s -> s.gap() > 0).findFirst().orElseThrow().gap();
        assertThat(html).contains("feasible, gap " + String.format(java.util.Locale.ROOT, "%.2f", 100 * gap)
                + "\u00A0%");
    }

    @Test
    @org.junit.jupiter.api.DisplayName("the summary's kit mass is bars and joints, as check, plan.json and compare"
            + " give it; the note splits it")
    void theSummaryKitMassCountsTheJoints() {
        Kit bare = ReportFixtures.sampleKit();
        Kit kit = new Kit(bare.dir(), bare.settings(), bare.bars(), bare.structures(),
                List.of(new kitwright.model.Joint("N90", 90, 1.6, 120), new kitwright.model.Joint("N110", 110, 2.6, 90)),
                bare.catalog(), bare.materials(), bare.crates(), bare.vehicles());
        var plan = ReportFixtures.samplePlan(kit);
        kitwright.plan.KitSummary summary = kitwright.plan.KitSummary.of(kit,
                kitwright.metrics.KitMass.sparesCut(plan));
        assertThat(summary.jointsMassKg()).isCloseTo(120 * 1.6 + 90 * 2.6, org.assertj.core.data.Offset.offset(1e-9));
        String html = HtmlReport.render(ReportModel.of(kit, plan, DATE));
        assertThat(html).containsPattern("figure-label\">Kit mass</div>\\s*<div class=\"figure-value\">"
                + Pattern.quote(ShopFormat.kg(summary.kitMassKg()) + "\u00A0kg") + "</div>");
        assertThat(html).contains(ShopFormat.kg(summary.barsMassKg()) + "\u00A0kg; 210 joints, "
                + ShopFormat.kg(summary.jointsMassKg()) + "\u00A0kg");
    }

    @Test
    void anInfeasibleSectionShowsItsReasonAndNoDrawing() {
        // the sample kit's CHS 60.3 and CHS 33.7 bars; CHS 33.7 only from one 6000 mm rack piece: D1 alone
        // (40 x 900 mm) needs six times that, so the section has no plan
        Kit sample = ReportFixtures.sampleKit();
        String hosts = ReportFixtures.CHS_60.name();
        String thin = ReportFixtures.CHS_33.name();
        List<StockLength> stock = new java.util.ArrayList<>(sample.catalog().stockFor(hosts));
        stock.add(new StockLength(thin, 6000, 0.0, 1, Origin.RACK));
        java.util.Map<String, kitwright.model.Section> sections = new java.util.LinkedHashMap<>();
        sections.put(hosts, ReportFixtures.CHS_60);
        sections.put(thin, ReportFixtures.CHS_33);
        Kit kit = new Kit(sample.dir(), sample.settings(), sample.bars().stream()
                .filter(b -> b.section().equals(hosts) || b.section().equals(thin)).toList(), List.of(), List.of(),
                new kitwright.model.TubeCatalog(sample.catalog().file(), sections, stock), sample.materials(),
                List.of(), List.of());
        SectionCutPlan none = new SectionCutPlan(thin, 2, 5, 500, "length",
                Status.INFEASIBLE, "D1 needs 36 000 mm more than the rack holds", null, null, null, 0, List.of(),
                List.of());
        CutPlan plan = new CutPlan(List.of(ReportFixtures.firstFitDecreasing(kit, hosts), none));
        kitwright.validate.CutPlanValidator.validate(kit, plan);
        String html = HtmlReport.render(ReportModel.of(kit, plan, DATE));
        assertThat(html).contains("No plan for this section: D1 needs 36 000 mm more than the rack holds");
        assertThat(html).contains("<span class=\"status status-infeasible\">no plan</span>");
        assertThat(all(html, "<figure class=\"pattern\" id=\"(s2-[^\"]+)\"")).isEmpty();
        assertThat(all(html, "<figure class=\"pattern\" id=\"(s1-[^\"]+)\"")).isNotEmpty();
    }

    @Test
    void absentStagesAreLeftOutAndLaterSectionsSlotInBeforeTheCautions() {
        Kit kit = ReportFixtures.sampleKit();
        record Extra(String text) {
        }
        String html = HtmlReport.render(ReportModel.builder(kit, DATE)
                .section(new ReportSection("bundles", "Bundles", "test-extra", new Extra("<nest>")))
                .caution("Bundle mass", "Bundles above 25 kg need two people.")
                .build());
        assertThat(all(html, "<section id=\"([a-z-]+)\"")).containsExactly("summary", "bundles", "cautions", "inputs");
        assertThat(html).contains("<p class=\"test-extra\">&lt;nest&gt;</p>").contains("<dt>Bundle mass</dt>");
        assertThat(html).doesNotContain("data-pattern").contains("No cutting plan was made in this run.");
    }

    @Test
    void theSameInputsAndDateGiveTheSameBytes(@TempDir Path dir) throws Exception {
        Kit kit = ReportFixtures.sampleKit();
        Path first = ReportWriter.write(ReportModel.of(kit, ReportFixtures.samplePlan(kit), DATE),
                dir.resolve("a/report.html"));
        Kit again = ReportFixtures.sampleKit();
        Path second = ReportWriter.writeInto(ReportModel.of(again, ReportFixtures.samplePlan(again), DATE),
                dir.resolve("b"));
        assertThat(Files.readAllBytes(second)).isEqualTo(Files.readAllBytes(first));
        ReportWriter.write(ReportModel.of(kit, ReportFixtures.samplePlan(kit), DATE), first);
        assertThat(Files.readAllBytes(first)).isEqualTo(Files.readAllBytes(second));
        try (var files = Files.list(dir.resolve("a"))) {
            assertThat(files.map(p -> p.getFileName().toString())).containsExactly("report.html");
        }
        String other = HtmlReport.render(ReportModel.of(kit, ReportFixtures.samplePlan(kit), DATE.plusDays(1)));
        assertThat(other).contains("2025-03-15").doesNotContain("2025-03-14");
    }
}
