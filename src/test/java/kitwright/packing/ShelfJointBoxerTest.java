package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import kitwright.model.Joint;
import kitwright.model.JointBox;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ShelfJointBoxerTest {
    private final ShelfJointBoxer boxer = new ShelfJointBoxer();

    @Test
    @DisplayName("square grid: d = 100 in 600 x 400 x 300 holds 6 * 4 * 3 = 72 (src/docs/sources.md, 52 % fill)")
    void squareGridCount() {
        List<JointBoxLoad> boxes = boxer.box(List.of(new Joint("N", 100, 0.2, 150)), JointBox.DEFAULT);
        assertThat(boxes).extracting(JointBoxLoad::jointCount).containsExactly(72, 72, 6);
    }

    @Test
    @DisplayName("square grid, sizes that do not divide: d = 110 in 600 x 400 x 300 holds 5 * 3 * 2 = 30 (hand "
            + "count), a fill of 29 %, below the square grid's pi/6 and Kepler's pi/sqrt(18)")
    void squareGridCountWithLeftoverRoom() {
        List<JointBoxLoad> boxes = boxer.box(List.of(new Joint("N", 110, 0.2, 70)), JointBox.DEFAULT);
        // floor(600/110) = 5, floor(400/110) = 3, floor(300/110) = 2: 30 a box, 70 = 30 + 30 + 10
        assertThat(boxes).extracting(JointBoxLoad::jointCount).containsExactly(30, 30, 10);
        // no box holds more sphere volume than any packing of equal spheres can: pi/sqrt(18) = 74.0 % (Kepler's
        // bound, proved by Hales 2005); a square grid reaches pi/6 = 52.4 % only when the sides divide by d
        double fill = boxes.get(0).jointCount() * Math.PI / 6 * Math.pow(110, 3) / (600.0 * 400 * 300);
        assertThat(fill).isCloseTo(0.2904, org.assertj.core.data.Offset.offset(1e-4)).isLessThan(Math.PI / 6)
                .isLessThan(Math.PI / Math.sqrt(18));
    }

    @Test
    @DisplayName("the box mass limit (25 kg by default) caps a box: 1 kg joints, 25 a box")
    void massLimit() {
        List<JointBoxLoad> boxes = boxer.box(List.of(new Joint("N", 100, 1.0, 60)), JointBox.DEFAULT);
        assertThat(boxes).extracting(JointBoxLoad::jointCount).containsExactly(25, 25, 10);
        assertThat(boxes).allSatisfy(b -> assertThat(b.massKg()).isLessThanOrEqualTo(25.0));
    }

    @Test
    @DisplayName("marks share the last box of the mark before; every joint boxed once")
    void mixedMarks() {
        List<Joint> joints = List.of(new Joint("A", 150, 0.5, 10), new Joint("B", 90, 0.3, 30));
        List<JointBoxLoad> boxes = boxer.box(joints, JointBox.DEFAULT);
        // A: floor(600/150) = 4 a row; rows of 150 mm, two side by side in a 400 mm layer: layer 1 takes 8, layer 2
        // (the last, 300 mm high box) a row of 2. B (6 a row) adds two rows beside it: 150 + 90 + 90 = 330 <= 400.
        // The other 18 B go into a second box (hand count).
        assertThat(boxes).hasSize(2);
        assertThat(boxes.get(0).joints()).extracting(JointCount::mark, JointCount::count)
                .containsExactly(org.assertj.core.groups.Tuple.tuple("A", 10), org.assertj.core.groups.Tuple.tuple("B", 12));
        assertThat(boxes.get(1).jointCount()).isEqualTo(18);
    }

    @Test
    @DisplayName("a joint wider than the box, or heavier than its limit, is refused with its mark")
    void refused() {
        assertThatThrownBy(() -> boxer.box(List.of(new Joint("BIG", 350, 1, 1)), JointBox.DEFAULT))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("BIG");
        assertThatThrownBy(() -> boxer.box(List.of(new Joint("HEAVY", 100, 30, 1)), JointBox.DEFAULT))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("HEAVY");
    }
}
