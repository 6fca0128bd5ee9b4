package kitwright.packing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Map;
import kitwright.model.Joint;
import kitwright.model.StructureCount;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class StructureShareTest {
    private static NestedTube tube(String mark, NestedTube... guests) {
        return new NestedTube(mark, 60, 50, 2000, 0, 0, 0, List.of(guests));
    }

    private static Bundle bundle(String id, NestedTube host) {
        return new Bundle(id, 2000, 60, 10, host);
    }

    // B1: A with B inside; B2: A alone; B3: C with B inside; B4: C alone
    private final List<Bundle> bundles = List.of(bundle("B1", tube("A", tube("B"))), bundle("B2", tube("A")),
            bundle("B3", tube("C", tube("B"))), bundle("B4", tube("C")));
    private final List<Joint> joints = List.of(new Joint("N1", 100, 1, 10));
    private final List<StructureCount> counts = List.of(new StructureCount("tower", "A", 2),
            new StructureCount("tower", "B", 1), new StructureCount("roof", "C", 1));

    @Test
    @DisplayName("the bundles holding a structure's tubes, whole; tubes riding along are listed")
    void coverOfAStructure() {
        StructureShare tower = StructureShare.of("tower", bundles, joints, counts);
        assertThat(tower.bundles()).extracting(Bundle::id).containsExactly("B1", "B2");
        assertThat(tower.extraTubes()).isEmpty();
        assertThat(tower.joints()).isEqualTo(joints);
        assertThat(tower.allJoints()).isTrue();
        StructureShare roof = StructureShare.of("roof", bundles, joints, counts);
        // B4 holds only what the roof needs (share 1), B3 half of it
        assertThat(roof.bundles()).extracting(Bundle::id).containsExactly("B4");
    }

    @Test
    @DisplayName("when the needed tubes ride with others, the others are reported as extra")
    void extraTubes() {
        List<StructureCount> needsB = List.of(new StructureCount("brace", "B", 2));
        StructureShare share = StructureShare.of("brace", bundles, joints, needsB);
        assertThat(share.bundles()).extracting(Bundle::id).containsExactly("B1", "B3");
        assertThat(share.extraTubes()).isEqualTo(Map.of("A", 1, "C", 1));
    }

    @Test
    @DisplayName("joint marks named in the structure's rows limit the joints shipped")
    void jointCounts() {
        List<StructureCount> withJoints = List.of(new StructureCount("tower", "A", 1),
                new StructureCount("tower", "N1", 4));
        StructureShare share = StructureShare.of("tower", bundles, joints, withJoints);
        assertThat(share.allJoints()).isFalse();
        assertThat(share.joints()).containsExactly(new Joint("N1", 100, 1, 4));
    }

    @Test
    @DisplayName("an unknown structure is refused, naming the known ones")
    void unknown() {
        assertThatThrownBy(() -> StructureShare.of("bridge", bundles, joints, counts))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("bridge")
                .hasMessageContaining("roof, tower");
    }
}
