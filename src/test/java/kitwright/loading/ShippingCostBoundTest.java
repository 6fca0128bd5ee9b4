package kitwright.loading;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import kitwright.cli.PackUpstream;
import kitwright.cutting.Deadline;
import kitwright.ids.IdScheme;
import kitwright.io.CrateCatalogReader;
import kitwright.io.KitReader;
import kitwright.io.VehicleCatalogReader;
import kitwright.model.CrateType;
import kitwright.model.JointBox;
import kitwright.model.Kit;
import kitwright.model.VehicleType;
import kitwright.nesting.Bundle;
import kitwright.packing.CratePlan;
import kitwright.packing.CratingDemand;
import kitwright.packing.Fixtures;
import kitwright.packing.LaneCratePacker;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.LoadPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The bound on crate price plus trip cost ({@link ShippingCostBound}): its floor and top-load rows against exact
 * optima, from Choco's bin packing (a general-purpose CP library, Maven Central org.choco-solver:choco-solver) and
 * by hand.
 */
class ShippingCostBoundTest {
    /** The shipped 6300 crate (stock-catalogs/crates.csv): not stackable, 6440 x 1140 outside. */
    private static final CrateType LONG = new CrateType("long", 6300, 1000, 800, 6440, 1140, 960, 210, 3000, false,
            0, 320.0);
    /** The shipped 4500 crate: stackable, top load 1500 kg, 4620 x 1120 x 840 outside. */
    private static final CrateType SHORT = new CrateType("short", 4500, 1000, 700, 4620, 1120, 840, 140, 2500, true,
            1500, 240.0);
    private static final VehicleType SEMI = new VehicleType("semi", 13600, 2480, 2700, 24000, 950, "invented");
    private static final VehicleType BOX = new VehicleType("box", 6200, 2450, 2400, 2800, 420, "invented");

    private static CratingDemand demand(List<Bundle> bundles) {
        return CratingDemand.of(bundles, List.of());
    }

    private static double bound(List<Bundle> bundles, List<CrateType> crates) {
        List<Integer> all = new ArrayList<>();
        for (int t = 0; t < crates.size(); t++) {
            all.add(t);
        }
        return ShippingCostBound.compute(demand(bundles), crates, all, List.of(SEMI, BOX), Deadline.in(60));
    }

    @Test
    @DisplayName("6000 mm bundles of random masses, long crates only: the bound never exceeds the optimum 320 c +"
            + " 950 ceil(c / 4), c Choco's bin-packing optimum (4 long crates side by side on the semi, 2 x 2 by"
            + " hand; none on the box truck), and meets it on most sets; the plan found is validated and never below")
    void floorRowsAgainstChoco() {
        Random random = new Random(14);
        int met = 0;
        int sets = 40;
        for (int trial = 0; trial < sets; trial++) {
            int n = 1 + random.nextInt(14);
            int[] mass = new int[n];
            List<Bundle> bundles = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                mass[i] = 300 + random.nextInt(2491);
                bundles.add(Fixtures.bundle("B" + (i + 1), "M", 6000, 100, mass[i]));
            }
            int crates = PayloadCutsReferenceTest.binPacking(mass, 2790);
            double optimum = 320.0 * crates + 950.0 * Math.ceil(crates / 4.0);
            double bound = bound(bundles, List.of(LONG));
            assertThat(bound).as("masses %s", java.util.Arrays.toString(mass)).isLessThanOrEqualTo(optimum + 1e-6);
            if (bound >= optimum - 1e-6) {
                met++;
            }
            if (trial < 6) {
                Shipping.Shipment s = Shipping.plan(bundles, List.of(), new Shipping.Setting(List.of(LONG),
                        List.of(SEMI, BOX), JointBox.DEFAULT, IdScheme.FIRST_CHOICE, 30));
                CratePlanValidator.check(s.crates(), bundles, List.of(), List.of(LONG), JointBox.DEFAULT);
                LoadPlanValidator.check(s.loads(), s.crates(), List.of(LONG), List.of(SEMI, BOX));
                assertThat(s.loads().totalCost()).isGreaterThanOrEqualTo(optimum - 1e-6);
                assertThat(s.loads().totalLowerBound()).isLessThanOrEqualTo(optimum + 1e-6);
            }
        }
        // measured: 29 of 40 (the rest are bin-packing gaps the mass rows do not see)
        assertThat(met).as("sets where the bound is the optimum").isGreaterThanOrEqualTo(27);
    }

    @Test
    @DisplayName("five long crates' worth of mass needs two semi-trailers: 5 x 320 + 2 x 950 = 3500 (by hand: at most"
            + " 2 x 2 long crates on a semi's floor, none on the box truck), and the bound says so")
    void fiveLongCratesTakeTwoTrips() {
        // 10 bundles of 1300 kg: two per crate (2790 kg net), five crates
        double bound = bound(Fixtures.bundles(10, 6000, 100, 1300), List.of(LONG));
        assertThat(bound).isCloseTo(3500, within(1e-3));
    }

    @Test
    @DisplayName("16 bundles of 1000 kg in stackable 4500 crates: a crate under another carries at most 1500 kg, so"
            + " full crates (two bundles, 2140 kg) stay on the floor, 4 per semi; the optimum is 8 crates on 2 semis,"
            + " 3820 (by hand); the bound without the top-load rows allows 7 crates on one semi (2630), with them at"
            + " least 3110 (4 floor crates of 2360 kg and 5 upper ones of 1360 kg contents on one semi) and no more"
            + " than 3820")
    void topLoadKeepsHeavyCratesOnTheFloor() {
        double bound = bound(Fixtures.bundles(16, 4000, 100, 1000), List.of(SHORT));
        assertThat(bound).isGreaterThanOrEqualTo(3110 - 1e-3).isLessThanOrEqualTo(3820 + 1e-3);
    }

    @Test
    @DisplayName("cinema-20 with the shipped catalogs: no plan of at most 2 crates costs less than 1510 (by hand: its"
            + " 4764 kg exceed the net of two crates up to 4500 (2 x 2360) and of a 6300 with a 2100 or 3300 (at most"
            + " 4195), so a 6300 rides and only the semi-trailer or the 40 ft container take it: 320 + 240 + 950),"
            + " so 1500 with 3 crates beats every 2-crate plan")
    void cinemaTwentyTwoCratesCostMore() throws Exception {
        Kit kit = KitReader.read(Path.of("sample-kits", "cinema-20"));
        List<Bundle> bundles = PackUpstream.STAGES.bundles(kit).plan().bundles();
        List<CrateType> crates = CrateCatalogReader.read(Path.of("stock-catalogs", "crates.csv"));
        List<VehicleType> vehicles = VehicleCatalogReader.read(Path.of("stock-catalogs", "vehicles.csv"));
        CratePlan plan = new LaneCratePacker().pack(bundles, kit.joints(), crates, JointBox.DEFAULT);
        CratePlanValidator.check(plan, bundles, kit.joints(), crates, JointBox.DEFAULT);
        CratingDemand demand = CratingDemand.of(bundles, plan.boxes());
        assertThat(demand.massKg()).isGreaterThan(2 * 2360.0).isGreaterThan(2790.0 + 1405.0);
        double twoCrates = ShippingCostBound.compute(demand, crates, List.of(0, 1, 2, 3), vehicles, Deadline.in(60), 2);
        assertThat(twoCrates).isGreaterThanOrEqualTo(1510 - 1e-3);
    }
}
