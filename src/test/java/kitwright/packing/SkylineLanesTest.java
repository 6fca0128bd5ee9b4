package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SkylineLanesTest {

    private static List<CrateLayout.Slot> place(List<ItemType> types, List<ItemType> bundles, double length,
                                                double width, double height, int[] counts) {
        List<LaneBuilder.Lane> lanes = new ArrayList<>(new LaneBuilder().build(bundles, length));
        List<CrateLayout.Slot> slots = new ArrayList<>();
        SkylineLanes.place(lanes, types, 0, length, width, height, 1e9, new double[] {0}, counts, slots,
                new int[types.size()]);
        assertThat(Fixtures.unsupported(slots, types, width)).as("every bundle rests on the floor or on bundles")
                .isEmpty();
        return slots;
    }

    @Test
    @DisplayName("equal lanes fill square rows: 1000 x 500 with d = 100 holds floor(1000/100) * floor(500/100) = 50 "
            + "(hand count)")
    void squareRows() {
        ItemType t = new ItemType(0, ItemKind.BUNDLE, 1000, 100, 100, 5, 60);
        int[] counts = new int[1];
        List<CrateLayout.Slot> slots = place(List.of(t), Collections.nCopies(60, t), 1000, 1000, 500, counts);
        assertThat(counts[0]).isEqualTo(50);
        assertThat(slots).extracting(CrateLayout.Slot::z).containsOnly(0.0, 100.0, 200.0, 300.0, 400.0);
    }

    @Test
    @DisplayName("long thin lanes go under short thick ones: 10 of 3000 x 50 on the floor of a 500 mm wide crate, "
            + "10 of 2000 x 100 in two rows of 5 above, 250 mm high in all (hand count)")
    void longLanesLowest() {
        ItemType thick = new ItemType(0, ItemKind.BUNDLE, 2000, 100, 100, 20, 10);
        ItemType thin = new ItemType(1, ItemKind.BUNDLE, 3000, 50, 50, 5, 10);
        List<ItemType> bundles = new ArrayList<>(Collections.nCopies(10, thin));
        bundles.addAll(Collections.nCopies(10, thick));
        int[] counts = new int[2];
        List<CrateLayout.Slot> slots = place(List.of(thick, thin), bundles, 3000, 500, 250, counts);
        assertThat(counts).containsExactly(10, 10);
        assertThat(slots.stream().filter(s -> s.itemType() == 1)).allSatisfy(s -> assertThat(s.z()).isZero());
        assertThat(slots.stream().mapToDouble(s -> s.z() + s.height()).max().orElseThrow()).isEqualTo(250.0);
    }

    @Test
    @DisplayName("a lane longer than what is under it is cut where its support ends and the rest goes elsewhere")
    void cutWhereSupportEnds() {
        // floor: 5 lanes of one 2000 bundle (d = 100) fill the 500 mm width; above them 5 lanes of two 1500 bundles
        // (d = 100) would overhang by 1000: each is cut after its first bundle and the second ones form new lanes
        ItemType longer = new ItemType(0, ItemKind.BUNDLE, 2000, 100, 100, 10, 5);
        ItemType shorter = new ItemType(1, ItemKind.BUNDLE, 1500, 100, 100, 8, 10);
        List<LaneBuilder.Lane> lanes = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            lanes.add(new LaneBuilder.Lane(100, List.of(longer)));
        }
        for (int i = 0; i < 5; i++) {
            lanes.add(new LaneBuilder.Lane(100, List.of(shorter, shorter)));
        }
        List<ItemType> types = List.of(longer, shorter);
        int[] counts = new int[2];
        List<CrateLayout.Slot> slots = new ArrayList<>();
        SkylineLanes.place(lanes, types, 0, 3000, 500, 400, 1e9, new double[] {0}, counts, slots, new int[2]);
        assertThat(Fixtures.unsupported(slots, types, 500)).isEmpty();
        assertThat(counts).containsExactly(5, 10);
        assertThat(slots.stream().filter(s -> s.itemType() == 1)).allSatisfy(s -> assertThat(s.x()).isZero());
    }

    @Test
    @DisplayName("joint boxes go on a full row of lanes: 600 x 400 x 300 boxes on 10 lanes of d = 100 in a 1200 x "
            + "1000 x 400 crate, floor(1200/600) * floor(1000/400) = 4 (hand count), the fifth has no room")
    void boxesOnTheLanes() {
        ItemType lane = new ItemType(0, ItemKind.BUNDLE, 1200, 100, 100, 10, 10);
        ItemType box = new ItemType(1, ItemKind.BOX, 600, 400, 300, 20, 5);
        List<ItemType> types = List.of(lane, box);
        List<LaneBuilder.Lane> lanes = new ArrayList<>(new LaneBuilder().build(Collections.nCopies(10, lane), 1200));
        int[] counts = new int[2];
        int[] left = {0, 5};
        List<CrateLayout.Slot> slots = new ArrayList<>();
        SkylineLanes.place(lanes, types, 0, 1200, 1000, 400, 1e9, new double[] {0}, counts, slots, left);
        assertThat(Fixtures.unsupported(slots, types, 1000)).isEmpty();
        assertThat(counts).containsExactly(10, 4);
        assertThat(left).containsExactly(0, 1);
        assertThat(slots.stream().filter(s -> s.itemType() == 1)).allSatisfy(s -> assertThat(s.z()).isEqualTo(100.0));
    }
}
