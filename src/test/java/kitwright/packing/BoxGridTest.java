package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Joint boxes by guillotine blocks; every count below is counted by hand (invented sizes). */
class BoxGridTest {
    private static final double EPS = 1e-6;

    private static ItemType box(int index, double massKg, int demand) {
        return new ItemType(index, ItemKind.BOX, 600, 400, 300, massKg, demand);
    }

    @Test
    @DisplayName("one grid when the box divides the region: 1200 x 800 x 600 holds 2 x 2 x 2 = 8 (its volume)")
    void exactGrid() {
        assertThat(BoxGrid.capacity(1200, 800, 600, box(0, 20, 100))).isEqualTo(8);
    }

    @Test
    @DisplayName("6300 x 1000 x 800: one grid 10 x 3 x 2 = 60, the end slab 300 x 1000 x 800 takes 2 + 1 more: 63")
    void endSlabFilled() {
        // by hand: 600 along, 300 across, 400 up: 10 x 3 x 2 = 60, 6000 of 6300 long; behind it 300 x 1000 x 800:
        // 300 along, 600 across, 400 up: 1 x 1 x 2 = 2, and beside those 300 x 400 x 800: 300 x 400 x 600 up: 1
        assertThat(BoxGrid.capacity(6300, 1000, 800, box(0, 20, 100))).isEqualTo(63);
    }

    @Test
    @DisplayName("fill places exactly the counted boxes, inside the region, none overlapping, each resting on the"
            + " floor or on boxes")
    void fillMatchesCapacity() {
        ItemType b = box(0, 20, 100);
        List<CrateLayout.Slot> slots = new ArrayList<>();
        int[] left = {100};
        int[] counts = new int[1];
        double[] mass = {0};
        BoxGrid.fill(100, 50, 0, 6300, 1000, 800, List.of(b), left, 10_000, mass, counts, slots);
        assertThat(slots).hasSize(63);
        assertThat(counts[0]).isEqualTo(63);
        assertThat(left[0]).isEqualTo(37);
        assertThat(mass[0]).isEqualTo(63 * 20.0);
        for (CrateLayout.Slot s : slots) {
            assertThat(s.x()).isGreaterThanOrEqualTo(100 - EPS);
            assertThat(s.x() + s.length()).isLessThanOrEqualTo(6400 + EPS);
            assertThat(s.y()).isGreaterThanOrEqualTo(50 - EPS);
            assertThat(s.y() + s.width()).isLessThanOrEqualTo(1050 + EPS);
            assertThat(s.z() + s.height()).isLessThanOrEqualTo(800 + EPS);
            assertThat(List.of(s.length(), s.width(), s.height())).containsExactlyInAnyOrder(600.0, 400.0, 300.0);
        }
        for (int i = 0; i < slots.size(); i++) {
            for (int j = i + 1; j < slots.size(); j++) {
                assertThat(overlap(slots.get(i), slots.get(j))).as("boxes %d and %d", i, j).isFalse();
            }
        }
        List<ItemType> types = List.of(b);
        assertThat(Fixtures.unsupported(slots, types, 1100)).isEmpty();
    }

    @Test
    @DisplayName("a region a hair short of whole boxes (1199.9996 mm long) fills as counted: regions 0.0004 mm apart"
            + " that hold different counts do not share a plan (it recursed without end)")
    void hairShortRegion() {
        // 1199.9996 / 300 falls short of 4 by more than the counting tolerance while 1200 does not, so a plan made
        // for 300 mm must not be followed in 299.9996 mm
        ItemType b = box(0, 20, 100);
        List<CrateLayout.Slot> slots = new ArrayList<>();
        BoxGrid.fill(0, 0, 0, 1199.9996, 900, 600, List.of(b), new int[] {100}, 10_000, new double[] {0},
                new int[1], slots);
        assertThat(slots).hasSize((int) BoxGrid.capacity(1199.9996, 900, 600, b)).isNotEmpty();
        for (CrateLayout.Slot s : slots) {
            assertThat(s.x() + s.length()).isLessThanOrEqualTo(1199.9996 + 1e-3);
            assertThat(s.y() + s.width()).isLessThanOrEqualTo(900 + EPS);
            assertThat(s.z() + s.height()).isLessThanOrEqualTo(600 + EPS);
        }
        for (int i = 0; i < slots.size(); i++) {
            for (int j = i + 1; j < slots.size(); j++) {
                assertThat(overlap(slots.get(i), slots.get(j))).as("boxes %d and %d", i, j).isFalse();
            }
        }
    }

    @Test
    @DisplayName("the crate's net capacity stops the filling; lighter box types still go in while they fit")
    void massLimit() {
        ItemType heavy = box(0, 24, 10);
        ItemType light = box(1, 10, 10);
        List<CrateLayout.Slot> slots = new ArrayList<>();
        int[] left = {10, 10};
        int[] counts = new int[2];
        double[] mass = {0};
        // 100 kg: 4 heavy boxes (96 kg), then no box fits the 4 kg left
        BoxGrid.fill(0, 0, 0, 6300, 1000, 800, List.of(heavy, light), left, 100, mass, counts, slots);
        assertThat(counts).containsExactly(4, 0);
        // 110 kg: 4 heavy (96 kg), then 1 light (106 kg)
        slots.clear();
        int[] left2 = {10, 10};
        int[] counts2 = new int[2];
        double[] mass2 = {0};
        BoxGrid.fill(0, 0, 0, 6300, 1000, 800, List.of(heavy, light), left2, 110, mass2, counts2, slots);
        assertThat(counts2).containsExactly(4, 1);
        assertThat(mass2[0]).isLessThanOrEqualTo(110);
    }

    @Test
    @DisplayName("a region smaller than the box in some direction holds none")
    void tooSmall() {
        assertThat(BoxGrid.capacity(6300, 1000, 250, box(0, 20, 1))).isZero();
    }

    private static boolean overlap(CrateLayout.Slot a, CrateLayout.Slot b) {
        return a.x() < b.x() + b.length() - EPS && b.x() < a.x() + a.length() - EPS
                && a.y() < b.y() + b.width() - EPS && b.y() < a.y() + a.width() - EPS
                && a.z() < b.z() + b.height() - EPS && b.z() < a.z() + a.height() - EPS;
    }
}
