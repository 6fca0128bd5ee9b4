package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Joint boxes (600 x 400 x 300 mm) on the skyline of lanes 600 mm long in a crate 600 long, 800 wide and 600
 * high; every placement below is worked out by hand (invented sizes).
 */
class SkylineBoxesTest {
    private static final ItemType THIN = new ItemType(0, ItemKind.BUNDLE, 600, 50, 50, 1, 1000);
    private static final ItemType THICK = new ItemType(1, ItemKind.BUNDLE, 600, 100, 100, 1, 1000);
    private static final ItemType BOX = new ItemType(2, ItemKind.BOX, 600, 400, 300, 20, 10);
    private static final List<ItemType> TYPES = List.of(THIN, THICK, BOX);

    /** Lanes of one type side by side across [from, to), {@code layers} high, on the floor. */
    private static void stack(List<CrateLayout.Slot> slots, Skyline sky, ItemType t, double from, double to,
                              int layers) {
        double d = t.diameterMm();
        for (double y = from; y + d <= to + 1e-9; y += d) {
            for (int k = 0; k < layers; k++) {
                slots.add(new CrateLayout.Slot(t.index(), 0, y, k * d, 600, d, d));
            }
            sky.raise(y, y + d, layers * d, 600);
        }
    }

    private static List<CrateLayout.Slot> boxes(List<CrateLayout.Slot> slots, Skyline sky, int[] left) {
        int before = slots.size();
        SkylineBoxes.place(sky, TYPES, 600, 800, 600, 1e9, new double[] {0}, new int[3], slots, left);
        assertThat(Fixtures.unsupported(slots, TYPES, 800)).as("every item rests on the floor or on items")
                .isEmpty();
        return slots.subList(before, slots.size());
    }

    @Test
    @DisplayName("on their side (300 across, 400 up) 2 boxes go in where upright (400 across) only 1 does")
    void onSideWhenItHoldsMore() {
        // tops: [0, 50) at 300 (a tower of 50s), [50, 400) at 100 (two layers of 50s), [400, 800) at 200 (two
        // layers of 100s). Upright: only [400, 800) bears a 400-wide box (1 box, top 500; nothing fits after).
        // On side: [50, 350) at 100, then [350, 650) at 200 on the 100s (250 of 300 under it): 2 boxes
        List<CrateLayout.Slot> slots = new ArrayList<>();
        Skyline sky = new Skyline(0, 800, 600);
        stack(slots, sky, THIN, 0, 50, 6);
        stack(slots, sky, THIN, 50, 400, 2);
        stack(slots, sky, THICK, 400, 800, 2);
        List<CrateLayout.Slot> boxes = boxes(slots, sky, new int[] {0, 0, 10});
        assertThat(boxes).hasSize(2);
        assertThat(boxes).allSatisfy(b -> {
            assertThat(b.width()).isEqualTo(300.0);
            assertThat(b.height()).isEqualTo(400.0);
        });
        assertThat(boxes).extracting(CrateLayout.Slot::y, CrateLayout.Slot::z)
                .containsExactly(org.assertj.core.groups.Tuple.tuple(50.0, 100.0),
                        org.assertj.core.groups.Tuple.tuple(350.0, 200.0));
    }

    @Test
    @DisplayName("a row that finds no support at the lowest spot gives it up and goes where it is borne: 1 box")
    void wasteStep() {
        // tops: [0, 200) at 100, [200, 250) at 150, [250, 800) at 300. The lowest spot for an upright box is
        // y = 0 at 300, borne only over [250, 400) (37.5 %): no support. Giving up [0, 200) lets the row go at
        // y = 200 (350 of 400 borne at 300). On their side no spot is low enough (300 + 400 > 600).
        List<CrateLayout.Slot> slots = new ArrayList<>();
        Skyline sky = new Skyline(0, 800, 600);
        stack(slots, sky, THICK, 0, 200, 1);
        stack(slots, sky, THIN, 200, 250, 3);
        stack(slots, sky, THIN, 250, 800, 6);
        List<CrateLayout.Slot> boxes = boxes(slots, sky, new int[] {0, 0, 10});
        assertThat(boxes).hasSize(1);
        assertThat(boxes.get(0).y()).isEqualTo(200.0);
        assertThat(boxes.get(0).z()).isEqualTo(300.0);
        assertThat(boxes.get(0).width()).isEqualTo(400.0);
    }

    @Test
    @DisplayName("on a flat floor 900 wide, 3 rows on their side beat 2 upright; a tie keeps them upright")
    void flatFloor() {
        Skyline wide = new Skyline(0, 900, 600);
        List<CrateLayout.Slot> slots = new ArrayList<>();
        int[] left = {0, 0, 10};
        SkylineBoxes.place(wide, TYPES, 600, 900, 400, 1e9, new double[] {0}, new int[3], slots, left);
        // 600 long: 1 box a row; on side 300 across: 3 rows, 400 up fills the 400 height: 3 boxes
        assertThat(slots).hasSize(3).allSatisfy(b -> assertThat(b.width()).isEqualTo(300.0));
        Skyline narrow = new Skyline(0, 800, 600);
        List<CrateLayout.Slot> upright = new ArrayList<>();
        SkylineBoxes.place(narrow, TYPES, 600, 800, 300, 1e9, new double[] {0}, new int[3], upright,
                new int[] {0, 0, 10});
        // 300 high: on side (400 up) does not fit; upright 2 rows of 400
        assertThat(upright).hasSize(2).allSatisfy(b -> assertThat(b.height()).isEqualTo(300.0));
    }
}
