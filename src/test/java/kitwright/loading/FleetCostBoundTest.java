package kitwright.loading;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import kitwright.model.VehicleType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Variable;

class FleetCostBoundTest {
    private static final List<VehicleType> FLEET = LoadFixtures.FLEET;
    private static final double[] COST = FLEET.stream().mapToDouble(VehicleType::costPerTrip).toArray();

    /** The same relaxation written independently in ojAlgo: payload, floor area and volume over all types. */
    private static double reference(double mass, double areaM2, double volumeM3) {
        ExpressionsBasedModel model = new ExpressionsBasedModel();
        Expression byMass = model.addExpression("mass").lower(mass);
        Expression byArea = model.addExpression("area").lower(areaM2);
        Expression byVolume = model.addExpression("volume").lower(volumeM3);
        for (VehicleType v : FLEET) {
            Variable y = model.addVariable(v.name()).lower(0).weight(v.costPerTrip());
            byMass.set(y, v.payloadKg());
            byArea.set(y, v.deckLengthMm() * v.deckWidthMm() / 1e6);
            byVolume.set(y, v.deckLengthMm() * v.deckWidthMm() * v.deckHeightMm() / 1e9);
        }
        return model.minimise().getValue();
    }

    @Test
    @DisplayName("heavy small crates: the LP matches ojAlgo's (reference LP library)")
    void massBound() {
        // 40 crates of 1 x 0.8 x 0.8 m, 900 kg, stackable under 2 t: 36 t, 25.6 m3, no floor-area need
        List<CrateClass> classes = List.of(new CrateClass(0, 1000, 800, 800, 900, true, 2000, 40));
        double lp = FleetCostBound.compute(classes, FLEET, COST);
        assertThat(lp).isCloseTo(reference(36_000, 0, 25.6), within(1e-6));
        // cheapest payload per cost is the 20 ft container (28.2 t for 900): 36000 / 28200 * 900
        assertThat(lp).isCloseTo(36_000 / 28_200.0 * 900, within(1e-6));
    }

    @Test
    @DisplayName("light crates that cannot stack: floor area binds; the LP matches ojAlgo's")
    void floorBound() {
        // 50 crates of 2 x 1 x 0.5 m, 100 kg, not stackable: 5 t, 50 m3, 100 m2 of floor
        List<CrateClass> classes = List.of(new CrateClass(0, 2000, 1000, 500, 100, false, 0, 50));
        double lp = FleetCostBound.compute(classes, FLEET, COST);
        assertThat(lp).isCloseTo(reference(5000, 100, 50), within(1e-6));
        // box truck: 6.2 x 2.45 = 15.19 m2 for 400 per trip, the cheapest floor (semi-trailer 33.728 m2 for 1000)
        assertThat(lp).isCloseTo(100 / 15.19 * 400, within(1e-6));
    }

    @Test
    @DisplayName("crates that fit only some vehicles must be paid there: 12 m crates go only on the semi-trailer")
    void fitSets() {
        // 6 crates 12.5 x 1.2 x 1 m of 500 kg fit only the 13.6 m semi-trailer; not stackable: floor 90 m2
        List<CrateClass> classes = List.of(new CrateClass(0, 12_500, 1200, 1000, 500, false, 0, 6));
        assertThat(FleetCostBound.compute(classes, FLEET, COST)).isCloseTo(6 * 12.5 * 1.2 / 33.728 * 1000,
                within(1e-6));
    }
}
