package kitwright.validate;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import kitwright.loading.LoadFixtures;
import kitwright.loading.LoadPlan;
import kitwright.loading.PlacedCrate;
import kitwright.loading.RowLoadPlanner;
import kitwright.loading.VehicleLoad;
import kitwright.model.CrateType;
import kitwright.model.VehicleType;
import kitwright.packing.CratePlan;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The load validator must reject broken plans, or the other tests prove nothing. */
class LoadPlanValidatorTest {
    private final CrateType type = LoadFixtures.crateType("s", 1200, 800, 1000, true, 400);
    private final CratePlan crates = LoadFixtures.plan(type, 12, 300);
    private final List<CrateType> types = List.of(type);
    private final VehicleType truck = new VehicleType("truck", 6200, 2450, 2400, 10_000, 400, "invented");
    private final List<VehicleType> vehicles = List.of(truck);
    private final LoadPlan good = new RowLoadPlanner().load(crates, types, vehicles);

    private LoadPlan withCrate(int index, UnaryOperator<PlacedCrate> change) {
        VehicleLoad v = good.vehicles().get(0);
        List<PlacedCrate> placed = new ArrayList<>(v.crates());
        placed.set(index, change.apply(placed.get(index)));
        VehicleLoad changed = new VehicleLoad(v.id(), v.type(), v.deckLengthMm(), v.deckWidthMm(), v.deckHeightMm(),
                v.payloadKg(), v.massKg(), v.centreOfGravityMm(), placed, v.costPerTrip(), v.floorLengthMm());
        return new LoadPlan(good.status(), good.lowerBound(), List.of(changed), good.tripCost(), good.bounds(),
                null);
    }

    private void rejects(LoadPlan plan, String fragment) {
        assertThatThrownBy(() -> LoadPlanValidator.check(plan, crates, types, vehicles))
                .isInstanceOf(AssertionError.class).hasMessageContaining(fragment);
    }

    @Test
    @DisplayName("accepts the planner's plan")
    void accepts() {
        assertThatCode(() -> LoadPlanValidator.check(good, crates, types, vehicles)).doesNotThrowAnyException();
    }

    @Test
    @DisplayName("rejects a crate off the deck, overlapping, floating, doubled, missing, and over top load")
    void rejectsBrokenPlans() {
        rejects(withCrate(0, p -> new PlacedCrate(p.ref(), 5500, p.yMm(), p.zMm(), p.rotated())), "outside the deck");
        rejects(withCrate(1, p -> new PlacedCrate(p.ref(), 100, 100, 0, p.rotated())), "overlap");
        rejects(withCrate(0, p -> new PlacedCrate(p.ref(), 5000, 0, 1200, false)), "stand fully");
        rejects(withCrate(0, p -> new PlacedCrate("C2", p.xMm(), p.yMm(), p.zMm(), p.rotated())), "expected exactly 1");
        // two 300 kg crates on one with a 400 kg top load
        CratePlan three = LoadFixtures.plan(type, 3, 300);
        VehicleLoad tower = new VehicleLoad("V1", "truck", 6200, 2450, 3500, 10_000, 900, 600,
                List.of(new PlacedCrate("C1", 0, 0, 0, false), new PlacedCrate("C2", 0, 0, 1000, false),
                        new PlacedCrate("C3", 0, 0, 2000, false)), 400, 1200);
        LoadPlan overloaded = new LoadPlan(good.status(), 0, List.of(tower), 400, null, null);
        assertThatThrownBy(() -> LoadPlanValidator.check(overloaded, three, types,
                List.of(new VehicleType("truck", 6200, 2450, 3500, 10_000, 400, "invented"))))
                .hasMessageContaining("C1 carries 600.0 kg over its top load");
    }
}
