package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.metrics.KitMetrics;
import kitwright.metrics.KitMetricsCalculator;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Material;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.SparesPolicy;
import kitwright.model.StockLength;
import kitwright.model.StructureCount;
import kitwright.model.TubeCatalog;
import kitwright.spares.MarkSpares;
import kitwright.spares.ServiceLifeSpares;
import kitwright.spares.SparesOutcome;
import kitwright.spares.SparesPlan;
import kitwright.spares.SparesSupply;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The report section "Kit figures and service-life spares" on a hand-made kit (invented data) with a hostile mark
 * name and a hostile factor source, with and without a spares policy and without materials. The cutting plan is
 * the tests' first-fit decreasing, checked by the validator first.
 */
class KitFiguresSectionTest {
    private static final LocalDate DATE = LocalDate.of(2025, 6, 30);
    private static final String HOSTILE = ReportFixtures.HOSTILE;
    private static final String HOSTILE_ESCAPED = "&lt;b&gt;&amp;&quot;";
    private static final String SOURCE = "<i>EPD</i> & \"invented\"";
    private static final double DENSITY = 7850;
    private static final double FACTOR = 1.55;
    private static final SparesPolicy POLICY = new SparesPolicy(0.02, 10, 0.95);

    /** Mark A on CHS 48.3x3.2 (10 bars), the hostile mark on CHS 33.7x2.6 (12 bars, 10 needed). */
    private static Kit kit(Map<String, Material> materials) {
        Map<String, Section> sections = new LinkedHashMap<>();
        sections.put(ReportFixtures.CHS_48.name(), ReportFixtures.CHS_48);
        sections.put(ReportFixtures.CHS_33.name(), ReportFixtures.CHS_33);
        TubeCatalog catalog = new TubeCatalog(Path.of("tubes.csv"), sections, List.of(
                new StockLength(ReportFixtures.CHS_48.name(), 6000, 30.0, null, Origin.MILL),
                new StockLength(ReportFixtures.CHS_33.name(), 6000, 17.0, null, Origin.MILL)));
        List<Bar> bars = List.of(new Bar("A", ReportFixtures.CHS_48.name(), 1450, 10, 10, null, null, ""),
                new Bar(HOSTILE, ReportFixtures.CHS_33.name(), 950, 12, 10, null, null, ""));
        List<StructureCount> structures = List.of(new StructureCount("s1", "A", 10),
                new StructureCount("s1", HOSTILE, 10), new StructureCount("s2", "A", 8),
                new StructureCount("s2", HOSTILE, 4));
        return new Kit(null, KitSettings.defaults("figures"), bars, structures, List.of(), catalog, materials,
                List.of(), List.of());
    }

    private static Kit steelKit() {
        return kit(Map.of("steel", new Material("steel", DENSITY, FACTOR, SOURCE)));
    }

    private static CutPlan plan(Kit kit) {
        CutPlan plan = new CutPlan(kit.usedSections().stream()
                .map(s -> ReportFixtures.firstFitDecreasing(kit, s)).toList());
        CutPlanValidator.validate(kit, plan);
        return plan;
    }

    /** Spares sized by the planner's own sizing; the supply invented: the first mark from offcuts, the rest bought. */
    private static SparesOutcome outcome(Kit kit, int missing, Double extraCost) {
        SparesPlan sizing = ServiceLifeSpares.plan(kit.bars(), POLICY);
        List<SparesSupply> supply = new ArrayList<>();
        for (MarkSpares m : sizing.marks()) {
            boolean first = supply.isEmpty();
            supply.add(new SparesSupply(m.mark(), m.toMake(), first ? m.toMake() : 0,
                    first ? 0 : m.toMake() - missing, first ? 0 : missing, m.expectedLosses()));
        }
        return new SparesOutcome(sizing, supply, extraCost, 1);
    }

    private static String render(Kit kit, CutPlan plan, KitMetrics figures, SparesOutcome spares) {
        return HtmlReport.render(ReportModel.builder(kit, DATE).cutting(plan)
                .section(KitFiguresSection.of(kit, figures, spares)).build());
    }

