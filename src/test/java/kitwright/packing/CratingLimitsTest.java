package kitwright.packing;

import static kitwright.packing.Fixtures.bundle;
import static kitwright.packing.Fixtures.crate;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import kitwright.cutting.Deadline;
import kitwright.model.CrateType;
import kitwright.model.JointBox;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.validate.CratePlanValidator;
import org.junit.jupiter.api.Test;

/**
 * The crating stage obeys its work limits and its wall-clock limit. The greedy constructions of the crate mix run
 * once per crate type and per pair of types, so their crate fillings grow with the square of the catalog: a
 * catalog of 8 crate types (sizes and prices from a fixed seed, invented) takes far more fillings than a budget.
 */
class CratingLimitsTest {
    private static final long BUDGET = 50;

    private static List<CrateType> catalog() {
        Random random = new Random(1717);
        List<CrateType> crates = new ArrayList<>();
        for (int t = 0; t < 8; t++) {
            double length = 3000 + 100 * random.nextInt(40);
            double width = 600 + 50 * random.nextInt(12);
            double height = 400 + 50 * random.nextInt(12);
            crates.add(crate("K" + t, length, width, height, 40 + random.nextInt(60), 3000,
                    100.0 + random.nextInt(400)));
        }
        return crates;
    }

    private static List<Bundle> bundles(int n) {
        Random random = new Random(4242);
        List<Bundle> list = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            double length = 2500 + 100 * random.nextInt(5);
            double diameter = 60 + 20 * random.nextInt(4);
            list.add(bundle("B" + i, "M" + (i % 7), length, diameter, 20 + random.nextInt(40)));
        }
        return list;
    }

    private static long fillings(long budget, List<CrateType> crates, List<ItemType> types) {
        double[] cost = crates.stream().mapToDouble(CrateType::price).toArray();
        CrateChoice choice = new CrateChoice(new PatternCover(0.2, 60), 2, budget, Deadline.in(600));
        assertThat(choice.choose(crates, cost, types)).isNotEmpty();
        return choice.fillings();
    }

    @Test
    void theGreedyConstructionsStopAtTheirBudgetOfFillings() {
        List<CrateType> crates = catalog();
        List<Bundle> bundles = bundles(30);
        CratePlan plan = new LaneCratePacker(new LaneCratePacker.Limits(0.2, 60, 2, BUDGET))
                .pack(bundles, List.of(), crates, JointBox.DEFAULT);
        CratePlanValidator.check(plan, bundles, List.of(), crates, JointBox.DEFAULT);
        assertThat(plan.status()).isNotEqualTo(Status.INFEASIBLE);
        assertThat(plan.reason()).as("a work limit, not the clock, ended the constructions").isNull();

        List<ItemType> types = ItemTypes.of(bundles, List.of()).types();
        // without the budget (as before) the constructions take far more fillings than it allows
        long unlimited = fillings(Long.MAX_VALUE, crates, types);
        assertThat(unlimited).isGreaterThan(5 * BUDGET);
        // with it they stop at the first run past it: at most one greedy run (fillings <= its steps x 2 types) more
        long limited = fillings(BUDGET, crates, types);
        assertThat(limited).isGreaterThanOrEqualTo(BUDGET).isLessThan(BUDGET + 2L * bundles.size());
    }

    @Test
    void aDeadlineThatHasPassedLeavesAValidPlanThatSaysSo() {
        List<CrateType> crates = catalog().subList(0, 5);
        List<Bundle> bundles = bundles(60);
        CratePlan plan = new LaneCratePacker(new LaneCratePacker.Limits(0.2, 1e-9, 2))
                .pack(bundles, List.of(), crates, JointBox.DEFAULT);
        CratePlanValidator.check(plan, bundles, List.of(), crates, JointBox.DEFAULT);
        // only the first construction ran, and no solver had time: unproven, and the plan says why
        assertThat(plan.status()).isEqualTo(Status.FEASIBLE);
        assertThat(plan.reason()).isEqualTo(Deadline.STOPPED_BY_TIME_LIMIT);
    }
}
