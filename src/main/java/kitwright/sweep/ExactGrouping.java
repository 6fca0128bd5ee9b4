package kitwright.sweep;

import java.util.ArrayList;
import java.util.List;

/**
 * Problem: group every section's target lengths into K marks over all sections together, each section with marks
 * of its own, marks in whole tenths of a millimetre: least largest change of any member first, then least sum of
 * squared changes.
 *
 * <p>Method: the least largest change D by {@link LeastLargestChange} (greedy cover, binary search); then per
 * section the groupings within D for every mark count by {@link LeastSquaresGroups}; then the share of the K marks
 * among the sections by {@link MarkSplit}.
 *
 * <p>Guarantee: exact for both objectives in that order (lexicographic); deterministic.
 */
public final class ExactGrouping {
    private ExactGrouping() {
    }

    /**
     * @param sections the sections' lengths
     * @param marks    K, from the number of sections to the number of distinct (section, length) pairs
     */
    public static Grouping of(List<SectionLengths> sections, int marks) {
        int distinct = sections.stream().mapToInt(s -> s.lengths().size()).sum();
        if (marks < sections.size() || marks > distinct) {
            throw new IllegalArgumentException(marks + " marks for " + sections.size() + " sections and "
                    + distinct + " distinct lengths");
        }
        List<long[]> values = sections.stream().map(SectionLengths::values).toList();
        long change = LeastLargestChange.of(values, marks);
        int most = marks - sections.size() + 1; // each other section keeps at least one mark
        List<LeastSquaresGroups> solved = new ArrayList<>();
        for (SectionLengths s : sections) {
            solved.add(LeastSquaresGroups.solve(s, change, most));
        }
        int[] share = MarkSplit.split(solved, marks);
        if (share == null) {
            throw new IllegalStateException("no share of " + marks + " marks within " + change);
        }
        List<Grouping.SectionMarks> result = new ArrayList<>();
        long squared = 0;
        for (int s = 0; s < sections.size(); s++) {
            squared += solved.get(s).cost(share[s]);
            List<Grouping.GroupedMark> marksOf = solved.get(s).groups(share[s]).stream()
                    .map(g -> new Grouping.GroupedMark(g.markTenths(), g.shortestTenths(), g.longestTenths()))
                    .toList();
            result.add(new Grouping.SectionMarks(sections.get(s).section(), marksOf));
        }
        return new Grouping(change, squared, result);
    }
}
