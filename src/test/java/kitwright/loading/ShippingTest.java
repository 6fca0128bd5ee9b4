package kitwright.loading;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import kitwright.ids.IdScheme;
import kitwright.model.CrateType;
import kitwright.model.JointBox;
import kitwright.model.Status;
import kitwright.model.VehicleType;
import kitwright.nesting.Bundle;
import kitwright.packing.Fixtures;
import kitwright.validate.CratePlanValidator;
import kitwright.validate.LoadPlanValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Crates and vehicles chosen together ({@link Shipping}) and the bound on their sum ({@link ShippingCostBound}). */
class ShippingTest {
    private static final CrateType LONG = Fixtures.crate("long", 6300, 1000, 800, 210, 3000, 320.0);
    private static final CrateType SHORT = Fixtures.crate("short", 4500, 1000, 700, 140, 2500, 240.0);
    private static final VehicleType SEMI = new VehicleType("semi", 13600, 2480, 2700, 24000, 950, "invented");
    private static final VehicleType BOX = new VehicleType("box", 6200, 2450, 2400, 2800, 420, "invented");

    /** The joint choice with the two crates and two vehicles, both plans validated. */
    private static Shipping.Shipment ship(List<Bundle> bundles) {
        List<CrateType> catalog = List.of(LONG, SHORT);
        List<VehicleType> vehicles = List.of(SEMI, BOX);
        Shipping.Shipment s = Shipping.plan(bundles, List.of(), new Shipping.Setting(catalog, vehicles,
                JointBox.DEFAULT, IdScheme.FIRST_CHOICE, 30));
        CratePlanValidator.check(s.crates(), bundles, List.of(), catalog, JointBox.DEFAULT);
        LoadPlanValidator.check(s.loads(), s.crates(), catalog, vehicles);
        return s;
    }

    @Test
    @DisplayName("the cheapest crate plan (one long crate, 320) needs the semi-trailer (950): 1270; two short crates"
            + " (2 x 240) ride on one box truck (420): 900, which the bound proves least (by hand: the long crate"
            + " rides only on the semi, 320 + 950; 2500 kg need two short crates of 2360 kg net, 480 + 420)")
    void smallerCratesOnASmallerTruck() {
        Shipping.Shipment s = ship(Fixtures.bundles(10, 4000, 100, 250));
        assertThat(s.crates().crates()).extracting(c -> c.type()).containsExactly("short", "short");
        assertThat(s.loads().vehicles()).extracting(VehicleLoad::type).containsExactly("box");
        assertThat(s.loads().totalCost()).isCloseTo(900, within(1e-6));
        assertThat(s.loads().totalLowerBound()).isCloseTo(900, within(1e-3));
        assertThat(s.loads().status()).isEqualTo(Status.OPTIMAL);
    }

    @Test
    @DisplayName("bundles longer than the short crate: long crates only, so the semi-trailer; 7500 kg over 2790 kg net"
            + " is 3 crates, 3 x 320 + 950 = 1910 (by hand), and the bound meets it")
    void longBundlesNeedTheSemi() {
        Shipping.Shipment s = ship(Fixtures.bundles(30, 6000, 100, 250));
        assertThat(s.loads().totalCost()).isCloseTo(1910, within(1e-6));
        assertThat(s.loads().totalLowerBound()).isCloseTo(1910, within(1e-3));
    }
}
