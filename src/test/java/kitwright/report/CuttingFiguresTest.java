package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.Status;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/**
 * The cutting figures of a small plan, checked by the shared validator first: 7 x A 2000 mm and 1 x B 1900 mm, kerf
 * 2, trim 5, on 6000 mm mill stock and two 3000 mm rack pieces. Hand count: a 6000 mm piece holds two A
 * (3 x 2002 = 6006 > 5992 = 6000 - 10 + 2) or A, A and B (2002 + 2002 + 1902 = 5906); a rack piece holds one. Eight
 * pieces need at least three 6000 mm pieces with one rack piece (only one piece can hold three), so 3 x 50 + 4 =
 * 154 is the least cost, 3 x 6000 + 3000 = 21 000 mm the least length, and 3 x 50 = 150 with free rack pieces.
 */
class CuttingFiguresTest {
    private static Kit kit(Double millPrice, Double rackPrice) {
        Section tube = new Section("T", "steel", 48.3, 3.2, null, null, null);
        TubeCatalog catalog = new TubeCatalog(Path.of("c.csv"), Map.of("T", tube), List.of(
                new StockLength("T", 6000, millPrice, null, Origin.MILL),
                new StockLength("T", 3000, rackPrice, 2, Origin.RACK)));
        KitSettings settings = KitSettings.defaults("k").withKerfMm(2).withTrimMm(5).withMinRemnantMm(500);
        return new Kit(null, settings, List.of(new Bar("A", "T", 2000, 7, 7, null, null, ""),
                new Bar("B", "T", 1900, 1, 1, null, null, "")), List.of(), List.of(), catalog, Map.of(), List.of(),
                List.of());
    }

    /** The plan, with its objective and value as the kit's prices make them, validated against that kit. */
    private static SectionCutPlan plan(Kit kit, String objective, double value) {
        // 6000 - 10 - 2*2000 - 2*2 = 1986 remnant; 3000 - 10 - 2000 - 2 = 988 remnant; 6000 - 10 - 5900 - 6 = 84
        SectionCutPlan plan = new SectionCutPlan("T", 2, 5, 500, objective, Status.OPTIMAL, null, value, value, 0.0,
                4, List.of(
                new CutPattern(6000, Origin.MILL, 2, List.of(new Cut("A", 2000), new Cut("A", 2000)), 1986, "remnant"),
                new CutPattern(3000, Origin.RACK, 1, List.of(new Cut("A", 2000)), 988, "remnant"),
                new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("A", 2000), new Cut("A", 2000),
                        new Cut("B", 1900)), 84, "scrap")), List.of());
        CutPlanValidator.validate(kit, new CutPlan(List.of(plan)));
        return plan;
    }

    @Test
    void addsStockOffcutsAndCostsByOrigin() {
        Kit kit = kit(50.0, 4.0);
        CuttingFigures f = CuttingFigures.of(kit, plan(kit, "cost", 154));
        assertThat(f.pieces(Origin.MILL)).isEqualTo(3);
        assertThat(f.pieces(Origin.RACK)).isEqualTo(1);
        assertThat(f.stockMm()).isEqualTo(3 * 6000 + 3000);
        assertThat(f.remnantMm()).isEqualTo(2 * 1986 + 988);
        assertThat(f.remnants()).isEqualTo(3);
        assertThat(f.scrapMm()).isEqualTo(84);
        assertThat(f.offcutShare()).isCloseTo((2 * 1986 + 988 + 84) / 21000.0, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(f.cost()).isEqualTo(3 * 50.0 + 4.0);
        assertThat(f.lines()).extracting(CuttingFigures.OrderLine::origin).containsExactly(Origin.MILL, Origin.RACK);
        assertThat(f.lines().get(0).pieces()).isEqualTo(3);
    }

    @Test
    void aMillRowWithoutAPriceMakesTheCostUnknownButAnUnpricedRackRowIsFree() {
        Kit unpricedMill = kit(null, 4.0);
        assertThat(CuttingFigures.of(unpricedMill, plan(unpricedMill, "length", 21_000)).cost()).isNull();
        Kit freeRack = kit(50.0, null);
        assertThat(CuttingFigures.of(freeRack, plan(freeRack, "cost", 150)).cost()).isEqualTo(150.0);
    }
}
