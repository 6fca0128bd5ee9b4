package kitwright.sweep;

import java.util.List;
import java.util.Objects;

/**
 * The target lengths of one section's members: distinct lengths in tenths of a millimetre, ascending, each with how
 * many members want it. Equal lengths are one entry, so no grouping can split them over two marks.
 */
public record SectionLengths(String section, List<Length> lengths) {
    /** A distinct target length and the members that want it. */
    public record Length(long tenths, int members) {
        public Length {
            if (tenths <= 0 || members < 1) {
                throw new IllegalArgumentException("length " + tenths + " x " + members);
            }
        }
    }

    public SectionLengths {
        Objects.requireNonNull(section, "section");
        lengths = List.copyOf(lengths);
        if (lengths.isEmpty()) {
            throw new IllegalArgumentException("section " + section + " has no lengths");
        }
        for (int i = 1; i < lengths.size(); i++) {
            if (lengths.get(i).tenths() <= lengths.get(i - 1).tenths()) {
                throw new IllegalArgumentException("lengths of " + section + " not distinct and ascending");
            }
        }
    }

    /** The distinct lengths, ascending. */
    long[] values() {
        return lengths.stream().mapToLong(Length::tenths).toArray();
    }

    /** The members per distinct length, in the same order. */
    long[] weights() {
        return lengths.stream().mapToLong(Length::members).toArray();
    }
}
