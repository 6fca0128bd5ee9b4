package kitwright.packing;

import static kitwright.packing.Fixtures.crate;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import kitwright.model.CrateType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Layouts of one crate; every count is worked out by hand (invented sizes). */
class CrateFillerTest {
    private static final double EPS = 1e-6;

    @Test
    @DisplayName("one floor tier fewer than the boxes need: 5 boxes in one tier, 16 lanes above it, the 6th box on"
            + " the tier behind the lanes")
    void tierFewer() {
        // 1600 x 800 x 700 inside. One 300 mm tier of 600 x 400 x 300 boxes: 2 x 2 = 4 (600 along, 400 across)
        // and 1 behind them (400 along, 600 across): 5 < 6, so the full-tier layout takes two tiers and leaves
        // 100 mm for lanes (8 of the 16). One tier fewer: 16 lanes of 1200 (d = 100) in 2 rows of 8 on the tier,
        // ending at 1200; the 6th box goes on the tier's last box, 1200..1600 along, at 300 mm
        CrateType crate = crate("c", 1600, 800, 700, 50, 5000, 100.0);
        List<ItemType> types = List.of(new ItemType(0, ItemKind.BUNDLE, 1200, 100, 100, 5, 16),
                new ItemType(1, ItemKind.BOX, 600, 400, 300, 10, 6));
        List<CrateLayout> layouts = new CrateFiller().fills(0, crate, types, new int[] {16, 6});
        CrateLayout all = layouts.stream().filter(l -> l.counts()[0] == 16 && l.counts()[1] == 6
                && l.slots().stream().filter(s -> s.itemType() == 1 && s.z() < EPS).count() == 5).findFirst()
                .orElseThrow(() -> new AssertionError("no layout with one tier of 5 boxes holds everything: "
                        + layouts.stream().map(l -> java.util.Arrays.toString(l.counts())).toList()));
        assertThat(Support.holds(all.slots(), types, 800)).isTrue();
        assertThat(all.slots().stream().filter(s -> s.itemType() == 1 && s.z() > EPS))
                .singleElement().satisfies(s -> {
                    assertThat(s.x()).isEqualTo(1200.0);
                    assertThat(s.z()).isEqualTo(300.0);
                });
        assertThat(all.slots().stream().filter(s -> s.itemType() == 0))
                .allSatisfy(s -> assertThat(s.z()).isIn(300.0, 400.0));
    }

    @Test
    @DisplayName("a crate lower than the joint box's smallest side (250 < 300 mm) takes no box in any layout; the"
            + " boxes-first layouts put a 300 mm tier into it")
    void boxTallerThanTheCrate() {
        CrateType crate = crate("low", 1600, 800, 250, 50, 5000, 100.0);
        List<ItemType> types = List.of(new ItemType(0, ItemKind.BUNDLE, 1200, 100, 100, 5, 4),
                new ItemType(1, ItemKind.BOX, 600, 400, 300, 10, 6));
        List<CrateLayout> layouts = new CrateFiller().fills(0, crate, types, new int[] {4, 6});
        assertThat(layouts).isNotEmpty().allSatisfy(l -> {
            assertThat(l.counts()[1]).isZero();
            assertThat(l.slots()).allSatisfy(s -> assertThat(s.z() + s.height()).isLessThanOrEqualTo(250 + EPS));
        });
        assertThat(layouts).anySatisfy(l -> assertThat(l.counts()).containsExactly(4, 0));
    }
}
