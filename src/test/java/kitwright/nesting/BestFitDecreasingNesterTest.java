package kitwright.nesting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.model.NestTolerance;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class BestFitDecreasingNesterTest {

    private static NestPlan plan(NestingProblem problem) {
        NestingSolution s = new BestFitDecreasingNester().solve(problem);
        return NestPlanAssembler.assemble(problem, s, NestTolerance.NOMINAL);
    }

    @Test
    @DisplayName("Two short guests lie end to end in one host, each within the end allowances")
    void endToEnd() {
        List<Tube> tubes = List.of(
                NestingFixtures.tube(0, "H", 88.9, 82.5, 6000, 40),
                NestingFixtures.tube(1, "G", 76.1, 69.7, 2990, 17),
                NestingFixtures.tube(2, "G", 76.1, 69.7, 2990, 17));
        NestingProblem problem = new NestingProblem(tubes, 2, 10, null);
        NestPlan plan = plan(problem);
        NestPlanValidator.validate(problem, plan);
        assertThat(plan.bundles()).hasSize(1);
        assertThat(plan.bundles().get(0).host().guests()).extracting(NestedTube::offsetMm)
                .containsExactly(10.0, 3000.0);
    }

    @Test
    @DisplayName("A guest one millimetre too long for the host less its end allowances stays out")
    void endAllowanceRespected() {
        List<Tube> tubes = List.of(
                NestingFixtures.tube(0, "H", 88.9, 82.5, 3000, 20),
                NestingFixtures.tube(1, "G", 76.1, 69.7, 2981, 17));
        NestingProblem problem = new NestingProblem(tubes, 2, 10, null);
        NestPlan plan = plan(problem);
        NestPlanValidator.validate(problem, plan);
        assertThat(plan.bundles()).hasSize(2);
    }

    @Test
    @DisplayName("The narrowest bore that fits is taken first, keeping the wide bore for the guest only it can take")
    void bestFitKeepsWideBoresFree() {
        List<Tube> tubes = List.of(
                NestingFixtures.tube(0, "P", 88.9, 82.5, 3000, 20),
                NestingFixtures.tube(1, "Q", 82.0, 75.0, 2960, 18),
                NestingFixtures.tube(2, "X", 60.3, 53.9, 2900, 9),
                NestingFixtures.tube(3, "Y", 48.3, 41.9, 2950, 7));
        NestingProblem problem = new NestingProblem(tubes, 2, 10, null);
        NestPlan plan = plan(problem);
        NestPlanValidator.validate(problem, plan);
        // X fits both bores; Y is too long for Q. X into P would leave Y out (3 bundles).
        assertThat(plan.bundles()).hasSize(2);
        assertThat(plan.bundles()).extracting(b -> b.host().mark() + ">" + b.host().guests().get(0).mark())
                .containsExactly("P>Y", "Q>X");
    }
}
