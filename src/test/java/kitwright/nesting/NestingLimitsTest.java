package kitwright.nesting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.model.Status;
import kitwright.validate.NestPlanValidator;
import org.junit.jupiter.api.Test;

/**
 * The nesting stage obeys its work limits and its wall-clock limit (one deadline for the stage). The instance is
 * adversarial for the exact enumeration: eight guests of eight lengths that fit three channels of the host's bore at
 * most, so no two layouts are symmetric and every multiset that nearly fills the host is searched to the end.
 */
class NestingLimitsTest {
    /** Host CHS 320 (bore 302, 700 mm usable) and eight guests of 130 mm, 255-262 mm long (invented sizes). */
    private static NestingProblem adversarial() {
        List<Tube> tubes = new ArrayList<>();
        tubes.add(new Tube(0, "H", "S320", 320, 302, 720, 10));
        for (int g = 0; g < 8; g++) {
            tubes.add(new Tube(tubes.size(), "G" + g, "S130", 130, 110, 255 + g, 1));
        }
        return new NestingProblem(tubes, 2.0, 10, null);
    }

    private static long enumerationNodes(NestingProblem problem, long budget, List<List<Pattern>> out) {
        List<TubeType> types = TubeType.of(problem);
        PatternPricing pricing = new PatternPricing(problem, types, 1, 1e9);
        LayoutSearchWork work = new LayoutSearchWork(budget, Deadline.in(600));
        out.add(PatternEnumeration.all(problem, types, pricing, 3000, 8, work));
        return work.nodes();
    }

    @Test
    void theLayoutSearchesStopAtTheirNodeBudgetAndColumnGenerationTakesOver() {
        NestingProblem problem = adversarial();
        List<List<Pattern>> unlimited = new ArrayList<>();
        long full = enumerationNodes(problem, Long.MAX_VALUE, unlimited);
        long budget = 1000;
        // without a budget the searches take more nodes than the budget allows (what they did before)
        assertThat(unlimited.get(0)).isNotNull();
        assertThat(full).isGreaterThan(budget);

        List<List<Pattern>> limited = new ArrayList<>();
        assertThat(enumerationNodes(problem, budget, limited)).isEqualTo(budget + 1);
        assertThat(limited.get(0)).as("an enumeration cut short is no proof").isNull();

        NestResult result = Nester.run(problem, NestingFixtures.worstCase(),
                NestingFixtures.quick().withMaxExactNodes(budget));
        NestPlanValidator.validate(problem, result.plan());
        assertThat(result.plan().status()).isNotEqualTo(Status.INFEASIBLE);
        assertThat(result.limitReason()).as("a work limit, not the clock, ended the enumeration").isNull();
    }

    @Test
    void aDeadlineThatHasPassedLeavesAValidPlanThatSaysSo() {
        NestingProblem problem = adversarial();
        NestResult result = Nester.run(problem, NestingFixtures.worstCase(),
                NestingFixtures.quick().withWallSeconds(1e-9));
        NestPlanValidator.validate(problem, result.plan());
        NestResult unhurried = Nester.run(problem, NestingFixtures.worstCase(), NestingFixtures.quick());
        NestPlanValidator.validate(problem, unhurried.plan());
        // with time, the exact enumeration proves its plan; without, only best-fit decreasing ran, unproven
        assertThat(unhurried.plan().status()).isEqualTo(Status.OPTIMAL);
        assertThat(unhurried.limitReason()).isNull();
        assertThat(result.plan().status()).isEqualTo(Status.FEASIBLE);
        assertThat(result.limitReason()).isEqualTo(Deadline.STOPPED_BY_TIME_LIMIT);
        assertThat(result.statusText()).isEqualTo("FEASIBLE, stopped by the time limit");
        assertThat(result.reason()).as("not INFEASIBLE: the nest command's exit code stays 0").isNull();
    }
}
