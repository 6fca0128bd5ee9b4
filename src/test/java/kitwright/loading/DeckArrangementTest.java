package kitwright.loading;

import static kitwright.loading.LoadFixtures.crateType;
import static kitwright.loading.LoadFixtures.join;
import static kitwright.loading.LoadFixtures.plan;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import kitwright.model.AxleGeometry;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.model.VehicleType;
import kitwright.packing.CratePlan;
import kitwright.validate.LoadPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Balance, axle loads and loading order of an arranged deck ({@link DeckArrangement}). */
class DeckArrangementTest {
    private static final RowLoadPlanner PLANNER = new RowLoadPlanner(new RowLoadPlanner.Limits(0.5, 10, 5));

    private static LoadPlan load(CratePlan crates, List<CrateType> types, VehicleType vehicle) {
        LoadPlan plan = PLANNER.load(crates, types, List.of(vehicle));
        LoadPlanValidator.check(plan, crates, types, List.of(vehicle));
        return plan;
    }

    /** An invented rigid truck: front axle 1000 mm ahead of the deck, rear axle 4000 mm behind its front. */
    private static VehicleType truck(double maxFront, double maxRear, Double minFront) {
        return new VehicleType("truck", 6000, 2400, 2400, 3000, 400, "invented",
                new AxleGeometry(-1000, 4000, 2000, 1000, maxFront, maxRear, minFront), null);
    }

    @Test
    @DisplayName("lever rule, a load on a beam on two supports (Meriam & Kraige, Engineering Mechanics: Statics,"
            + " equilibrium of a simply supported beam, from memory; figures worked by hand): 1000 kg centred 1300 mm"
            + " behind the deck front, supports at -1000 and 4000 mm: 1000 x 2300 / 5000 = 460 kg on the rear, 540 kg"
            + " on the front, plus the unladen 2000 / 1000 kg")
    void leverRule() {
        // 2600 mm long: too long to turn across the 2400 mm deck
        CrateType c = crateType("c", 2600, 1000, 1000, false, 0);
        VehicleLoad v = load(plan(c, 1, 1000), List.of(c), truck(3000, 5000, null)).vehicles().get(0);
        assertThat(v.crates().get(0).xMm()).isEqualTo(0.0);
        assertThat(v.axleLoadsKg().front()).isCloseTo(2540, within(1e-6));
        assertThat(v.axleLoadsKg().rear()).isCloseTo(1460, within(1e-6));
    }

    @Test
    @DisplayName("a front limit the headboard position breaks: the load moves back by the least distance that keeps"
            + " it, 2000 + 1000 (2700 - s) / 5000 <= 2500 gives s = 200 mm (by hand)")
    void movesBackForTheFrontAxle() {
        CrateType c = crateType("c", 2600, 1000, 1000, false, 0);
        VehicleLoad v = load(plan(c, 1, 1000), List.of(c), truck(2500, 5000, null)).vehicles().get(0);
        assertThat(v.crates().get(0).xMm()).isCloseTo(200, within(1e-6));
        assertThat(v.axleLoadsKg().front()).isCloseTo(2500, within(1e-6));
        assertThat(v.axleLoadsKg().rear()).isCloseTo(1500, within(1e-6));
    }

    @Test
    @DisplayName("no place keeps the limits: INFEASIBLE, naming the front axle limit")
    void namesTheLimit() {
        CrateType c = crateType("c", 5800, 1000, 1000, false, 0);
        LoadPlan plan = PLANNER.load(plan(c, 1, 2900), List.of(c), List.of(truck(2500, 5000, null)));
        assertThat(plan.status()).isEqualTo(Status.INFEASIBLE);
        assertThat(plan.reason()).contains("front axle load").contains("2500 kg limit");
    }

    @Test
    @DisplayName("a least steer-axle load no position keeps is named too: 2000 + 2900 x 1100 / 5000 = 2638 kg at the"
            + " headboard, below 2700 (by hand)")
    void namesTheLeastFrontLoad() {
        CrateType c = crateType("c", 5800, 1000, 1000, false, 0);
        LoadPlan plan = PLANNER.load(plan(c, 1, 2900), List.of(c), List.of(truck(9000, 9000, 2700.0)));
        assertThat(plan.status()).isEqualTo(Status.INFEASIBLE);
        assertThat(plan.reason()).contains("front axle load would be 2638 kg").contains("least 2700 kg");
    }

