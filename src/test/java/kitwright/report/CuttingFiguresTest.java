package kitwright.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.Origin;
import kitwright.model.Section;
import kitwright.model.Status;
import kitwright.model.StockLength;
import kitwright.model.TubeCatalog;
import org.junit.jupiter.api.Test;

class CuttingFiguresTest {
    private static Kit kit(Double millPrice, Double rackPrice) {
        Section tube = new Section("T", "steel", 48.3, 3.2, null, null, null);
        TubeCatalog catalog = new TubeCatalog(Path.of("c.csv"), Map.of("T", tube), List.of(
                new StockLength("T", 6000, millPrice, null, Origin.MILL),
                new StockLength("T", 3000, rackPrice, 2, Origin.RACK)));
        return new Kit(null, KitSettings.defaults("k"), List.of(new Bar("A", "T", 2000, 5, 5, null, null, "")),
                List.of(), List.of(), catalog, Map.of(), List.of(), List.of());
    }

    private static SectionCutPlan plan() {
        // 6000 - 10 - 2*2000 - 2*2 = 1986 remnant; 3000 - 10 - 2000 - 2 = 988 remnant
        return new SectionCutPlan("T", 2, 5, 500, "cost", Status.OPTIMAL, null, 1.0, 1.0, 0.0, 4, List.of(
                new CutPattern(6000, Origin.MILL, 2, List.of(new Cut("A", 2000), new Cut("A", 2000)), 1986, "remnant"),
                new CutPattern(3000, Origin.RACK, 1, List.of(new Cut("A", 2000)), 988, "remnant"),
                new CutPattern(6000, Origin.MILL, 1, List.of(new Cut("A", 2000), new Cut("A", 2000),
                        new Cut("A", 1900)), 84, "scrap")), List.of());
    }

    @Test
    void addsStockOffcutsAndCostsByOrigin() {
        CuttingFigures f = CuttingFigures.of(kit(50.0, 4.0), plan());
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
        assertThat(CuttingFigures.of(kit(null, 4.0), plan()).cost()).isNull();
        assertThat(CuttingFigures.of(kit(50.0, null), plan()).cost()).isEqualTo(150.0);
    }
}