    @Test
    @DisplayName("Embodied carbon = mill stock bought x the factor, the factor's source beside it, escaped")
    void carbonIsBoughtMassTimesFactorWithItsSource() {
        Kit kit = steelKit();
        CutPlan plan = plan(kit);
        double boughtMass = 0;
        for (SectionCutPlan s : plan.sections()) {
            Section section = kit.catalog().section(s.section()).orElseThrow();
            double d = section.outerDiameterMm();
            double t = section.wallMm();
            for (CutPattern p : s.patterns()) {
                // M = pi (D - T) T rho 1e-6 kg/m (EN 10219-2), over the stock length bought
                boughtMass += p.count() * p.stockLengthMm() / 1000 * Math.PI * (d - t) * t * DENSITY * 1e-6;
            }
        }
        String html = render(kit, plan, KitMetricsCalculator.of(kit, plan), null);

        assertThat(html).contains("<section id=\"" + KitFiguresSection.ID + "\"");
        assertThat(html).contains("<div class=\"figure-value\">" + ShopFormat.kg(boughtMass * FACTOR)
                + "\u00A0kg\u00A0CO\u2082e</div>");
        assertThat(html).contains("<tr data-material=\"steel\"><td class=\"nowrap\">steel</td><td class=\"num\">"
                + ShopFormat.kg(boughtMass) + "</td><td class=\"num\">1.55</td><td class=\"num\">"
                + ShopFormat.kg(boughtMass * FACTOR) + "</td>");
        assertThat(html).contains("&lt;i&gt;EPD&lt;/i&gt; &amp; &quot;invented&quot;").doesNotContain("<i>EPD");
        // Reuse ratio: 10 + 10 + 8 + 4 = 32 members on 10 + 12 = 22 bars, 1.4545... shown to two decimals
        assertThat(html).contains("32 members in all structures on 22 bars in the kit: reuse ratio 1.45,");
    }

    @Test
    @DisplayName("With a policy: a row per mark (hostile mark escaped), the policy, independence as common practice")
    void sparesTablePerMark() {
        Kit kit = steelKit();
        CutPlan plan = plan(kit);
        SparesOutcome spares = outcome(kit, 0, 123.4);
        String html = render(kit, plan, KitMetricsCalculator.of(kit, plan), spares);

        assertThat(html).doesNotContain(HOSTILE).doesNotContain("kit.json has no <code>spares</code> policy");
        assertThat(html).contains("<tr data-spares-mark=\"A\"><td class=\"mark\">A</td>",
                "<tr data-spares-mark=\"" + HOSTILE_ESCAPED + "\"><td class=\"mark\">" + HOSTILE_ESCAPED + "</td>");
        MarkSpares hostile = spares.sizing().mark(HOSTILE);
        // 10 bars in service over 10 cycles: 100 bar-cycles, 100 x 0.02 = 2 losses expected
        assertThat(hostile.barCycles()).isEqualTo(100);
        assertThat(html).contains("<td class=\"num\">10</td><td class=\"num\">100</td><td class=\"num\">2.00</td>");
        assertThat(html).contains("over 10 cycles", "is 95\u00A0%", "the 2 marks in service",
                KitFiguresSection.percent(Math.sqrt(0.95)), "independent (common practice)");
        assertThat(html).contains("Extra stock cost of the spares: <strong>123.40</strong>");
        assertThat(html).doesNotContain("spares could not be cut");
        assertThat(html.indexOf("id=\"" + KitFiguresSection.ID + "\"")).isLessThan(html.indexOf("id=\"cautions\""));
    }

    @Test
    @DisplayName("Missing spares are flagged; an unknown extra cost shows a dash")
    void missingSparesAndUnknownCost() {
        Kit kit = steelKit();
        CutPlan plan = plan(kit);
        SparesOutcome spares = outcome(kit, 1, null);
        String html = render(kit, plan, KitMetricsCalculator.of(kit, plan), spares);
        assertThat(spares.missing()).isEqualTo(1);
        assertThat(html).contains("<p class=\"reason\">1 spares could not be cut")
                .contains("Extra stock cost of the spares: <strong>" + ShopFormat.UNKNOWN + "</strong>");
    }

    @Test
    @DisplayName("Without a policy: one line with the kit.json key to set, escaped; without materials: not known")
    void withoutPolicyOrMaterials() {
        Kit kit = kit(Map.of());
        CutPlan plan = plan(kit);
        String html = render(kit, plan, KitMetricsCalculator.of(kit, plan), null);
        assertThat(html).contains("kit.json has no <code>spares</code> policy")
                .contains("<code>&quot;spares&quot;: {&quot;lossRatePerCycle&quot;: 0.01, &quot;cycles&quot;: 10,"
                        + " &quot;serviceLevel&quot;: 0.95}</code>")
                .doesNotContain("kit-figures-spares").doesNotContain("kit-figures-carbon")
                .contains("Not known: the kit has no materials file")
                .contains("<div class=\"figure-value\">" + ShopFormat.UNKNOWN + "</div>");
    }
}
