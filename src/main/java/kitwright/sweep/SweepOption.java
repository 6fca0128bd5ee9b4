package kitwright.sweep;

import java.util.List;
import java.util.Objects;

/**
 * One kit option of the sweep: K marks and the mark each member takes.
 *
 * @param marks               K
 * @param kit                 the option's folder name, kNN
 * @param largestChangeTenths largest |target - mark| of any member, tenths of a millimetre
 * @param squaredChange       sum of squared changes, tenths squared
 * @param kitMarks            the marks in section order, longest first within a section
 * @param members             every member in the input order, with its mark and change
 */
public record SweepOption(int marks, String kit, long largestChangeTenths, long squaredChange,
                          List<KitMark> kitMarks, List<MemberMark> members) {
    public SweepOption {
        Objects.requireNonNull(kit, "kit");
        kitMarks = List.copyOf(kitMarks);
        members = List.copyOf(members);
        if (kitMarks.size() != marks) {
            throw new IllegalArgumentException(kit + ": " + kitMarks.size() + " marks, expected " + marks);
        }
    }

    /**
     * A mark of the option.
     *
     * @param name           mark name, e.g. A2
     * @param nodeToNodeTenths node-to-node length in tenths of a millimetre
     * @param shortestTenths shortest target it serves
     * @param longestTenths  longest target it serves
     */
    public record KitMark(String name, String section, long nodeToNodeTenths, long shortestTenths,
                          long longestTenths) {
    }

    /** A member and the mark it takes; change = mark - target, in tenths (negative: the mark is shorter). */
    public record MemberMark(Member member, String mark, long changeTenths) {
    }

    /** The largest change in millimetres. */
    public double largestChangeMm() {
        return largestChangeTenths / 10.0;
    }

    /** The mean absolute change over all members, in millimetres. */
    public double meanChangeMm() {
        if (members.isEmpty()) {
            return 0;
        }
        long total = members.stream().mapToLong(m -> Math.abs(m.changeTenths())).sum();
        return total / 10.0 / members.size();
    }
}
