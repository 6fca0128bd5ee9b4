package kitwright.nesting;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Identical tubes (same mark, section, sizes, length and mass), which any plan may swap freely.
 *
 * @param index   position in {@link #of(NestingProblem)}'s list
 * @param sample  one of the tubes, for its sizes
 * @param members ids of all tubes of this type, ascending
 */
record TubeType(int index, Tube sample, List<Integer> members) {
    TubeType {
        members = List.copyOf(members);
    }

    int count() {
        return members.size();
    }

    /** Widest first, then longest, then by mark: the order hosts and guests are considered in. */
    static final Comparator<Tube> LARGEST_FIRST = Comparator.comparingDouble(Tube::outerDiameterMm).reversed()
            .thenComparing(Comparator.comparingDouble(Tube::lengthMm).reversed())
            .thenComparing(Tube::mark).thenComparing(Tube::section).thenComparingInt(Tube::id);

    /** The types of a problem's tubes, widest first. */
    static List<TubeType> of(NestingProblem problem) {
        Map<List<Object>, List<Integer>> groups = new LinkedHashMap<>();
        Map<List<Object>, Tube> samples = new LinkedHashMap<>();
        problem.tubes().stream().sorted(LARGEST_FIRST).forEach(t -> {
            List<Object> key = List.of(t.mark(), t.section(), t.outerDiameterMm(), t.boreMm(), t.lengthMm(),
                    t.massKg());
            groups.computeIfAbsent(key, k -> new ArrayList<>()).add(t.id());
            samples.putIfAbsent(key, t);
        });
        List<TubeType> types = new ArrayList<>();
        for (Map.Entry<List<Object>, List<Integer>> e : groups.entrySet()) {
            List<Integer> members = new ArrayList<>(e.getValue());
            members.sort(null);
            types.add(new TubeType(types.size(), samples.get(e.getKey()), members));
        }
        return types;
    }
}
