package kitwright.cutting;

import static kitwright.cutting.TestSections.demand;
import static kitwright.cutting.TestSections.mill;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.io.PrettyJson;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/** Time limit, determinism, remnants and the progress callback of the optimiser. */
class SolverBehaviourTest {

    @Test
    void anExpiredTimeLimitStillReturnsThePlanAtHandWithItsGapAndSaysSo() {
        SectionProblem problem = Instances.kitSection("timed", 30, 3, 2, 40, 11, TestSections.LIMITS)
                .withLimits(TestSections.LIMITS.withTimeLimitSeconds(1e-6));
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.status()).isEqualTo(Status.FEASIBLE);
        assertThat(plan.patterns()).isNotEmpty();
        assertThat(plan.gap()).isPositive();
        assertThat(plan.reason()).isEqualTo("stopped by the time limit");
    }

    @Test
    void findsAPlanWhereFirstFitDecreasingRunsOutOfLimitedStock() {
        // two 1000 mm offcuts: 500+300+200 and 400+300+300 fit exactly; first-fit decreasing puts 500 and 400
        // together and is left with a 200 mm bar and no stock
        SectionProblem problem = TestSections.section(List.of(demand("A", 500, 1), demand("B", 400, 1),
                demand("C", 300, 3), demand("D", 200, 1)), List.of(TestSections.rack(1000, 5.0, 2)), 0, 0, 100);
        assertThat(new FirstFitDecreasing().solve(problem, CutProgress.NONE).status()).isEqualTo(Status.INFEASIBLE);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.status()).isEqualTo(Status.OPTIMAL);
        assertThat(plan.stockPieces()).isEqualTo(2);
    }

    @Test
    void theSameProblemGivesTheSamePlanTwice() {
        SectionProblem problem = Instances.kitSection("twice", 15, 3, 2, 30, 5, TestSections.LIMITS);
        SectionCutPlan first = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        SectionCutPlan second = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, first);
        assertThat(second).isEqualTo(first);
        assertThat(PrettyJson.write(second)).isEqualTo(PrettyJson.write(first));
    }

    @Test
    void equalCostPlansGatherTheWasteIntoOneRemnant() {
        // 600+400 and 300+300 leave offcuts 0 and 400; 600+300 and 300+400 would leave 100 and 300 (scrap)
        SectionProblem problem = TestSections.section(
                List.of(demand("A", 600, 1), demand("B", 400, 1), demand("C", 300, 2)),
                List.of(mill(1000, 10.0)), 0, 0, 350);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.value()).isEqualTo(20.0);
        assertThat(plan.patterns()).extracting(CutPattern::offcutMm).containsExactlyInAnyOrder(0.0, 400.0);
    }

    @Test
    void consolidationMovesPiecesTowardTheFullerStockPiece() {
        SectionProblem problem = TestSections.section(
                List.of(demand("A", 600, 1), demand("B", 400, 1), demand("C", 300, 2)),
                List.of(mill(1000, 10.0)), 0, 0, 350);
        IntegerInstance instance = new IntegerInstance(problem);
        // types by decreasing size: A 600, B 400, C 300; start from 600+300 | 400+300
        Packing spread = new Packing(List.of(new Pattern(0, new int[] {1, 0, 1}), new Pattern(0, new int[] {0, 1, 1})));
        Packing gathered = RemnantConsolidation.consolidate(instance, spread);
        assertThat(gathered.cost(instance)).isEqualTo(spread.cost(instance));
        assertThat(gathered.pieces()).extracting(p -> (instance.capacity[0] - instance.load(p.counts()))
                * instance.unit / Math.pow(10, instance.lengthScale.decimals())) // free millimetres
                .containsExactlyInAnyOrder(0.0, 400.0);
    }

    @Test
    void progressReportsTheBoundAndTheBestValueAsTheyImprove() {
        SectionProblem problem = WorkedExamplesTest.chvatalProblem();
        List<Double> bounds = new java.util.ArrayList<>();
        new CuttingStockOptimizer().solve(problem, (stage, section, bound, best) -> {
            assertThat(section).isEqualTo("rolls");
            bounds.add(bound);
            if (best != null) {
                assertThat(best).isGreaterThanOrEqualTo(bound);
            }
        });
        assertThat(bounds).isNotEmpty().isSorted();
    }
}
