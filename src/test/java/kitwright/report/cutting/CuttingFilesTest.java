package kitwright.report.cutting;

import static kitwright.cutting.KitFixtures.bar;
import static kitwright.cutting.KitFixtures.chs;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.KitFixtures;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.Spare;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.model.StockLength;
import kitwright.validate.CsvOutput;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/** The saw sheet, order and rack files of a small hand-made plan (figures worked by hand). */
class CuttingFilesTest {
    static final String SECTION = "CHS 48.3x3.2";

    static Kit kit() {
        return KitFixtures.kit(List.of(chs(SECTION, 48.3, 3.2)),
                List.of(new StockLength(SECTION, 6000, 30.0, null, Origin.MILL),
                        new StockLength(SECTION, 3200, 2.0, 3, Origin.RACK)),
                List.of(bar("A", SECTION, 2500, 2), bar("B", SECTION, 1000, 2)),
                KitSettings.defaults("files").withKerfMm(2).withTrimMm(5).withMinRemnantMm(500));
    }

    /** 6000: A A (offcut 6000-10-5000-4 = 986, remnant) and rack 3200: B B (3200-10-2000-4 = 1186) + spare B. */
    static CutPlan plan() {
        CutPattern mill = new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("A", 2500), new Cut("A", 2500)),
                986, "remnant");
        CutPattern rack = new CutPattern(3200, Origin.RACK, 1, List.of(new Cut("B", 1000), new Cut("B", 1000),
                new Cut("B", 1000)), 184, "scrap");
        return new CutPlan(List.of(new SectionCutPlan(SECTION, 2, 5, 500, "cost", Status.OPTIMAL, null, 32.0, 32.0,
                0.0, 2, List.of(mill, rack), List.of(new Spare("B", 1)))));
    }

    @Test
    void sawSheetListsEveryCutWithItsStartAndEveryOffcut() {
        CutPlanValidator.validate(kit(), plan());
        String csv = CutListCsv.format(kit(), plan());
        CutPlanValidator.validateCutList(plan(), csv);
        assertThat(CsvOutput.lines(csv)).containsExactly(
                "stock_piece,section,stock_length_mm,origin,sequence,kind,mark,length_mm,tolerance_mm,start_mm",
                "1,CHS 48.3x3.2,6000,mill,1,cut,A,2500,0.5,5",
                "1,CHS 48.3x3.2,6000,mill,2,cut,A,2500,0.5,2507",
                "1,CHS 48.3x3.2,6000,mill,3,remnant,,986,,5009",
                "2,CHS 48.3x3.2,3200,rack,1,cut,B,1000,0.5,5",
                "2,CHS 48.3x3.2,3200,rack,2,cut,B,1000,0.5,1007",
                "2,CHS 48.3x3.2,3200,rack,3,spare,B,1000,0.5,2009",
                "2,CHS 48.3x3.2,3200,rack,4,scrap,,184,,3011");
    }

    /**
     * Ten 599.06 mm bars, kerf 1.04 mm, no trim, on 6000 mm: piece i starts at (i - 1) x 600.10, the tenth ends at
     * 5999.96 (worked by hand); the last kerf would pass the stock end, so the scrap row starts on it, at 6000.
     */
    @Test
    void sawSheetInHundredthsPlacesNothingPastTheStockEnd() {
        Kit kit = KitFixtures.kit(List.of(chs(SECTION, 48.3, 3.2)),
                List.of(new StockLength(SECTION, 6000, 30.0, null, Origin.MILL)),
                List.of(bar("A", SECTION, 599.06, 10)),
                KitSettings.defaults("files").withKerfMm(1.04).withTrimMm(0).withMinRemnantMm(500));
        CutPattern full = new CutPattern(6000, Origin.MILL, 1, java.util.Collections.nCopies(10, new Cut("A", 599.06)),
                0, "scrap");
        CutPlan plan = new CutPlan(List.of(new SectionCutPlan(SECTION, 1.04, 0, 500, "cost", Status.OPTIMAL, null,
                30.0, 30.0, 0.0, 1, List.of(full), List.of())));
        CutPlanValidator.validate(kit, plan);
        String csv = CutListCsv.format(kit, plan);
        CutPlanValidator.validateCutList(plan, csv);
        List<String> lines = CsvOutput.lines(csv);
        assertThat(lines).hasSize(12);
        assertThat(lines.get(3)).isEqualTo("1,CHS 48.3x3.2,6000,mill,3,cut,A,599.06,0.5,1200.2");
        assertThat(lines.get(10)).isEqualTo("1,CHS 48.3x3.2,6000,mill,10,cut,A,599.06,0.5,5400.9");
        assertThat(lines.get(11)).isEqualTo("1,CHS 48.3x3.2,6000,mill,11,scrap,,0,,6000");
    }

    @Test
    void orderListsMillStockThenTheRackOffcutsApart() {
        assertThat(CsvOutput.lines(OrderCsv.format(kit(), plan()))).containsExactly(
                "section,origin,stock_length_mm,pieces,unit_price,total",
                "CHS 48.3x3.2,mill,6000,1,30,30",
                "CHS 48.3x3.2,rack,3200,1,2,2");
    }

    @Test
    void rackAfterKeepsTheUnusedOffcutsAndAddsTheNewRemnants() {
        assertThat(CsvOutput.lines(RackAfterCsv.format(kit(), plan()))).containsExactly(
                "section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,weld_bead_mm,"
                        + "od_tolerance_mm,wall_tolerance_pct",
                "CHS 48.3x3.2,steel,48.3,3.2,3200,2,2,rack,,,",
                "CHS 48.3x3.2,steel,48.3,3.2,986,,1,rack,,,");
    }
}
