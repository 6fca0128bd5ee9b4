package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import kitwright.loading.LoadPlan;
import kitwright.loading.RowLoadPlanner;
import kitwright.model.CrateType;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import kitwright.model.VehicleType;
import kitwright.nesting.Bundle;
import kitwright.packing.CratePlan;
import kitwright.packing.Fixtures;
import kitwright.packing.LaneCratePacker;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.LoadPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LogisticsSectionTest {

    @Test
    @DisplayName("the crates-and-trucks block renders in report.html: tables, a drawing per layout and per trip, "
            + "escaped names, the same bytes twice")
    void rendersInTheReport() {
        List<Bundle> bundles = List.of(Fixtures.bundle("B1", ReportFixtures.HOSTILE, 1900, 60, 300),
                Fixtures.bundle("B2", "A", 1900, 60, 300), Fixtures.bundle("B3", "A", 1900, 60, 300));
        List<Joint> joints = List.of(new Joint("N", 100, 1, 10));
        List<CrateType> types = List.of(Fixtures.crate("box " + ReportFixtures.HOSTILE, 2000, 500, 500, 20, 700,
                50.0));
        CratePlan crates = new LaneCratePacker(new LaneCratePacker.Limits(0.2, 5, 2)).pack(bundles, joints, types,
                JointBox.DEFAULT);
        CratePlanValidator.check(crates, bundles, joints, types, JointBox.DEFAULT);
        List<VehicleType> vehicles = List.of(new VehicleType("truck", 6200, 2450, 2400, 2800, 400, "invented"));
        LoadPlan loads = new RowLoadPlanner().load(crates, types, vehicles);
        LoadPlanValidator.check(loads, crates, types, vehicles);

        ReportSection section = LogisticsSection.of(crates, loads, bundles, types);
        var builder = kitwright.report.ReportModel.builder(ReportFixtures.sampleKit(), LocalDate.of(2026, 1, 2))
                .section(section);
        LogisticsCautions.all().forEach(c -> builder.caution(c.heading(), c.text()));
        String html = HtmlReport.render(builder.build());
        assertThat(html).contains("id=\"crates-and-trucks\"").contains("Crates and trucks")
                .contains("EN 12195-1").doesNotContain("<b>&\"");
        assertThat(count(html, "<tr data-crate=")).isEqualTo(crates.crates().size());
        assertThat(count(html, "<tr data-vehicle=")).isEqualTo(loads.vehicles().size());
        assertThat(count(html, "class=\"deck-plan\"")).isEqualTo(loads.vehicles().size());
        assertThat(count(html, "class=\"crate-section\"")).isBetween(1, crates.crates().size());
        assertThat(HtmlReport.render(builder.build())).isEqualTo(html);
    }

    @Test
    @DisplayName("an INFEASIBLE crate or load plan shows its reason in the report, not a gap of 0 %")
    void infeasibleShowsTheReason() {
        List<Bundle> bundles = List.of(Fixtures.bundle("B1", "A", 1900, 60, 300));
        List<CrateType> types = List.of(Fixtures.crate("box", 2000, 500, 500, 20, 700, 50.0));
        CratePlan none = CratePlan.infeasible("joint N (4.8 kg) is heavier than the joint box limit of 1.0 kg");
        String noCrates = render(LogisticsSection.of(none, LoadPlan.infeasible("no crate plan: " + none.reason()),
                bundles, types));
        assertThat(noCrates).contains("No crate plan: joint N (4.8 kg) is heavier than the joint box limit")
                .contains("No load plan: no crates to load").contains("no crate plan: see the packing lists")
                .doesNotContain("gap 0.0 %").doesNotContain("cost 0.00");

        CratePlan crates = new LaneCratePacker(new LaneCratePacker.Limits(0.2, 5, 2)).pack(bundles, List.of(), types,
                JointBox.DEFAULT);
        CratePlanValidator.check(crates, bundles, List.of(), types, JointBox.DEFAULT);
        String noLoads = render(LogisticsSection.of(crates, LoadPlan.infeasible("crate C1 fits no vehicle of the"
                + " catalog (deck size or payload)"), bundles, types));
        assertThat(noLoads).contains("No load plan: crate C1 fits no vehicle of the catalog")
                .doesNotContain("No crate plan").doesNotContain("gap 0.0 %").contains("no load plan: see the manifests")
                .doesNotContain("cost 0.00");
    }

    private static String render(ReportSection section) {
        return HtmlReport.render(kitwright.report.ReportModel.builder(ReportFixtures.sampleKit(),
                LocalDate.of(2026, 1, 2)).section(section).build());
    }

    private static int count(String text, String needle) {
        int n = 0;
        for (int i = text.indexOf(needle); i >= 0; i = text.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }
}
