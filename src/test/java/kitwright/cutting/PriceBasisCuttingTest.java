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
        SectionCutPlan section = cutOne(dir, 2900, "6000,5.00,,mill,m", "12000,4.00,,mill,m");
        assertThat(section.objective()).isEqualTo("cost");
        assertThat(section.patterns()).extracting(CutPattern::stockLengthMm).containsExactly(6000.0);
        assertThat(section.value()).isCloseTo(30.0, within(1e-9));
    }

    /**
     * Two bars of 5900 mm: one per 6 m length, both in one 12 m length. The 6 m length costs 20.00 per piece, the
     * 12 m length 1.20 per kg. Read as a price per piece, 1.20 for 12 m would win; per kg, 12 m of CHS 48.3x3.2 weighs
     * 12 x pi x (48.3 - 3.2) x 3.2 x 7850e-6 = 42.709 kg (M = pi (D - T) T rho, EN 10219-2; rho 7850 kg/m3,
     * EN 1993-1-1 3.2.6) and costs 51.25, more than two 6 m pieces at 40.00, so the plan must buy two 6 m pieces
     * (worked by hand).
     */
    @Test
    void pricesPerKilogramAreWorkedOutFromTheNominalMass(@TempDir Path dir) throws Exception {
        SectionCutPlan section = cutOne(dir, 5900, "6000,20.00,,mill,piece", "12000,1.20,,mill,kg");
        assertThat(section.patterns()).extracting(CutPattern::stockLengthMm).containsExactly(6000.0);
        assertThat(section.patterns()).extracting(CutPattern::count).containsExactly(2);
        assertThat(section.value()).isCloseTo(40.0, within(1e-9));
        double perKilogram12m = 1.20 * 12 * Math.PI * (48.3 - 3.2) * 3.2 * 7850e-6;
        assertThat(perKilogram12m).isCloseTo(51.25, within(0.005));
        assertThat(KitReader.read(dir).catalog().stockFor("CHS 48.3x3.2").get(1).price())
                .isCloseTo(perKilogram12m, within(1e-9));
    }

    /** Two bars of {@code barMm} on CHS 48.3x3.2 cut from the given catalog rows (from length_mm on), validated. */
    private static SectionCutPlan cutOne(Path dir, double barMm, String... rows) throws Exception {
        KitFiles.kit(dir, "mark,section,length_mm,quantity\nA,CHS 48.3x3.2," + barMm + ",2\n");
        StringBuilder stock = new StringBuilder(
                "section,material,outer_diameter_mm,wall_mm,length_mm,price,available,origin,price_basis\n");
        for (String row : rows) {
            stock.append("CHS 48.3x3.2,steel,48.3,3.2,").append(row).append('\n');
        }
        KitFiles.write(dir, "stock.csv", stock.toString());
        Kit kit = KitReader.read(dir);

        CutPlan plan = KitCutter.cut(kit, KitCutterTest.OPTIONS, CutProgress.NONE);

        CutPlanValidator.validate(kit, plan);
        return plan.sections().get(0);
    }
}
