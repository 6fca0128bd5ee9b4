package kitwright.nesting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.Variable;

class PatternColumnGenerationTest {

    /** max sum_p (sum_t a_tp) x_p over the given patterns, supply and host rows, by ojAlgo (independent LP). */
    static double referenceLp(List<TubeType> types, List<Pattern> patterns) {
        return referenceLp(types, patterns.stream().map(Pattern::hostType).toList(),
                patterns.stream().map(Pattern::counts).toList());
    }

    static double referenceLp(List<TubeType> types, List<Integer> hostOf, List<TypeCounts> counts) {
        ExpressionsBasedModel model = new ExpressionsBasedModel();
        Variable[] x = new Variable[counts.size()];
        for (int p = 0; p < counts.size(); p++) {
            x[p] = model.addVariable("x" + p).lower(0).weight(counts.get(p).total());
        }
        for (TubeType t : types) {
            Expression supply = model.addExpression("supply" + t.index()).upper(t.count());
            Expression hosts = model.addExpression("hosts" + t.index()).upper(t.count());
            for (int p = 0; p < counts.size(); p++) {
                if (counts.get(p).get(t.index()) > 0) {
                    supply.set(x[p], counts.get(p).get(t.index()));
                }
                if (hostOf.get(p) == t.index()) {
                    hosts.set(x[p], 1);
                }
            }
        }
        Optimisation.Result result = model.maximise();
        assertThat(result.getState().isOptimal()).isTrue();
        return result.getValue();
    }

    @Test
    @DisplayName("GLOP's master LP agrees with ojAlgo's, and the bound covers the LP over every pattern (ojAlgo)")
    void boundAgainstReferenceLp() {
        Random random = new Random(3);
        int checked = 0;
        for (int round = 0; round < 30; round++) {
            NestingProblem problem = PatternNesterTest.random(random, 6 + random.nextInt(10), null);
            List<TubeType> types = TubeType.of(problem);
            PatternPricing pricing = new PatternPricing(problem, types, 1);
            if (pricing.hostTypes().isEmpty()) {
                continue;
            }
            PatternColumnGeneration.Result cg = PatternColumnGeneration.run(problem, types, pricing, 100);
            List<Pattern> all = PatternEnumeration.all(problem, types, pricing, 20000, 12,
                    new LayoutSearchWork(Long.MAX_VALUE, kitwright.cutting.Deadline.in(600)));
            assertThat(all).isNotNull();
            double overGenerated = referenceLp(types, cg.columns().stream().map(Pattern::hostType).toList(),
                    cg.lpCounts());
            double overAll = referenceLp(types, all);
            // Phase 1 stopped with no improving column: its value is the optimum over its columns (ojAlgo agrees),
            // and, rows being a relaxation of every layout, at least the LP over all patterns.
            assertThat(cg.iterations()).isLessThan(100);
            assertThat(cg.phaseOneValue()).isCloseTo(overGenerated, within(1e-6 + 1e-6 * overGenerated));
            assertThat(cg.phaseOneValue()).as("round %d", round).isGreaterThanOrEqualTo(overAll - 1e-6);
            assertThat(cg.nestedUpperBound()).as("round %d", round).isGreaterThanOrEqualTo(overAll - 1e-6);
            checked++;
        }
        assertThat(checked).isGreaterThan(20);
    }
}
