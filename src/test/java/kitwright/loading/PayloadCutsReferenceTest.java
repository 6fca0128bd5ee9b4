package kitwright.loading;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import kitwright.model.VehicleType;
import org.chocosolver.solver.Model;
import org.chocosolver.solver.Solver;
import org.chocosolver.solver.variables.IntVar;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The whole-vehicle bound against exact bin packing by the Choco solver (a general-purpose CP library, Maven
 * Central org.choco-solver:choco-solver): on a deck so large that only the payload limits a load, the fewest trucks
 * for a set of crate masses is a bin-packing optimum, which the bound must never exceed.
 */
class PayloadCutsReferenceTest {
    private static final int PAYLOAD = 2800;

    @Test
    @DisplayName("on 200 random sets of 1-8 crates of 100-2800 kg the bound never exceeds Choco's bin-packing optimum, "
            + "and meets it on at least 190 (the payload cuts make the difference)")
    void neverAboveTheOptimum() {
        Random random = new Random(11);
        VehicleType truck = new VehicleType("truck", 100_000, 100_000, 100_000, PAYLOAD, 1.0, "fixture");
        int met = 0;
        int sets = 200;
        for (int trial = 0; trial < sets; trial++) {
            int n = 1 + random.nextInt(8);
            int[] mass = new int[n];
            List<CrateClass> crates = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                mass[i] = 100 + random.nextInt(PAYLOAD - 99);
                crates.add(new CrateClass(i, 1000, 1000, 1000, mass[i], false, 0, 1));
            }
            int optimum = binPacking(mass, PAYLOAD);
            double bound = WholeVehicleBound.compute(crates, List.of(truck), new double[] {1});
            assertThat(bound).as("masses %s", java.util.Arrays.toString(mass)).isLessThanOrEqualTo(optimum + 1e-6);
            if (bound >= optimum - 1e-6) {
                met++;
            }
        }
        // measured: 195 of 200 with the payload cuts, 169 without them (the cuts commented out)
        assertThat(met).as("sets where the bound is the optimum").isGreaterThanOrEqualTo(190);
    }

    /** Fewest bins of the capacity for the masses, by Choco (binPacking constraint, minimising the bins used). */
    static int binPacking(int[] mass, int capacity) {
        int n = mass.length;
        Model model = new Model("bins");
        IntVar[] bin = new IntVar[n];
        for (int i = 0; i < n; i++) {
            bin[i] = model.intVar("bin" + i, 0, i); // symmetry: crate i goes into one of the first i + 1 bins
        }
        IntVar[] load = model.intVarArray("load", n, 0, capacity);
        model.binPacking(bin, mass, load, 0).post();
        IntVar used = model.intVar("used", 1, n);
        model.nValues(bin, used).post();
        model.setObjective(Model.MINIMIZE, used);
        Solver solver = model.getSolver();
        int best = n;
        while (solver.solve()) {
            best = used.getValue();
        }
        return best;
    }
}
