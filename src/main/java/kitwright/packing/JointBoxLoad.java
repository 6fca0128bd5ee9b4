package kitwright.packing;

import java.util.List;

/**
 * One filled joint box: its id (the {@code ref} of a box item in a crate), its size and its contents.
 *
 * @param massKg mass of the joints in it (the box itself is counted as part of the crate's contents at zero
 *               tare: the catalog gives no box tare)
 */
public record JointBoxLoad(String id, double lengthMm, double widthMm, double heightMm, List<JointCount> joints,
                           double massKg) {
    public JointBoxLoad {
        joints = List.copyOf(joints);
    }

    public int jointCount() {
        return joints.stream().mapToInt(JointCount::count).sum();
    }
}
