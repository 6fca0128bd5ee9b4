package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import kitwright.model.CrateType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Variable;

class CrateLowerBoundsTest {

    @Test
    @DisplayName("count bounds: cylinder and box volume over the largest crate, mass over the largest net capacity")
    void countBounds() {
        // 100 bundles 2000 x 100: box volume 2.0 m3, cylinder 1.5708 m3; crate 2 x 1 x 0.5 = 1 m3; 10 kg each
        ItemType bundles = new ItemType(0, ItemKind.BUNDLE, 2000, 100, 100, 10, 100);
        CrateType crate = Fixtures.crate("c", 2000, 1000, 500, 50, 450, 100.0);
        CrateBounds b = CrateLowerBounds.compute(List.of(bundles), List.of(crate), 3, 300.0);
        assertThat(b.boxVolumeCrates()).isEqualTo(2);
        assertThat(b.cylinderVolumeCrates()).isEqualTo(2);
        assertThat(b.massCrates()).isEqualTo(3); // 1000 kg / 400 kg net
        assertThat(b.crates()).isEqualTo(3);
        assertThat(b.price()).isCloseTo(300, within(1e-6));
        assertThat(b.gap()).isCloseTo(0, within(1e-9));
    }

    @Test
    @DisplayName("price bound by length class: the LP matches ojAlgo's (reference LP library)")
    void priceBoundAgainstOjAlgo() {
        // long bundles (5 m) fit only the long crate; short ones (1 m) either
        ItemType longOnes = new ItemType(0, ItemKind.BUNDLE, 5000, 80, 80, 30, 40);
        ItemType shortOnes = new ItemType(1, ItemKind.BUNDLE, 1000, 60, 60, 4, 200);
        CrateType longCrate = Fixtures.crate("long", 6000, 800, 600, 100, 1600, 300.0);
        CrateType shortCrate = Fixtures.crate("short", 2000, 800, 600, 40, 900, 70.0);
        CrateBounds b = CrateLowerBounds.compute(List.of(longOnes, shortOnes), List.of(longCrate, shortCrate), 10,
                1000.0);
        double vLong = 40 * Math.PI / 4 * 80 * 80 * 5000 / 1e9;
        double vShort = 200 * Math.PI / 4 * 60 * 60 * 1000 / 1e9;
        ExpressionsBasedModel model = new ExpressionsBasedModel();
        Variable yl = model.addVariable("long").lower(0).weight(300);
        Variable ys = model.addVariable("short").lower(0).weight(70);
        Expression allVolume = model.addExpression("all volume").lower(vLong + vShort);
        allVolume.set(yl, 6 * 0.8 * 0.6);
        allVolume.set(ys, 2 * 0.8 * 0.6);
        Expression allMass = model.addExpression("all mass").lower(40 * 30 + 200 * 4);
        allMass.set(yl, 1500);
        allMass.set(ys, 860);
        Expression longVolume = model.addExpression("long volume").lower(vLong);
        longVolume.set(yl, 6 * 0.8 * 0.6);
        Expression longMass = model.addExpression("long mass").lower(40 * 30);
        longMass.set(yl, 1500);
        double reference = model.minimise().getValue();
        assertThat(b.priceRelaxation()).isCloseTo(reference, within(1e-6));
        assertThat(reference).isGreaterThan(300); // the long bundles alone need 0.8 long crates by mass
        // whole crates: at least one long crate (300) and, for the rest, one short crate (70)
        assertThat(b.price()).isCloseTo(370, within(1e-6));
    }
}
