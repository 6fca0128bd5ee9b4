package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import kitwright.io.KitFiles;
import kitwright.io.KitReader;
import kitwright.model.Kit;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The optimiser prices stock on the catalog's basis. Two bars of 2900 mm fit one 6 m or one 12 m length. Read as
 * prices per piece, 4.00 for 12 m beats 5.00 for 6 m; read per metre as the catalog says, 6 m costs 5.00 x 6 = 30.00
 * and 12 m costs 4.00 x 12 = 48.00, so the plan must buy the 6 m length (worked by hand).
 */
class PriceBasisCuttingTest {
    @Test
    void pricesPerMetreChooseTheLengthThatIsCheaperPerPiece(@TempDir Path dir) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2,2900,2\n");
        KitFiles.write(dir, "stock.csv", """
                section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,price_basis
                CHS 48.3x3.2,steel,48.3,3.2,6000,5.00,,mill,m
                CHS 48.3x3.2,steel,48.3,3.2,12000,4.00,,mill,m
                """);
        Kit kit = KitReader.read(dir);

        CutPlan plan = KitCutter.cut(kit, KitCutterTest.OPTIONS, CutProgress.NONE);

        CutPlanValidator.validate(kit, plan);
        SectionCutPlan section = plan.sections().get(0);
        assertThat(section.objective()).isEqualTo("cost");
        assertThat(section.patterns()).extracting(CutPattern::stockLengthMm).containsExactly(6000.0);
        assertThat(section.value()).isCloseTo(30.0, within(1e-9));
    }
}
