package kitwright.validate;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Collections;
import java.util.List;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.Demand;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.StockOption;
import kitwright.model.Origin;
import kitwright.model.Status;
import org.junit.jupiter.api.Test;

/**
 * The cut validator rejects what the saw model rejects, to the hundredth of a millimetre: plans worked by hand
 * (kerf 1.04 mm, no trim, 6000 mm stock at 19.38), each one figure away from a valid plan.
 */
class CutPlanValidatorTest {
    static final String SECTION = "AL 30x2";
    static final List<StockOption> STOCK = List.of(new StockOption(6000, 19.38, null, Origin.MILL));

    /** {@code count} pieces of {@code cut} mm on one stock piece, for a mark of {@code mark} mm, as its plan. */
    static SectionCutPlan plan(double mark, double cut, int count, double offcut) {
        CutPattern pattern = new CutPattern(6000, Origin.MILL, 1, Collections.nCopies(count, new Cut("A1", cut)),
                offcut, offcut >= 400 ? "remnant" : "scrap");
        return new SectionCutPlan(SECTION, 1.04, 0, 400, "cost", Status.OPTIMAL, null, 19.38, 19.38, 0.0, 1,
                List.of(pattern), List.of());
    }

    static void validate(double mark, int count, SectionCutPlan plan) {
        CutPlanValidator.validate(List.of(new Demand("A1", mark, count)), STOCK, 1.04, 0, 400, plan);
    }

    @Test
    void acceptsAPatternThatEndsOnTheStockEnd() {
        // 10 x 599.06 + 9 x 1.04 = 5999.96 <= 6000; offcut 6000 - 5990.6 - 10.4 < 0, floored at 0
        assertThatCode(() -> validate(599.06, 10, plan(599.06, 599.06, 10, 0))).doesNotThrowAnyException();
        // 5 x 1190.2 + 5 x 1.04 = 5956.2: offcut 43.8, scrap
        assertThatCode(() -> validate(1190.2, 5, plan(1190.2, 1190.2, 5, 43.8))).doesNotThrowAnyException();
    }

    @Test
    void rejectsAPatternOverfullByAHundredth() {
        // 10 x 599.07 + 9 x 1.04 = 6000.06 > 6000; and the pattern of the report: 10 x 599.1 ends at 6000.36
        assertThatThrownBy(() -> validate(599.07, 10, plan(599.07, 599.07, 10, 0)))
                .isInstanceOf(AssertionError.class).hasMessageContaining("does not fit: cut 10 ends at 6000.06");
        assertThatThrownBy(() -> validate(599.1, 10, plan(599.1, 599.1, 10, 0)))
                .isInstanceOf(AssertionError.class).hasMessageContaining("ends at 6000.36");
    }

    @Test
    void rejectsAPieceOfTheWrongLength() {
        // the mark is 1190.21 mm, the pattern cuts 1190.2 mm (offcut 43.8 is right for what it cuts)
        assertThatThrownBy(() -> validate(1190.21, 5, plan(1190.21, 1190.2, 5, 43.8)))
                .isInstanceOf(AssertionError.class).hasMessageContaining("cut length of A1");
    }

    @Test
    void rejectsAnOffcutLongerThanTheSawLeaves() {
        // 43.8 mm left, the plan claims 43.81
        assertThatThrownBy(() -> validate(1190.2, 5, plan(1190.2, 1190.2, 5, 43.81)))
                .isInstanceOf(AssertionError.class).hasMessageContaining("offcut should be 43.8");
    }

    @Test
    void rejectsASawSheetThatPlacesACutPastTheStockEnd() {
        CutPlan plan = new CutPlan(List.of(plan(1190.2, 1190.2, 5, 43.8)));
        // laid out as kitwright writes every CSV: byte-order mark, CRLF line ends
        String header = "\uFEFFstock_piece,section,stock_length_mm,origin,sequence,kind,mark,length_mm,"
                + "tolerance_mm,start_mm\r\n";
        StringBuilder good = new StringBuilder(header);
        double[] starts = {0, 1191.24, 2382.48, 3573.72, 4764.96}; // k x (1190.2 + 1.04), by hand
        for (int i = 0; i < 5; i++) {
            good.append("1,AL 30x2,6000,mill,").append(i + 1).append(",cut,A1,1190.2,,").append(starts[i])
                    .append("\r\n");
        }
        String valid = good + "1,AL 30x2,6000,mill,6,scrap,,43.8,,5956.2\r\n";
        assertThatCode(() -> CutPlanValidator.validateCutList(plan, valid)).doesNotThrowAnyException();
        // the scrap row one kerf late: 5957.24 + 43.8 = 6001.04, past the stock end
        String late = good + "1,AL 30x2,6000,mill,6,scrap,,43.8,,5957.24\r\n";
        assertThatThrownBy(() -> CutPlanValidator.validateCutList(plan, late))
                .isInstanceOf(AssertionError.class).hasMessageContaining("starts at 5957.24, expected 5956.2");
        // the last cut moved 50 mm on: it would end at 6005.16
        String past = valid.replace(",4764.96\r\n", ",4814.96\r\n");
        assertThatThrownBy(() -> CutPlanValidator.validateCutList(plan, past))
                .isInstanceOf(AssertionError.class).hasMessageContaining("row 6: starts at 4814.96");
        // the saw sheet written for the overfull plan of the report: ten 599.1 mm pieces, kerf 1.04, the tenth
        // starting at 9 x 600.14 = 5401.26 and ending at 6000.36
        StringBuilder overrun = new StringBuilder(header);
        for (int i = 0; i < 10; i++) {
            overrun.append("1,AL 30x2,6000,mill,").append(i + 1).append(",cut,A1,599.1,,")
                    .append(new java.math.BigDecimal("600.14").multiply(java.math.BigDecimal.valueOf(i))
                            .stripTrailingZeros().toPlainString()).append("\r\n");
        }
        overrun.append("1,AL 30x2,6000,mill,11,scrap,,0,,6000\r\n");
        assertThatThrownBy(() -> CutPlanValidator.validateCutList(new CutPlan(List.of(plan(599.1, 599.1, 10, 0))),
                overrun.toString())).isInstanceOf(AssertionError.class)
                .hasMessageContaining("row 11: ends at 6000.36, past the far trim line 6000");
    }
}
