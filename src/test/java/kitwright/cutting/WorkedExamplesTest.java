package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Origin;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Published cutting-stock examples, solved without kerf or trim and with a price of 1 per roll. */
class WorkedExamplesTest {

    static SectionProblem rolls(double rollLength, double[] widths, int[] demand) {
        List<Demand> demands = new ArrayList<>();
        for (int i = 0; i < widths.length; i++) {
            demands.add(new Demand("W" + (int) widths[i], widths[i], demand[i]));
        }
        return new SectionProblem("rolls", demands, List.of(new StockOption(rollLength, 1.0, null, Origin.MILL)),
                0, 0, 0, SearchLimits.defaults(60));
    }

    static SectionProblem chvatalProblem() {
        return rolls(100, new double[] {45, 36, 31, 14}, new int[] {97, 610, 395, 211});
    }

    static SectionProblem encyclopediaProblem() {
        return rolls(5600,
                new double[] {1380, 1520, 1560, 1710, 1820, 1880, 1930, 2000, 2050, 2100, 2140, 2150, 2200},
                new int[] {22, 25, 12, 14, 18, 18, 20, 10, 12, 14, 16, 18, 20});
    }

    @Test
    @DisplayName("Chvátal (1983), Linear Programming, ch. 13: LP 452.25 rolls, optimum 453 proven")
    void chvatal() {
        SectionProblem problem = chvatalProblem();
        CuttingStockOptimizer.Outcome outcome = new CuttingStockOptimizer().optimize(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, outcome.plan());
        assertThat(outcome.linearBound()).isCloseTo(452.25, within(452.25 * 1e-6)); // Chvátal 1983, ch. 13
        assertThat(outcome.plan().value()).isEqualTo(453.0); // Chvátal 1983, ch. 13
        assertThat(outcome.plan().status()).isEqualTo(Status.OPTIMAL);
        assertThat(outcome.plan().stockPieces()).isEqualTo(453);
    }

    @Test
    @DisplayName("Encyclopedia 'Cutting stock problem' 5600 mm rolls: LP 72.9167, optimum 73 proven")
    void encyclopedia() {
        SectionProblem problem = encyclopediaProblem();
        CuttingStockOptimizer.Outcome outcome = new CuttingStockOptimizer().optimize(problem, CutProgress.NONE);
        CutPlanValidator.validate(problem, outcome.plan());
        assertThat(outcome.linearBound()).isCloseTo(72.9167, within(1e-4)); // encyclopedia article, LP 72.9167
        assertThat(outcome.plan().value()).isEqualTo(73.0); // encyclopedia article, optimum 73
        assertThat(outcome.plan().status()).isEqualTo(Status.OPTIMAL);
    }
}
