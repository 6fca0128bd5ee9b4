package kitwright.cutting;

import static kitwright.cutting.TestSections.demand;
import static kitwright.cutting.TestSections.mill;
import static kitwright.cutting.TestSections.rack;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

class FirstFitDecreasingTest {

    @Test
    void opensTheCheapestStockPerMillimetreAndFillsTheFirstPieceWithRoom() {
        // 6000 mm at 60 (0.010/mm), 3000 mm at 33 (0.011/mm), a free 2000 mm rack offcut
        SectionProblem problem = TestSections.section(
                List.of(demand("A", 2500, 2), demand("B", 1500, 3), demand("C", 1000, 2)),
                List.of(mill(6000, 60.0), mill(3000, 33.0), rack(2000, 0.0, 1)), 0, 0, 300);
        IntegerInstance instance = new IntegerInstance(problem);
        FirstFitDecreasing.Result result = FirstFitDecreasing.pack(instance, instance.demands(), instance.limits());
        // by hand: A A -> 6000 #1; B -> rack (free); B B -> 6000 #2; C -> #1 (exactly full); C -> #2
        List<Pattern> pieces = result.packing().pieces();
        assertThat(result.complete()).isTrue();
        assertThat(pieces).hasSize(3);
        assertThat(pieces.get(0).stock()).isZero();
        assertThat(pieces.get(1).stock()).isEqualTo(2);
        assertThat(pieces.get(2).stock()).isZero();
        // item types by decreasing size: A, B, C
        assertThat(pieces.get(0).counts()).containsExactly(2, 0, 1);
        assertThat(pieces.get(1).counts()).containsExactly(0, 1, 0);
        assertThat(pieces.get(2).counts()).containsExactly(0, 2, 1);

        SectionCutPlan plan = new FirstFitDecreasing().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.value()).isEqualTo(120.0);
        assertThat(plan.patterns()).anySatisfy(p -> assertThat(p.origin()).isEqualTo(Origin.RACK));
    }

    @Test
    void withoutPricesEveryLengthCostsTheSameAndTheLongerIsOpened() {
        SectionProblem problem = TestSections.section(List.of(demand("A", 1000, 3)),
                List.of(mill(6000, null), mill(12000, null)), 2, 5, 500);
        SectionCutPlan plan = new FirstFitDecreasing().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.objective()).isEqualTo("length");
        assertThat(plan.patterns()).singleElement().satisfies(p -> {
            assertThat(p.stockLengthMm()).isEqualTo(12000.0);
            assertThat(p.count()).isEqualTo(1);
        });
    }

    @Test
    void reportsThePiecesItCannotPlaceWhenStockRunsOut() {
        SectionProblem problem = TestSections.section(List.of(demand("A", 2000, 3)), List.of(rack(3000, 1.0, 2)),
                0, 0, 500);
        SectionCutPlan plan = new FirstFitDecreasing().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.status()).isEqualTo(Status.INFEASIBLE);
        assertThat(plan.reason()).contains("A (1 of 3 bars missing, 2000 mm each)")
                .contains("2000 mm of bar length missing");
    }

    @Test
    void theOptimiserIsNeverWorseThanFirstFitDecreasing() {
        for (long seed = 1; seed <= 30; seed++) {
            SectionProblem problem = TestSections.random(seed, 30);
            CuttingStockOptimizer.Outcome outcome = new CuttingStockOptimizer().optimize(problem, CutProgress.NONE);
            SectionCutPlan baseline = new FirstFitDecreasing().solve(problem, CutProgress.NONE);
            CutPlanValidator.validate(problem, outcome.plan());
            CutPlanValidator.validate(problem, baseline);
            if (baseline.status() != Status.INFEASIBLE) {
                assertThat(outcome.plan().value()).as("seed %d", seed).isLessThanOrEqualTo(baseline.value());
                assertThat(outcome.firstFitValue()).isEqualTo(baseline.value());
            }
        }
    }
}
