package kitwright.report.cutting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.PieceKind;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.Spare;
import kitwright.model.Kit;
import kitwright.model.MiscutAllowance;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.report.labels.LabelSet;
import kitwright.report.labels.PieceLabel;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/**
 * Kinds of cut pieces with a miscut allowance of one piece per mark, on the hand-made kit of
 * {@link CuttingFilesTest} (A 2 x 2500 mm, B 2 x 1000 mm, kerf 2, trim 5; invented data) and a plan worked by hand
 * that cuts A 3 times and B 4 times: each mark's first two pieces are the kit's, the third its allowance, B's fourth
 * a spare. The validators pass the plan first, then reject the same plan read without the allowance, a plan short
 * of an allowance piece and a saw sheet that calls an allowance piece a spare.
 */
class AllowanceKindsTest {
    static Kit kit() {
        Kit kit = CuttingFilesTest.kit();
        return kit.withSettings(kit.settings().withMiscutAllowance(new MiscutAllowance(1, 0)));
    }

    /**
     * 6000: A A (offcut 6000 - 10 - 5000 - 4 = 986, remnant); rack 3200: B B B (3200 - 10 - 3000 - 6 = 184,
     * scrap); 6000: A B (6000 - 10 - 3500 - 4 = 2486, remnant). Price 30 + 2 + 30.
     */
    static CutPlan plan() {
        CutPattern first = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("A", 2500), new Cut("A", 2500)),
                986, "remnant");
        CutPattern rack = new CutPattern(3200, Origin.RACK, 1, List.of(new Cut("B", 1000), new Cut("B", 1000),
                new Cut("B", 1000)), 184, "scrap");
        CutPattern last = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("A", 2500), new Cut("B", 1000)),
                2486, "remnant");
        return new CutPlan(List.of(new SectionCutPlan(CuttingFilesTest.SECTION, 2, 5, 500, "cost", Status.OPTIMAL,
                null, 62.0, 62.0, 0.0, 3, List.of(first, rack, last), List.of(new Spare("B", 1)))));
    }

    @Test
    void theSawSheetAndTheLabelsNameEachMarksThirdPieceAllowance() {
        CutPlanValidator.validate(kit(), plan());
        String csv = CutListCsv.format(kit(), plan());
        CutPlanValidator.validateCutList(plan(), csv);
        CutPlanValidator.validateKinds(kit(), plan(), csv);

        assertThat(kitwright.validate.CsvOutput.lines(csv)).containsExactly(
                "stock_piece,section,stock_length_mm,origin,sequence,kind,mark,length_mm,tolerance_mm,start_mm",
                "1,CHS 48.3x3.2,6000,mill,1,cut,A,2500,0.5,5",
                "1,CHS 48.3x3.2,6000,mill,2,cut,A,2500,0.5,2507",
                "1,CHS 48.3x3.2,6000,mill,3,remnant,,986,,5009",
                "2,CHS 48.3x3.2,3200,rack,1,cut,B,1000,0.5,5",
                "2,CHS 48.3x3.2,3200,rack,2,cut,B,1000,0.5,1007",
                "2,CHS 48.3x3.2,3200,rack,3,allowance,B,1000,0.5,2009",
                "2,CHS 48.3x3.2,3200,rack,4,scrap,,184,,3011",
                "3,CHS 48.3x3.2,6000,mill,1,allowance,A,2500,0.5,5",
                "3,CHS 48.3x3.2,6000,mill,2,spare,B,1000,0.5,2507",
                "3,CHS 48.3x3.2,6000,mill,3,remnant,,2486,,3509");
        List<String> labels = LabelSet.of(kit(), plan(), List.of(), null, "2026-12-03").pieces().stream()
                .map(PieceLabel::kind).toList();
        assertThat(labels).containsExactly("cut", "cut", "cut", "cut", "allowance", "allowance", "spare");
        SectionCutPlan section = plan().sections().get(0);
        assertThat(PieceKind.counts(kit(), section, PieceKind.ALLOWANCE)).containsExactly(
                java.util.Map.entry("A", 1), java.util.Map.entry("B", 1));
        assertThat(PieceKind.counts(kit(), section, PieceKind.SPARE)).containsExactly(java.util.Map.entry("B", 1));
    }

    @Test
    void theValidatorsRequireTheAllowanceAndItsKind() {
        assertThatCode(() -> CutPlanValidator.validate(kit(), plan())).doesNotThrowAnyException();
        // without the allowance in kit.json, B's third and fourth pieces are both beyond the demand
        assertThatThrownBy(() -> CutPlanValidator.validate(CuttingFilesTest.kit(), plan()))
                .isInstanceOf(AssertionError.class).hasMessageContaining("mark A cut 3 times, expected 2");
        // the plan of CuttingFilesTest cuts A twice: one allowance piece short
        assertThatThrownBy(() -> CutPlanValidator.validate(kit(), CuttingFilesTest.plan()))
                .isInstanceOf(AssertionError.class).hasMessageContaining("mark A cut 2 times, expected 3");
        // a sheet written as if there were no allowance calls B's third piece a spare
        String unaware = CutListCsv.format(CuttingFilesTest.kit(), plan());
        assertThatThrownBy(() -> CutPlanValidator.validateKinds(kit(), plan(), unaware))
                .isInstanceOf(AssertionError.class)
                .hasMessageContaining("piece 3 of mark B is spare, expected allowance");
    }
}
