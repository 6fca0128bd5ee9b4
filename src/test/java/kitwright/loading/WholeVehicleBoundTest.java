package kitwright.loading;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import kitwright.model.VehicleType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class WholeVehicleBoundTest {
    private static final List<VehicleType> SEMI = List.of(LoadFixtures.SEMI);
    private static final double[] COST = {1000};

    @Test
    @DisplayName("12.5 m crates: floor(13600/12500) * floor(2480/1200) = 2 a semi-trailer, so 6 need 3 trips")
    void sideBySide() {
        CrateClass c = new CrateClass(0, 12_500, 1200, 1000, 500, false, 0, 6);
        assertThat(StackingRules.sideBySide(c, LoadFixtures.SEMI)).isEqualTo(2);
        assertThat(WholeVehicleBound.compute(List.of(c), SEMI, COST)).isCloseTo(3000, within(1e-6));
    }

    @Test
    @DisplayName("36 footprints of 1200 x 800 exceed the 35 a 13600 x 2480 deck holds by area: 2 trips")
    void byArea() {
        CrateClass c = new CrateClass(0, 1200, 800, 1000, 100, false, 0, 36);
        assertThat(StackingRules.sideBySide(c, LoadFixtures.SEMI)).isEqualTo(35);
        assertThat(WholeVehicleBound.compute(List.of(c), SEMI, COST)).isCloseTo(2000, within(1e-6));
        assertThat(FleetCostBound.compute(List.of(c), SEMI, COST)).isCloseTo(36 * 0.96 / 33.728 * 1000,
                within(1e-6));
    }

    @Test
    @DisplayName("crates that fit one way only share two lanes of 13.6 m: 3 of 6.44 m and 4 of 4.62 m need 2 trips")
    void lanes() {
        // widths 1140 and 1120: floor(2480/1120) = 2 lanes; lengths 3 * 6440 + 4 * 4620 = 37800 > 2 * 13600
        // (area alone: 3 * 7.34 + 4 * 5.17 = 42.7 m2 > 33.7 as well, but this pins the lane rule)
        CrateClass a = new CrateClass(0, 6440, 1140, 960, 2900, false, 0, 3);
        CrateClass b = new CrateClass(1, 4620, 1120, 840, 2400, true, 1500, 4);
        assertThat(WholeVehicleBound.compute(List.of(a, b), SEMI, COST)).isCloseTo(2000, within(1e-6));
    }

    @Test
    @DisplayName("lane patterns: 6.44 m and 4.62 m crates fill a 13.6 m lane as 2+0, 1+1 or 0+2 (hand count), so 29 "
            + "and 17 of them need 23 lanes, 12 semi-trailers, where lengths alone allow 10")
    void lanePatterns() {
        List<int[]> patterns = LanePatterns.maximal(new double[] {6440, 4620}, 13_600, 100);
        assertThat(patterns).extracting(p -> p[0] + "+" + p[1]).containsExactlyInAnyOrder("2+0", "1+1", "0+2");
        CrateClass a = new CrateClass(0, 6440, 1140, 960, 2900, false, 0, 29);
        CrateClass b = new CrateClass(1, 4620, 1120, 840, 2400, true, 1500, 17);
        // lanes: 2 x1 + x2 >= 29 and x2 + 2 x3 >= 17 with x1 + x2 + x3 lanes: at least 23 (23 = 29/2 + 17/2 rounded);
        // two lanes a semi-trailer: 11.5, so 12 trips (the payload would allow 8, the lengths 265 300 / 27 200 = 9.75)
        assertThat(WholeVehicleBound.compute(List.of(a, b), SEMI, COST)).isCloseTo(12_000, within(1e-6));
    }

    @Test
    @DisplayName("payload cuts: three crates of 2499, 1568 and 1396 kg on 2800 kg trucks, any two heavier than the "
            + "payload: 3 trucks (Martello & Toth's L2 reasoning), where the summed mass (5463 kg) allows 2")
    void payloadCuts() {
        VehicleType truck = new VehicleType("truck", 6200, 2450, 2400, 2800, 420.0, "fixture");
        List<CrateClass> crates = List.of(new CrateClass(0, 4620, 1120, 840, 2499, true, 1500, 1),
                new CrateClass(1, 4620, 1120, 840, 1568, true, 1500, 1),
                new CrateClass(2, 4620, 1120, 840, 1396, true, 1500, 1));
        assertThat(WholeVehicleBound.compute(crates, List.of(truck), new double[] {420})).isCloseTo(1260,
                within(1e-6));
        assertThat(FleetCostBound.compute(crates, List.of(truck), new double[] {420})).isLessThan(840);
    }

    @Test
    @DisplayName("f_0^lambda is dual feasible (Fekete & Schepers 2001): shares summing to at most 1 keep f sums <= 1, "
            + "on 20,000 random sets")
    void dualFeasibleFunction() {
        java.util.Random random = new java.util.Random(7);
        for (int trial = 0; trial < 20_000; trial++) {
            double lambda = 0.05 + 0.45 * random.nextDouble();
            int n = 1 + random.nextInt(6);
            double[] share = new double[n];
            double sum = 0;
            for (int i = 0; i < n; i++) {
                share[i] = random.nextDouble();
                sum += share[i];
            }
            double scale = sum > 1 ? (1 - 1e-9) / sum : 1;
            double f = 0;
            for (double x : share) {
                f += WholeVehicleBound.dualFeasible(x * scale, lambda);
            }
            assertThat(f).isLessThanOrEqualTo(1 + 1e-9);
        }
        assertThat(WholeVehicleBound.dualFeasible(0.6, 0.4)).isEqualTo(0.6);
        assertThat(WholeVehicleBound.dualFeasible(0.4, 0.4)).isEqualTo(0.4);
        assertThat(WholeVehicleBound.dualFeasible(0.5, 0.5)).isEqualTo(0.5);
        assertThat(WholeVehicleBound.dualFeasible(0.7, 0.4)).isEqualTo(1);
        assertThat(WholeVehicleBound.dualFeasible(0.45, 0.4)).isEqualTo(0.45);
        assertThat(WholeVehicleBound.dualFeasible(0.3, 0.4)).isZero();
    }

    @Test
    @DisplayName("a load the loader accepts (1400.0000005 + 1400 kg on a 2800 kg truck, within its 1e-6 kg tolerance) "
            + "is not cut off: one truck")
    void payloadCutsKeepTheLoadersTolerance() {
        VehicleType truck = new VehicleType("truck", 6200, 2450, 2400, 2800, 420.0, "fixture");
        List<CrateClass> crates = List.of(new CrateClass(0, 1200, 1000, 800, 1400.0000005, true, 1500, 1),
                new CrateClass(1, 1200, 1000, 800, 1400, true, 1500, 1));
        assertThat(WholeVehicleBound.compute(crates, List.of(truck), new double[] {420})).isLessThanOrEqualTo(
                420 + 1e-6);
    }
}
