package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;

import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/**
 * Every OPTIMAL claim on small fractional sections (kerf, trim and lengths to 0.01 mm, stock within hundredths of a
 * fill) confirmed by an independent exact solve: the bin-assignment model of {@link ExactReferenceTest}, solved by
 * the Choco constraint solver in exact hundredths of a millimetre.
 */
class FractionalExactReferenceTest {

    @Test
    void everyOptimalClaimOnFractionalSectionsIsTheChocoOptimum() {
        int optimal = 0;
        for (long seed = 1; seed <= 60; seed++) {
            SectionProblem problem = ExactSawArithmeticProperties.nearFill(seed);
            SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
            CutPlanValidator.validate(problem, plan);
            Double reference = ExactReferenceTest.chocoOptimum(problem); // Choco solver (reference exact solve)
            assertThat(reference).as("seed %d: Choco finds a plan (unlimited stock)", seed).isNotNull();
            assertThat(plan.status()).as("seed %d: Choco finds a plan", seed).isNotEqualTo(Status.INFEASIBLE);
            assertThat(plan.value()).as("seed %d: no plan below the Choco optimum", seed)
                    .isGreaterThanOrEqualTo(reference - 1e-9);
            if (plan.status() == Status.OPTIMAL) {
                assertThat(plan.value()).as("seed %d: OPTIMAL is the Choco optimum", seed)
                        .isCloseTo(reference, org.assertj.core.data.Offset.offset(1e-9 * reference));
                optimal++;
            }
            assertThat(plan.lowerBound()).as("seed %d: the bound is below the optimum", seed)
                    .isLessThanOrEqualTo(reference + 1e-9);
        }
        assertThat(optimal).as("OPTIMAL claims checked").isGreaterThan(40);
    }
}
