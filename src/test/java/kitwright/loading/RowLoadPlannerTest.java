package kitwright.loading;

import static kitwright.loading.LoadFixtures.BOX_TRUCK;
import static kitwright.loading.LoadFixtures.SEMI;
import static kitwright.loading.LoadFixtures.crateType;
import static kitwright.loading.LoadFixtures.plan;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.model.VehicleType;
import kitwright.packing.CratePlan;
import kitwright.validate.LoadPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class RowLoadPlannerTest {
    private static final RowLoadPlanner PLANNER = new RowLoadPlanner(new RowLoadPlanner.Limits(0.5, 10, 5));

    private static LoadPlan load(CratePlan crates, List<CrateType> types, List<VehicleType> vehicles) {
        LoadPlan plan = PLANNER.load(crates, types, vehicles);
        LoadPlanValidator.check(plan, crates, types, vehicles);
        return plan;
    }

    @Test
    @DisplayName("pallet-base crates 1200 x 800 (ISO 6780) on 13600 x 2480: 3 x 11 = 33 lengthwise, 2 x 17 = 34 "
            + "turned; the planner reaches 34, turning crates (hand count)")
    void palletFootprintsOnASemiTrailer() {
        CrateType pallet = crateType("pallet crate", 1200, 800, 1000, false, 0);
        LoadPlan plan = load(plan(pallet, 34, 300), List.of(pallet), List.of(SEMI));
        assertThat(plan.vehicles()).hasSize(1);
        assertThat(plan.vehicles().get(0).crates()).anySatisfy(c -> assertThat(c.rotated()).isTrue());
        assertThat(load(plan(pallet, 35, 300), List.of(pallet), List.of(SEMI)).vehicles()).hasSize(2);
    }

    @Test
    @DisplayName("stackable crates go two high within the deck height; not stackable, or top load too small, one")
    void stacking() {
        // 6200 x 2450 floor: 1200 x 800 lengthwise 3 across (2400 <= 2450) x floor(6200/1200) = 5 rows = 15
        // stacks, turned only 2 x floor(6200/800) = 14; two high (2000 <= 2400 mm): 30 crates (hand count)
        CrateType stackable = crateType("s", 1200, 800, 1000, true, 1000);
        VehicleType truck = new VehicleType("truck", 6200, 2450, 2400, 10_000, 400, "invented");
        assertThat(load(plan(stackable, 30, 300), List.of(stackable), List.of(truck)).vehicles()).hasSize(1);
        assertThat(load(plan(stackable, 31, 300), List.of(stackable), List.of(truck)).vehicles()).hasSize(2);
        CrateType flat = crateType("f", 1200, 800, 1000, false, 0);
        assertThat(load(plan(flat, 30, 300), List.of(flat), List.of(truck)).vehicles()).hasSize(2);
        CrateType weak = crateType("w", 1200, 800, 1000, true, 250);
        assertThat(load(plan(weak, 30, 300), List.of(weak), List.of(truck)).vehicles()).hasSize(2);
    }

    @Test
    @DisplayName("payload holds: 10 crates of 700 kg need 3 box trucks of 2.8 t")
    void payload() {
        CrateType small = crateType("c", 1000, 800, 800, true, 2000);
        LoadPlan plan = load(plan(small, 10, 700), List.of(small), List.of(BOX_TRUCK));
        assertThat(plan.vehicles()).hasSize(3);
        assertThat(plan.vehicles()).allSatisfy(v -> assertThat(v.massKg()).isLessThanOrEqualTo(2800));
        // fleet relaxation: 7000 kg / 2800 kg = 2.5 trips x 400 = 1000; whole vehicles: 3 trips = 1200, the plan
        assertThat(plan.bounds().fleetRelaxation()).isCloseTo(1000, within(1e-6));
        assertThat(plan.lowerBound()).isCloseTo(1200, within(1e-6));
        assertThat(plan.status()).isEqualTo(Status.OPTIMAL);
    }

    @Test
    @DisplayName("the cheapest vehicle mix: a small load takes the box truck, not the semi-trailer")
    void cheapestMix() {
        CrateType small = crateType("c", 1000, 800, 800, true, 2000);
        LoadPlan plan = load(plan(small, 3, 500), List.of(small), LoadFixtures.FLEET);
        assertThat(plan.vehicles()).extracting(VehicleLoad::type).containsExactly(BOX_TRUCK.name());
        assertThat(plan.status()).isEqualTo(Status.OPTIMAL);
        // 40 crates of 500 kg (20 t): one semi-trailer (1000; 3 across x 13 rows x 3 high = 117 places, 24 t) beats
        // 8 box trucks (3200). Nothing cheaper carries them: two box trucks (800) take 5.6 t, a 20 ft container
        // (900) 2 x 7 x 2 = 28 crates turned, and any other mix costs 1000 or more (hand count)
        LoadPlan big = load(plan(small, 40, 500), List.of(small), LoadFixtures.FLEET);
        assertThat(big.tripCost()).isEqualTo(1000.0);
        assertThat(big.vehicles()).extracting(VehicleLoad::type).containsExactly(SEMI.name());
    }

    @Test
    @DisplayName("centre of gravity from the front: two equal crates end to end balance at the middle")
    void centreOfGravity() {
        CrateType longCrate = crateType("long", 6000, 1200, 800, false, 0);
        VehicleType narrow = new VehicleType("narrow", 13600, 1300, 2700, 24000, 1000, "invented");
        LoadPlan plan = load(plan(longCrate, 2, 1000), List.of(longCrate), List.of(narrow));
        assertThat(plan.vehicles()).hasSize(1);
        assertThat(plan.vehicles().get(0).centreOfGravityMm()).isCloseTo(6000, within(1e-6));
        assertThat(plan.vehicles().get(0).floorLengthMm()).isCloseTo(12000, within(1e-6));
    }

    @Test
    @DisplayName("a crate longer than every deck makes the plan INFEASIBLE, naming the crate")
    void infeasible() {
        CrateType huge = crateType("huge", 14000, 1000, 1000, false, 0);
        LoadPlan plan = PLANNER.load(plan(huge, 1, 500), List.of(huge), List.of(SEMI));
        assertThat(plan.status()).isEqualTo(Status.INFEASIBLE);
        assertThat(plan.reason()).contains("C1").contains("huge");
    }

    @Test
    @DisplayName("JSON contract of plan.json -> loads: exactly the issues' keys, in order (lateral centre; no axle"
            + " loads without geometry; the total only from the joint choice, Shipping)")
    void jsonKeys() {
        CrateType small = crateType("c", 1000, 800, 800, true, 2000);
        JsonNode json = new ObjectMapper().valueToTree(load(plan(small, 3, 500), List.of(small), List.of(SEMI)));
        assertThat(names(json)).containsExactly("status", "lowerBound", "vehicles");
        JsonNode vehicle = json.get("vehicles").get(0);
        assertThat(names(vehicle)).containsExactly("id", "type", "deckLengthMm", "deckWidthMm", "deckHeightMm",
                "payloadKg", "massKg", "centreOfGravityMm", "lateralCentreOfGravityMm", "crates");
        assertThat(names(vehicle.get("crates").get(0))).containsExactly("ref", "xMm", "yMm", "zMm", "rotated");
    }

    @Test
    @DisplayName("mixed crates: valid and the same input gives the same plan")
    void mixedAndDeterministic() {
        CrateType a = crateType("a", 6200, 1100, 900, true, 1500);
        CrateType b = crateType("b", 3200, 900, 700, true, 800);
        CrateType c = crateType("c", 1200, 800, 700, false, 0);
        CratePlan crates = LoadFixtures.join(LoadFixtures.join(plan(a, 7, 1400), plan(b, 9, 600)), plan(c, 5, 200));
        List<CrateType> types = List.of(a, b, c);
        LoadPlan first = load(crates, types, LoadFixtures.FLEET);
        assertThat(load(crates, types, LoadFixtures.FLEET)).isEqualTo(first);
        // hand bound: 16 200 kg (7 x 1400 + 9 x 600 + 5 x 200) at the least cost per kg of payload of the fleet
        // (20 ft container, 900 / 28 200) is a cost no plan can go below; the planner's bound is no weaker
        double mass = 7 * 1400 + 9 * 600 + 5 * 200;
        double perKg = LoadFixtures.FLEET.stream().mapToDouble(v -> v.costPerTrip() / v.payloadKg()).min()
                .orElseThrow();
        assertThat(perKg).isCloseTo(900.0 / 28_200, within(1e-12));
        assertThat(first.lowerBound()).isGreaterThanOrEqualTo(mass * perKg - 1e-6)
                .isLessThanOrEqualTo(first.tripCost() + 1e-6);
    }

    private static List<String> names(JsonNode node) {
        List<String> names = new ArrayList<>();
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            names.add(it.next());
        }
        return names;
    }
}
