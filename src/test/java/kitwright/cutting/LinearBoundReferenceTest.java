package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.Variable;

/**
 * The column-generation bound against an independent linear programme: every maximal pattern of every stock
 * length enumerated from the millimetre data, solved by ojAlgo (ExpressionsBasedModel), the reference LP library.
 */
class LinearBoundReferenceTest {

    @Test
    void columnGenerationBoundEqualsOjAlgoLinearProgrammeOnRandomSections() {
        int compared = 0;
        for (long seed = 1; compared < 24; seed++) {
            SectionProblem problem = TestSections.random(seed, 40);
            Double reference = referenceLinearProgramme(problem);
            CuttingStockOptimizer.Outcome outcome = new CuttingStockOptimizer().optimize(problem, CutProgress.NONE);
            CutPlanValidator.validate(problem, outcome.plan());
            if (reference == null) {
                continue; // the LP has no solution: limited stock, checked elsewhere
            }
            double bound = Double.isNaN(outcome.linearBound()) ? columnGeneration(problem) : outcome.linearBound();
            assertThat(bound).as("seed %d: LP bound vs ojAlgo", seed) // ojAlgo reference LP
                    .isCloseTo(reference, within(1e-6 * Math.max(1, Math.abs(reference))));
            assertThat(outcome.plan().lowerBound()).isGreaterThanOrEqualTo(reference - 1e-6 * Math.abs(reference));
            compared++;
        }
        assertThat(compared).isGreaterThanOrEqualTo(20);
    }

    /** The relaxation by column generation alone (when first-fit decreasing was already proven optimal). */
    static double columnGeneration(SectionProblem problem) {
        IntegerInstance instance = new IntegerInstance(problem);
        try (ColumnGeneration generation = new ColumnGeneration(instance, 10_000, Deadline.in(60))) {
            ColumnGeneration.Relaxation relaxation = generation.solve(instance.demands(), instance.limits());
            assertThat(relaxation.kind()).isEqualTo(ColumnGeneration.Kind.OPTIMAL);
            return relaxation.value() / instance.scale;
        }
    }

    /**
     * min sum_p c_k(p) x_p  s.t.  sum_p a_ip x_p >= d_i,  sum_{p of k} x_p <= available_k,  x >= 0, over all
     * maximal patterns with a_i <= d_i; null when infeasible.
     */
    static Double referenceLinearProgramme(SectionProblem problem) {
        boolean cost = problem.objective().equals("cost");
        List<Demand> demands = problem.demands();
        ExpressionsBasedModel model = new ExpressionsBasedModel();
        List<Expression> rows = new ArrayList<>();
        for (Demand d : demands) {
            rows.add(model.addExpression("demand " + d.mark()).lower(d.quantity()));
        }
        int column = 0;
        for (StockOption s : problem.stock()) {
            double capacity = s.lengthMm() - 2 * problem.trimMm() + problem.kerfMm();
            Expression limit = s.available() == null ? null
                    : model.addExpression("available " + s.lengthMm()).upper(s.available());
            double price = cost ? (s.price() == null ? 0 : s.price()) : s.lengthMm();
            for (int[] pattern : maximalPatterns(demands, capacity, problem.kerfMm())) {
                Variable x = model.addVariable("x" + column++).lower(0).weight(price);
                for (int i = 0; i < pattern.length; i++) {
                    if (pattern[i] > 0) {
                        rows.get(i).set(x, pattern[i]);
                    }
                }
                if (limit != null) {
                    limit.set(x, 1);
                }
            }
        }
        Optimisation.Result result = model.minimise();
        return result.getState().isOptimal() ? result.getValue() : null;
    }

    /** Patterns with sum(length + kerf) <= capacity, a_i <= d_i, to which no further piece can be added. */
    static List<int[]> maximalPatterns(List<Demand> demands, double capacity, double kerf) {
        List<int[]> out = new ArrayList<>();
        enumerate(demands, capacity, kerf, 0, new int[demands.size()], 0, out);
        return out;
    }

    private static void enumerate(List<Demand> demands, double capacity, double kerf, int index, int[] counts,
                                  double used, List<int[]> out) {
        if (index == demands.size()) {
            boolean maximal = true;
            boolean empty = true;
            for (int i = 0; i < counts.length; i++) {
                empty &= counts[i] == 0;
                if (counts[i] < demands.get(i).quantity()
                        && used + demands.get(i).lengthMm() + kerf <= capacity + 1e-9) {
                    maximal = false;
                }
            }
            if (maximal && !empty) {
                out.add(counts.clone());
            }
            return;
        }
        double size = demands.get(index).lengthMm() + kerf;
        for (int c = 0; c <= demands.get(index).quantity() && used + c * size <= capacity + 1e-9; c++) {
            counts[index] = c;
            enumerate(demands, capacity, kerf, index + 1, counts, used + c * size, out);
        }
        counts[index] = 0;
    }
}
