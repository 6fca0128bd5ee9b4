package kitwright.cutting;

import static kitwright.cutting.TestSections.demand;
import static kitwright.cutting.TestSections.mill;
import static kitwright.cutting.TestSections.section;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/** The integer unit of a section: exact to the finest decimal its data uses, safe rounding beyond (worked by hand). */
class LengthScaleTest {

    @Test
    void wholeMillimetresKeepMillimetreSizes() {
        // 2500 + 2 = 2502 and 1000 + 2 = 1002, gcd 6: sizes 417 and 167; capacity floor((6000 - 10 + 2) / 6) = 998
        IntegerInstance instance = new IntegerInstance(section(List.of(demand("A", 2500, 2), demand("B", 1000, 3)),
                List.of(mill(6000, 30.0)), 2, 5, 300));
        assertThat(instance.lengthScale).isEqualTo(new LengthScale(0, true));
        assertThat(instance.size).containsExactly(417, 167);
        assertThat(instance.capacity).containsExactly(998);
    }

    @Test
    void hundredthsAreHeldExactly() {
        // ten 599.1 on 6000, kerf 1.04: 10 x 600.14 = 6001.4 > 6000 + 1.04 = 6001.04, so one piece holds nine
        SectionProblem problem = section(List.of(demand("A1", 599.1, 10)), List.of(mill(6000, 19.38)), 1.04, 0, 400);
        IntegerInstance instance = new IntegerInstance(problem);
        assertThat(instance.lengthScale).isEqualTo(new LengthScale(2, true));
        assertThat(instance.size[0] * 10L).isGreaterThan(instance.capacity[0]);
        assertThat(instance.size[0] * 9L).isLessThanOrEqualTo(instance.capacity[0]);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.stockPieces()).isEqualTo(2);
        assertThat(plan.status()).isEqualTo(Status.OPTIMAL);
        assertThat(plan.value()).isEqualTo(2 * 19.38);
    }

    @Test
    void finerDecimalsRoundTheSafeWayAndClaimNoOptimumTheyCannotProve() {
        // ten 599.0001, kerf 1, on 5999.0011: truly 5990.001 + 9 = 5999.001 <= 5999.0011, one piece. In micrometres
        // rounded the safe way: 5990.01 + 9 = 5999.01 > 5999.001, two pieces; the other way: 5990 + 9 = 5999 <=
        // 5999.002, so the bound stays at one piece and the plan of two is FEASIBLE, gap 1/2
        SectionProblem problem = section(List.of(demand("A1", 599.0001, 10)), List.of(mill(5999.0011, 20.0)), 1, 0,
                400);
        IntegerInstance instance = new IntegerInstance(problem);
        assertThat(instance.lengthScale).isEqualTo(new LengthScale(3, false));
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.stockPieces()).isEqualTo(2);
        assertThat(plan.status()).isEqualTo(Status.FEASIBLE);
        assertThat(plan.lowerBound()).isEqualTo(20.0);
        SectionCutPlan firstFit = new FirstFitDecreasing().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, firstFit);
        assertThat(firstFit.status()).isEqualTo(Status.FEASIBLE);
    }

    @Test
    void longStockInHundredthsFallsBackToTenthsRoundedTheSafeWay() {
        // sizes 4 999 998 and 3 000 005 hundredths (gcd 1), capacity 20 000 002: above the 10 000 000 units the
        // tables may take, so tenths, rounded: sizes 500 001 and 300 002, capacity 2 000 000
        SectionProblem problem = section(List.of(demand("A1", 49_999.97, 4), demand("B1", 30_000.04, 1)),
                List.of(mill(200_000.01, 500.0)), 0.01, 0, 400);
        IntegerInstance instance = new IntegerInstance(problem);
        assertThat(instance.lengthScale).isEqualTo(new LengthScale(1, false));
        assertThat(instance.size).containsExactly(500_001, 300_002);
        assertThat(instance.capacity).containsExactly(2_000_000);
        // the true optimum is two pieces (229 999.97 mm of bars and kerfs on 200 000.02 per piece); sizes rounded
        // down prove it (the material bound), so OPTIMAL stands against the bound rounded the other way
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.stockPieces()).isEqualTo(2);
        assertThat(plan.status()).isEqualTo(Status.OPTIMAL);
    }
}
