package kitwright.sweep;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * Builds the option of K marks from the members: their lengths grouped exactly ({@link ExactGrouping}), the marks
 * named ({@link MarkNames}), and each member given the nearest mark of its section. The grouping's marks are sorted
 * with contiguous ranges, so the nearest mark is the one of the member's group, or one as near (a member midway
 * between two marks keeps its group's, so equal targets always share a mark). Pure function.
 */
public final class SweepOptions {
    private SweepOptions() {
    }

    /** Each section's distinct lengths with their member counts, in the given section order. */
    public static List<SectionLengths> lengths(List<Member> members, List<String> sectionOrder) {
        Map<String, TreeMap<Long, Integer>> bySection = new HashMap<>();
        for (Member m : members) {
            bySection.computeIfAbsent(m.section(), s -> new TreeMap<>()).merge(m.targetTenths(), 1, Integer::sum);
        }
        List<SectionLengths> lengths = new ArrayList<>();
        for (String section : sectionOrder) {
            TreeMap<Long, Integer> counts = bySection.get(section);
            if (counts == null) {
                throw new IllegalArgumentException("no member of section " + section);
            }
            lengths.add(new SectionLengths(section, counts.entrySet().stream()
                    .map(e -> new SectionLengths.Length(e.getKey(), e.getValue())).toList()));
        }
        if (lengths.size() != bySection.size()) {
            throw new IllegalArgumentException("the section order misses a section of the members");
        }
        return lengths;
    }

    /** The folder name of the option with K marks: k05, k12, k100. */
    public static String folder(int marks) {
        return String.format(Locale.ROOT, "k%02d", marks);
    }

    /**
     * @param members      every member, in input order
     * @param sectionOrder every section of the members once, in naming order (A first)
     * @param names        the naming of marks
     * @param marks        K
     */
    public static SweepOption of(List<Member> members, List<String> sectionOrder, MarkNames names, int marks) {
        List<SectionLengths> lengths = lengths(members, sectionOrder);
        Grouping grouping = ExactGrouping.of(lengths, marks);
        List<SweepOption.KitMark> kitMarks = new ArrayList<>();
        Map<String, Map<Long, SweepOption.KitMark>> byTarget = new HashMap<>();
        for (int s = 0; s < grouping.sections().size(); s++) {
            Grouping.SectionMarks section = grouping.sections().get(s);
            List<Grouping.GroupedMark> ascending = section.marks();
            Map<Long, SweepOption.KitMark> targets = new HashMap<>();
            for (int g = ascending.size() - 1, number = 1; g >= 0; g--, number++) {
                Grouping.GroupedMark mark = ascending.get(g);
                SweepOption.KitMark named = new SweepOption.KitMark(names.name(s, number), section.section(),
                        mark.markTenths(), mark.shortestTenths(), mark.longestTenths());
                kitMarks.add(named);
                for (SectionLengths.Length l : lengths.get(s).lengths()) {
                    if (l.tenths() >= mark.shortestTenths() && l.tenths() <= mark.longestTenths()) {
                        targets.put(l.tenths(), named);
                    }
                }
            }
            byTarget.put(section.section(), targets);
        }
        List<SweepOption.MemberMark> assigned = new ArrayList<>(members.size());
        long largest = 0;
        long squared = 0;
        for (Member m : members) {
            SweepOption.KitMark mark = byTarget.get(m.section()).get(m.targetTenths());
            long change = mark.nodeToNodeTenths() - m.targetTenths();
            largest = Math.max(largest, Math.abs(change));
            squared += change * change;
            assigned.add(new SweepOption.MemberMark(m, mark.name(), change));
        }
        return new SweepOption(marks, folder(marks), largest, squared, kitMarks, assigned);
    }
}
