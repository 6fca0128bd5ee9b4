package kitwright.cutting;

import static kitwright.cutting.KitFixtures.bar;
import static kitwright.cutting.KitFixtures.chs;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.StockLength;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

class KitCutterTest {
    static final KitCutter.Options OPTIONS = new KitCutter.Options(false, TestSections.LIMITS);

    /** Two sections; the second can only be cut from two rack offcuts, which are too few. */
    static Kit kitWithShortRack() {
        return KitFixtures.kit(List.of(chs("CHS 48.3x3.2", 48.3, 3.2), chs("CHS 60.3x3.2", 60.3, 3.2)),
                List.of(new StockLength("CHS 48.3x3.2", 6000, 30.96, null, Origin.MILL),
                        new StockLength("CHS 60.3x3.2", 3000, 2.0, 2, Origin.RACK)),
                List.of(bar("D1", "CHS 48.3x3.2", 2330, 7), bar("C1", "CHS 60.3x3.2", 2845, 2),
                        bar("C2", "CHS 60.3x3.2", 1600, 1)),
                KitSettings.defaults("short-rack"));
    }

    @Test
    void limitedStockThatCannotCoverASectionMakesItInfeasibleAndTheOthersArePlanned() {
        Kit kit = kitWithShortRack();
        List<String> stages = new ArrayList<>();
        CutPlan plan = KitCutter.cut(kit, OPTIONS, (stage, section, bound, best) -> stages.add(section));
        CutPlanValidator.validate(kit, plan);
        SectionCutPlan first = plan.sections().get(0);
        SectionCutPlan second = plan.sections().get(1);
        assertThat(first.status()).isEqualTo(Status.OPTIMAL);
        assertThat(first.stockPieces()).isEqualTo(4); // 7 bars of 2330 mm, two per 6 m piece
        assertThat(second.status()).isEqualTo(Status.INFEASIBLE);
        assertThat(second.patterns()).isEmpty();
        // two 3000 mm offcuts hold one bar of C1 each; C2 (1600 mm) has no stock left
        assertThat(second.reason()).contains("C2 (1 of 1 bars missing, 1600 mm each)").contains("1600 mm of bar length missing");
        assertThat(stages).contains("CHS 48.3x3.2");
    }

    @Test
    void aMarkLongerThanAnyStockIsNamedInTheReason() {
        SectionProblem problem = TestSections.section(List.of(TestSections.demand("LONG", 6100, 1),
                TestSections.demand("OK", 1000, 2)), List.of(TestSections.mill(6000, 30.0)), 2, 5, 500);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.status()).isEqualTo(Status.INFEASIBLE);
        assertThat(plan.reason()).contains("LONG").contains("5990 mm after trim");
    }

    @Test
    void aSectionWithoutStockIsInfeasible() {
        SectionProblem problem = TestSections.section(List.of(TestSections.demand("A", 1000, 1)),
                List.of(TestSections.rack(3000, 1.0, 0)), 2, 5, 500);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.reason()).contains("no stock for section");
    }

    @Test
    void sectionsFollowTheCatalogOrderAndUseTheKitSawSettings() {
        Kit kit = KitFixtures.random(7);
        CutPlan plan = KitCutter.cut(kit, OPTIONS, CutProgress.NONE);
        CutPlanValidator.validate(kit, plan);
        assertThat(plan.sections()).extracting(SectionCutPlan::section).containsExactlyElementsOf(kit.usedSections());
        assertThat(plan.sections()).allSatisfy(s -> assertThat(s.kerfMm()).isEqualTo(kit.settings().kerfMm()));
    }

    @Test
    void sparesFromOffcutsFillOffcutsWithoutBuyingMore() {
        Kit kit = kitWithShortRack();
        CutPlan plain = KitCutter.cut(kit, OPTIONS, CutProgress.NONE);
        CutPlan filled = KitCutter.cut(kit, new KitCutter.Options(true, TestSections.LIMITS), CutProgress.NONE);
        CutPlanValidator.validate(kit, filled);
        SectionCutPlan before = plain.sections().get(0);
        SectionCutPlan after = filled.sections().get(0);
        assertThat(after.stockPieces()).isEqualTo(before.stockPieces());
        assertThat(after.value()).isEqualTo(before.value());
        // 4 x 6000 mm hold 8 bars of 2330 mm: the eighth is a spare
        assertThat(after.spares()).containsExactly(new Spare("D1", 1));
    }
}
