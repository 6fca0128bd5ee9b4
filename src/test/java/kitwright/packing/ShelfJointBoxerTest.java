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
        // a full box is the square grid's fill, sphere / cell = pi/6 = 52.4 % (src/docs/sources.md)
        double fill = boxes.get(0).jointCount() * Math.PI / 6 * Math.pow(100, 3) / (600.0 * 400 * 300);
        assertThat(fill).isCloseTo(Math.PI / 6, org.assertj.core.data.Offset.offset(1e-12));
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
