package kitwright.sweep;

import java.util.List;
import java.util.Objects;

/**
 * The exact grouping of all sections' target lengths into K marks.
 *
 * @param largestChangeTenths the least largest change of any member, in tenths of a millimetre
 * @param squaredChange       the least sum of squared changes under it, over all members, in tenths squared
 * @param sections            per section (in the given order), its marks ascending with the lengths each serves
 */
public record Grouping(long largestChangeTenths, long squaredChange, List<SectionMarks> sections) {
    public Grouping {
        sections = List.copyOf(sections);
    }

    /** One section's marks. */
    public record SectionMarks(String section, List<GroupedMark> marks) {
        public SectionMarks {
            Objects.requireNonNull(section, "section");
            marks = List.copyOf(marks);
        }
    }

    /**
     * A mark and the contiguous range of target lengths it serves.
     *
     * @param markTenths     node-to-node length of the mark
     * @param shortestTenths shortest target it serves
     * @param longestTenths  longest target it serves
     */
    public record GroupedMark(long markTenths, long shortestTenths, long longestTenths) {
        public GroupedMark {
            if (shortestTenths > longestTenths) {
                throw new IllegalArgumentException("empty group");
            }
        }
    }

    /** Total marks. */
    public int marks() {
        return sections.stream().mapToInt(s -> s.marks().size()).sum();
    }
}
