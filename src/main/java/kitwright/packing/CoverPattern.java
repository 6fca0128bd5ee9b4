package kitwright.packing;

import java.util.Arrays;

/**
 * A filled container (a crate or a vehicle deck) as a column of the set-covering formulation of bin packing and
 * cutting stock (Gilmore &amp; Gomory 1961): its container type and how many items of each type it holds.
 */
public interface CoverPattern {
    /** Index of the container type in its catalog. */
    int containerType();

    /** Items per item type. */
    int[] counts();

    boolean isEmpty();

    /** Identity of the pattern: container type and counts (two patterns with these equal are interchangeable). */
    default String key() {
        return containerType() + ":" + Arrays.toString(counts());
    }
}
