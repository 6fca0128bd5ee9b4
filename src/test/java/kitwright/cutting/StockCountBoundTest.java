package kitwright.cutting;

import static kitwright.cutting.TestSections.demand;
import static kitwright.cutting.TestSections.mill;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;

/** The work and time limits of the stock-count bound, and the status reason the work limits leave (none). */
class StockCountBoundTest {
    /**
     * Three 600 mm bars on 1000 mm stock at 10 or 1500 mm stock at 14, no kerf, no trim. Worked by hand: the LP
     * puts two bars on each 1500 mm piece, 3 x 14 / 2 = 21; the whole plans cost 3 x 10 = 30, 10 + 14 = 24 or
     * 2 x 14 = 28, so the optimum is 24, and no count vector costs 21, 22 or 23 with room for 1800 mm (the
     * costs 10a + 14b are 10, 14, 20, 24, ...).
     */
    private static final SectionProblem HAND_WORKED = TestSections.section(List.of(demand("A", 600, 3)),
            List.of(mill(1000, 10.0), mill(1500, 14.0)), 0, 0, 100);

    @Test
    void aWorkBudgetEndsTheListingWithAWeakerButValidBound() {
        SectionCutPlan plan = new CuttingStockOptimizer().solve(HAND_WORKED, CutProgress.NONE);
        CutPlanValidator.validate(HAND_WORKED, plan);
        assertThat(plan.value()).isEqualTo(24.0); // worked by hand, above
        IntegerInstance instance = new IntegerInstance(HAND_WORKED);
        long incumbent = Math.round(plan.value() * instance.scale);
        try (ColumnGeneration generation = new ColumnGeneration(instance, 1000, Deadline.in(60))) {
            ColumnGeneration.Relaxation root = generation.solve(instance.demands(), instance.limits());
            long lower = (long) Math.ceil(root.value() - 1e-6);
            assertThat(instance.value(lower)).isEqualTo(21.0); // the LP bound, worked by hand
            StockCountBound.Result full = StockCountBound.raise(instance, generation, lower, incumbent, 150,
                    1_000_000, Deadline.in(60));
            StockCountBound.Result spent = StockCountBound.raise(instance, generation, lower, incumbent, 150, 2,
                    Deadline.in(60));
            assertThat(instance.value(full.bound())).isEqualTo(24.0);
            assertThat(spent.bound()).isEqualTo(lower).isLessThan(full.bound());
            assertThat(spent.counts()).isNull();
            assertThat(spent.timedOut()).isFalse();
        }
    }

    @Test
    void aPassedDeadlineStopsTheListingAtOnce() {
        IntegerInstance instance = new IntegerInstance(HAND_WORKED);
        try (ColumnGeneration generation = new ColumnGeneration(instance, 1000, Deadline.in(60))) {
            ColumnGeneration.Relaxation root = generation.solve(instance.demands(), instance.limits());
            long lower = (long) Math.ceil(root.value() - 1e-6);
            StockCountBound.Result stopped = StockCountBound.raise(instance, generation, lower,
                    Math.round(30.0 * instance.scale), 150, 1_000_000, Deadline.in(0));
            assertThat(stopped.bound()).isEqualTo(lower);
            assertThat(stopped.counts()).isNull();
            assertThat(stopped.timedOut()).isTrue();
        }
    }

    @Test
    void aPlanTheWorkLimitsStoppedGivesNoReason() {
        // no stock-count listing, one column-generation round, no dive, no CP-SAT time: the work limits end it
        SearchLimits tiny = new SearchLimits(600, 1, 0, 0, 0, 0, 0);
        SectionProblem problem = Instances.kitSection("worked", 30, 3, 2, 40, 11, tiny);
        SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, plan);
        assertThat(plan.status()).isEqualTo(Status.FEASIBLE);
        assertThat(plan.reason()).isNull();
    }
}
