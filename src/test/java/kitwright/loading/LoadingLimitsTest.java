package kitwright.loading;

import static kitwright.loading.LoadFixtures.BOX_TRUCK;
import static kitwright.loading.LoadFixtures.crateType;
import static kitwright.loading.LoadFixtures.plan;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.packing.CratePlan;
import kitwright.validate.LoadPlanValidator;
import org.junit.jupiter.api.Test;

/**
 * The loading stage has one deadline (its safety-net seconds, kit.json timeLimitSeconds) for every loop and solver
 * call, the whole-vehicle bound's SCIP run included (it had a fixed 5 s of its own before).
 */
class LoadingLimitsTest {
    private static LoadPlan load(double seconds, CratePlan crates, List<CrateType> types) {
        LoadPlan plan = new RowLoadPlanner(new RowLoadPlanner.Limits(0.5, seconds, 5)).load(crates, types,
                List.of(BOX_TRUCK));
        LoadPlanValidator.check(plan, crates, types, List.of(BOX_TRUCK));
        return plan;
    }

    @Test
    void aDeadlineThatHasPassedLeavesAValidPlanThatSaysSo() {
        // 10 crates of 700 kg on box trucks of 2.8 t: 3 trips; the fleet LP proves 2.5 trips, whole vehicles 3
        CrateType small = crateType("c", 1000, 800, 800, true, 2000);
        CratePlan crates = plan(small, 10, 700);
        LoadPlan unhurried = load(10, crates, List.of(small));
        assertThat(unhurried.status()).isEqualTo(Status.OPTIMAL);
        assertThat(unhurried.reason()).isNull();

        LoadPlan hurried = load(1e-9, crates, List.of(small));
        assertThat(hurried.vehicles()).hasSize(3);
        // whether SCIP proves the third trip within a millisecond depends on the machine; the plan says which
        assertThat(hurried.status()).isIn(Status.OPTIMAL, Status.FEASIBLE);
        assertThat(hurried.reason()).isEqualTo(hurried.status() == Status.FEASIBLE ? Deadline.STOPPED_BY_TIME_LIMIT
                : null);
    }
}
