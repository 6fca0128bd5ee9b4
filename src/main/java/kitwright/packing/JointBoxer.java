package kitwright.packing;

import java.util.List;
import kitwright.model.Joint;
import kitwright.model.JointBox;

/** Puts a kit's joints into joint boxes of one size and mass limit. */
public interface JointBoxer {

    /**
     * Boxes every joint.
     *
     * @throws IllegalArgumentException when a joint is larger than the box or heavier than its mass limit (the
     *                                  message names the mark and the box)
     */
    List<JointBoxLoad> box(List<Joint> joints, JointBox box);
}
