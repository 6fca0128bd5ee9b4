package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Status;
import kitwright.validate.CutPlanValidator;
import org.chocosolver.solver.Model;
import org.chocosolver.solver.Solution;
import org.chocosolver.solver.Solver;
import org.chocosolver.solver.variables.IntVar;
import org.junit.jupiter.api.Test;

/**
 * The optimiser's optimum against an independent exact solve: a bin-assignment model with a stock type per bin,
 * solved by the Choco constraint solver (the reference CP library), on small random sections.
 */
class ExactReferenceTest {

    @Test
    void optimumAgreesWithChocoOnFiftySmallSections() {
        int compared = 0;
        for (long seed = 100; compared < 50; seed++) {
            SectionProblem problem = TestSections.random(seed, 8);
            SectionCutPlan plan = new CuttingStockOptimizer().solve(problem, CutProgress.NONE);
            CutPlanValidator.validate(problem, plan);
            Double reference = chocoOptimum(problem);
            if (reference == null) {
                assertThat(plan.status()).as("seed %d: Choco finds no plan", seed).isEqualTo(Status.INFEASIBLE);
            } else {
                // Choco solver optimum (reference exact solve)
                assertThat(plan.value()).as("seed %d: value vs Choco", seed).isEqualTo(reference);
                assertThat(plan.status()).as("seed %d: proven", seed).isEqualTo(Status.OPTIMAL);
            }
            compared++;
        }
    }

    /**
     * Pieces j go to bins b (bin_j &lt;= j breaks the symmetry of bin names, bars of one mark fill bins in
     * order); each bin b takes a stock type or none (an empty bin takes none); load_b &lt;= capacity(type_b);
     * at most available_k bins of a limited type; minimise the sum of the bins' prices (or stock lengths).
     * Lengths, kerf, trim and prices are read as exact hundredths (the test data has no finer decimal; a finer one
     * throws), independent of the optimiser's own scaling.
     */
    static Double chocoOptimum(SectionProblem problem) {
        boolean cost = problem.objective().equals("cost");
        List<Integer> sizes = new ArrayList<>();
        List<Boolean> sameAsPrevious = new ArrayList<>();
        List<Demand> longestFirst = new ArrayList<>(problem.demands());
        longestFirst.sort((a, b) -> Double.compare(b.lengthMm(), a.lengthMm()));
        for (Demand d : longestFirst) {
            for (int n = 0; n < d.quantity(); n++) {
                sizes.add(hundredths(d.lengthMm()) + hundredths(problem.kerfMm()));
                sameAsPrevious.add(n > 0);
            }
        }
        List<StockOption> stock = problem.stock();
        int types = stock.size();
        int[] capacity = new int[types + 1]; // the last type is "no stock": capacity 0, cost 0
        int[] price = new int[types + 1];
        for (int k = 0; k < types; k++) {
            StockOption s = stock.get(k);
            capacity[k] = hundredths(s.lengthMm()) - 2 * hundredths(problem.trimMm()) + hundredths(problem.kerfMm());
            price[k] = hundredths(cost ? (s.price() == null ? 0 : s.price()) : s.lengthMm());
        }
        int n = sizes.size();
        Model model = new Model("cutting");
        IntVar[] bin = new IntVar[n];
        for (int j = 0; j < n; j++) {
            bin[j] = model.intVar("bin" + j, 0, j);
        }
        for (int j = 1; j < n; j++) {
            if (sameAsPrevious.get(j)) {
                model.arithm(bin[j - 1], "<=", bin[j]).post(); // bars of one mark are interchangeable
            }
        }
        int maxCapacity = java.util.Arrays.stream(capacity).max().orElse(0);
        IntVar[] load = model.intVarArray("load", n, 0, maxCapacity);
        model.binPacking(bin, sizes.stream().mapToInt(Integer::intValue).toArray(), load, 0).post();
        IntVar[] type = model.intVarArray("type", n, 0, types);
        IntVar[] binCost = new IntVar[n];
        for (int b = 0; b < n; b++) {
            IntVar binCapacity = model.intVar("capacity" + b, 0, maxCapacity);
            model.element(binCapacity, capacity, type[b], 0).post();
            model.arithm(load[b], "<=", binCapacity).post();
            model.ifThen(model.arithm(load[b], "=", 0), model.arithm(type[b], "=", types)); // empty: no stock
            binCost[b] = model.intVar("cost" + b, 0, java.util.Arrays.stream(price).max().orElse(0));
            model.element(binCost[b], price, type[b], 0).post();
        }
        for (int k = 0; k < types; k++) {
            if (stock.get(k).available() != null) {
                model.count(k, type, model.intVar("used" + k, 0, stock.get(k).available())).post();
            }
        }
        IntVar total = model.intVar("total", 0, n * java.util.Arrays.stream(price).max().orElse(0));
        model.sum(binCost, "=", total).post();
        Solver solver = model.getSolver();
        Solution best = solver.findOptimalSolution(total, Model.MINIMIZE);
        return best == null ? null : best.getIntVal(total) / 100.0;
    }

    /** A figure in exact hundredths of its unit, from its shortest decimal form. */
    static int hundredths(double value) {
        return java.math.BigDecimal.valueOf(value).movePointRight(2).intValueExact();
    }
}
