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
        assertThat(Fixtures.unsupported(all.slots(), types, 800)).isEmpty();
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

    @Test
    @DisplayName("a lane cut short and joined to another keeps the cell of its widest bundle: no 60.3 mm bundle in"
            + " a 42.4 mm cell, no two bundles overlap (a case found by a random probe, sizes rounded)")
    void joinedLaneKeepsItsWidestCell() {
        // row groups cut lanes short where the rows below do not bear them and join the rests; a rest that began
        // with a thin far-end bundle (33.7 mm) took its cell from it and put the 60.3 mm bundles after it into a
        // 42.4 mm row, 0.2 mm into the bundle under them
        CrateType crate = crate("c", 6200, 950, 750, 60, 3273, 100.0);
        double[][] bundles = {{2600, 42.4, 32}, {300, 60.3, 27}, {2000, 76.1, 53}, {2200, 114.3, 47},
            {2710, 60.3, 4}, {710, 33.7, 20}};
        int[] offer = {2, 3, 19, 16, 31, 15};
        List<ItemType> types = new java.util.ArrayList<>();
        for (int i = 0; i < bundles.length; i++) {
            types.add(new ItemType(i, ItemKind.BUNDLE, bundles[i][0], bundles[i][1], bundles[i][1], bundles[i][2],
                    offer[i]));
        }
        for (CrateLayout layout : new CrateFiller().fills(0, crate, types, offer)) {
            List<CrateLayout.Slot> slots = layout.slots();
            for (int i = 0; i < slots.size(); i++) {
                for (int j = i + 1; j < slots.size(); j++) {
                    assertThat(circlesOverlap(slots.get(i), slots.get(j))).as("%s and %s", slots.get(i),
                            slots.get(j)).isFalse();
                }
            }
            assertThat(Fixtures.unsupported(slots, types, 950)).isEmpty();
        }
    }

    /** Two bundles whose lengths overlap and whose circles are closer than the sum of their radii. */
    private static boolean circlesOverlap(CrateLayout.Slot a, CrateLayout.Slot b) {
        if (a.x() >= b.x() + b.length() - EPS || b.x() >= a.x() + a.length() - EPS) {
            return false;
        }
        double dy = (a.y() + a.width() / 2) - (b.y() + b.width() / 2);
        double dz = (a.z() + a.height() / 2) - (b.z() + b.height() / 2);
        return Math.hypot(dy, dz) < (a.width() + b.width()) / 2 - EPS;
    }
}