    @Test
    @DisplayName("lateral centre by hand: a single crate 1000 wide on a 2400 deck is centred (offset 0), not against"
            + " a side wall (700 mm off)")
    void singleCrateCentred() {
        CrateType c = crateType("c", 2600, 1000, 1000, false, 0);
        VehicleLoad v = load(plan(c, 1, 1000), List.of(c), truck(9000, 9000, null)).vehicles().get(0);
        assertThat(v.crates().get(0).yMm()).isCloseTo(700, within(1e-6));
        assertThat(v.lateralCentreOfGravityMm()).isCloseTo(0, within(1e-6));
    }

    @Test
    @DisplayName("lateral centre by hand: 1000 kg 1200 wide beside 200 kg 1200 wide fill a 2400 deck's width: centre"
            + " (1000 x 600 + 200 x 1800) / 1200 - 1200 = -400 mm, beyond 10 % (240 mm), and the plan says why")
    void fullWidthRowExplained() {
        CrateType heavy = crateType("h", 2600, 1200, 1000, false, 0);
        CrateType light = crateType("l", 2500, 1200, 1000, false, 0);
        CratePlan crates = join(plan(heavy, 1, 1000), plan(light, 1, 200));
        VehicleLoad v = load(crates, List.of(heavy, light), truck(9000, 9000, null)).vehicles().get(0);
        assertThat(Math.abs(v.lateralCentreOfGravityMm())).isCloseTo(400, within(1e-6));
        assertThat(v.balanceNote()).contains("10 %");
    }

    @Test
    @DisplayName("without axle geometry no axle loads are claimed")
    void notChecked() {
        CrateType c = crateType("c", 2000, 1000, 1000, false, 0);
        VehicleType plain = new VehicleType("plain", 6000, 2400, 2400, 3000, 400, "invented");
        assertThat(load(plan(c, 1, 1000), List.of(c), plain).vehicles().get(0).axleLoadsKg()).isNull();
    }

    @Test
    @DisplayName("door opening: three 800 mm crates stack to 2400 under a 2400 roof but only two under a 2261 door"
            + " (ISO 1496-1 minimum door height, from memory)")
    void doorOpening() {
        CrateType c = crateType("c", 1000, 1000, 800, true, 5000);
        VehicleType open = new VehicleType("open", 1000, 1000, 2400, 9000, 400, "invented");
        VehicleType door = new VehicleType("door", 1000, 1000, 2400, 9000, 400, "invented", null, 2261.0);
        assertThat(load(plan(c, 3, 100), List.of(c), open).vehicles()).hasSize(1);
        assertThat(load(plan(c, 3, 100), List.of(c), door).vehicles()).hasSize(2);
    }

    @Test
    @DisplayName("loading order: the crate holding joint boxes goes to the doors (loaded last, unloaded first) though"
            + " it is the heaviest; the others heaviest forward; every crate in its own row (2600 x 1300 on a 2400"
            + " deck)")
    void jointsComeOffFirst() {
        CrateType c = crateType("c", 2600, 1300, 1000, false, 0);
        List<kitwright.packing.Crate> crates = new java.util.ArrayList<>();
        double[] gross = {2000, 1500, 1000};
        for (int i = 0; i < 3; i++) {
            List<kitwright.packing.CrateItem> items = i == 0 ? List.of(new kitwright.packing.CrateItem(
                    kitwright.packing.ItemKind.BOX, "BOX-1", 0, 0, 0, 600, 400, 300, 20)) : List.of();
            crates.add(new kitwright.packing.Crate("C" + (i + 1), "c", 2550, 1250, 950, 2600, 1300, 1000, 40, 5000,
                    gross[i], items));
        }
        CratePlan plan = new CratePlan(Status.FEASIBLE, 1, crates, List.of(), null, null);
        VehicleType deck = new VehicleType("deck", 9000, 2400, 2400, 9000, 400, "invented");
        VehicleLoad v = load(plan, List.of(c), deck).vehicles().get(0);
        assertThat(v.crates()).extracting(kitwright.loading.PlacedCrate::ref).containsExactly("C2", "C3", "C1");
        assertThat(v.crates().get(0).xMm()).isLessThan(v.crates().get(1).xMm());
        assertThat(v.crates().get(1).xMm()).isLessThan(v.crates().get(2).xMm());
    }
}
