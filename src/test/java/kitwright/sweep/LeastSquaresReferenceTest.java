package kitwright.sweep;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.TreeMap;
import org.chocosolver.solver.Model;
import org.chocosolver.solver.Solution;
import org.chocosolver.solver.Solver;
import org.chocosolver.solver.variables.IntVar;
import org.junit.jupiter.api.Test;

/**
 * The least-squares part against the Choco constraint solver (the reference CP library): k marks as integer
 * variables, each member assigned to one of them, every change within D, the sum of squared changes minimised and
 * proven optimal. Without a binding D this is 1D k-means on the tenths grid (Wang and Song 2011 solve its
 * continuous form by the same programme); with the least D it is the sweep's tie-break.
 */
class LeastSquaresReferenceTest {

    @Test
    void squaredChangesMatchChocoOnRandomSections() {
        Random random = new Random(20261203);
        for (int round = 0; round < 60; round++) {
            int n = 2 + random.nextInt(6);
            List<Long> xs = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                xs.add(15_000L + random.nextInt(40));
            }
            SectionLengths section = section(xs);
            int distinct = section.lengths().size();
            for (int k = 1; k <= Math.min(3, distinct); k++) {
                long least = LeastLargestChange.of(List.of(section.values()), k);
                for (long change : new long[] {least, least + 3, 1_000}) {
                    long ours = LeastSquaresGroups.solve(section, change, k).cost(k);
                    // Choco solver optimum (reference exact solve)
                    assertThat(ours).as("xs=%s k=%d D=%d", xs, k, change).isEqualTo(choco(xs, k, change));
                }
            }
        }
    }

    private static SectionLengths section(List<Long> xs) {
        TreeMap<Long, Integer> counts = new TreeMap<>();
        xs.forEach(x -> counts.merge(x, 1, Integer::sum));
        return new SectionLengths("S", counts.entrySet().stream()
                .map(e -> new SectionLengths.Length(e.getKey(), e.getValue())).toList());
    }

    /** The least Σ (x - mark)² with k marks, every |x - mark| ≤ change, by Choco; marks need not be distinct. */
    private static long choco(List<Long> xs, int k, long change) {
        long lo = xs.stream().mapToLong(x -> x).min().orElseThrow();
        long hi = xs.stream().mapToLong(x -> x).max().orElseThrow();
        Model model = new Model("least squares");
        IntVar[] marks = model.intVarArray("mark", k, 0, (int) (hi - lo));
        for (int g = 1; g < k; g++) {
            model.arithm(marks[g - 1], "<=", marks[g]).post();
        }
        IntVar[] squares = new IntVar[xs.size()];
        for (int i = 0; i < xs.size(); i++) {
            int x = (int) (xs.get(i) - lo);
            IntVar which = model.intVar("g" + i, 0, k - 1);
            IntVar mark = model.intVar("m" + i, 0, (int) (hi - lo));
            model.element(mark, marks, which, 0).post();
            IntVar delta = model.intVar("d" + i, (int) -change, (int) change);
            model.arithm(delta, "=", mark, "-", x).post();
            squares[i] = model.intVar("q" + i, 0, (int) (change * change));
            model.times(delta, delta, squares[i]).post();
        }
        IntVar total = model.intVar("total", 0, Integer.MAX_VALUE / 4);
        model.sum(squares, "=", total).post();
        model.setObjective(Model.MINIMIZE, total);
        Solver solver = model.getSolver();
        Solution best = new Solution(model);
        while (solver.solve()) {
            best.record();
        }
        return best.getIntVal(total);
    }
}
