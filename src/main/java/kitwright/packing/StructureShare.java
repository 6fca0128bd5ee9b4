package kitwright.packing;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import kitwright.model.Joint;
import kitwright.model.StructureCount;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;

/**
 * What to ship for one structure of the kit ({@code --for STRUCTURE}): the bundles that hold the tubes the
 * structure needs (structures.csv counts), and the joints. Nested tubes travel in whole bundles, so the bundles
 * are chosen by a greedy cover: the bundle with the largest share of still-needed tubes first (ties: more needed
 * tubes, then input order), until every mark's count is met; the bundles keep their input order, and tubes beyond
 * the counts riding in them are reported as extra. structures.csv counts bars only, so the joints are all the kit's joints unless the
 * structure's rows name joint marks, whose counts are then used.
 *
 * @param extraTubes tubes shipped beyond the structure's counts, by mark
 * @param allJoints  true when every joint of the kit is shipped because the structure names no joint marks
 */
public record StructureShare(String structure, List<Bundle> bundles, List<Joint> joints,
                             Map<String, Integer> extraTubes, boolean allJoints) {

    public StructureShare {
        bundles = List.copyOf(bundles);
        joints = List.copyOf(joints);
        extraTubes = Map.copyOf(extraTubes);
    }

    /**
     * @throws IllegalArgumentException when the structure is not in structures.csv (the message lists those that
     *                                  are), or the bundles lack tubes it needs
     */
    public static StructureShare of(String structure, List<Bundle> bundles, List<Joint> joints,
                                    List<StructureCount> counts) {
        TreeSet<String> known = new TreeSet<>();
        Map<String, Integer> needed = new TreeMap<>();
        for (StructureCount c : counts) {
            known.add(c.structure());
            if (c.structure().equals(structure)) {
                needed.merge(c.mark(), c.count(), Integer::sum);
            }
        }
        if (!known.contains(structure)) {
            throw new IllegalArgumentException("structure '" + structure + "' is not in structures.csv (expected one"
                    + " of: " + (known.isEmpty() ? "none, the kit has no structures.csv" : String.join(", ", known))
                    + ")");
        }
        Map<String, Integer> jointNeeds = new TreeMap<>();
        for (Joint j : joints) {
            Integer n = needed.remove(j.mark());
            if (n != null) {
                jointNeeds.put(j.mark(), Math.min(n, j.quantity()));
            }
        }
        List<Map<String, Integer>> contents = new ArrayList<>();
        for (Bundle b : bundles) {
            Map<String, Integer> marks = new TreeMap<>();
            count(b.host(), marks);
            contents.add(marks);
        }
        boolean[] taken = new boolean[bundles.size()];
        List<Bundle> chosen = new ArrayList<>();
        Map<String, Integer> left = new TreeMap<>(needed);
        left.values().removeIf(n -> n <= 0);
        while (!left.isEmpty()) {
            int best = -1;
            double bestShare = 0;
            int bestUseful = 0;
            for (int i = 0; i < bundles.size(); i++) {
                if (taken[i]) {
                    continue;
                }
                int useful = 0;
                int total = 0;
                for (Map.Entry<String, Integer> e : contents.get(i).entrySet()) {
                    useful += Math.min(e.getValue(), left.getOrDefault(e.getKey(), 0));
                    total += e.getValue();
                }
                double share = useful / (double) total;
                if (useful > 0 && (best < 0 || share > bestShare + 1e-12
                        || (Math.abs(share - bestShare) <= 1e-12 && useful > bestUseful))) {
                    best = i;
                    bestShare = share;
                    bestUseful = useful;
                }
            }
            if (best < 0) {
                throw new IllegalArgumentException("the bundles lack tubes structure '" + structure + "' needs: "
                        + left);
            }
            taken[best] = true;
            chosen.add(bundles.get(best));
            contents.get(best).forEach((mark, n) -> left.computeIfPresent(mark, (m, k) -> k - n > 0 ? k - n : null));
        }
        chosen.clear();
        Map<String, Integer> extra = new TreeMap<>();
        for (int i = 0; i < bundles.size(); i++) {
            if (taken[i]) {
                chosen.add(bundles.get(i));
                contents.get(i).forEach((mark, n) -> extra.merge(mark, n, Integer::sum));
            }
        }
        needed.forEach((mark, n) -> extra.computeIfPresent(mark, (m, k) -> k - n > 0 ? k - n : null));
        boolean all = jointNeeds.isEmpty();
        List<Joint> shipped = all ? joints : joints.stream().filter(j -> jointNeeds.containsKey(j.mark()))
                .map(j -> new Joint(j.mark(), j.diameterMm(), j.massKg(), jointNeeds.get(j.mark()))).toList();
        return new StructureShare(structure, chosen, shipped, extra, all);
    }

    private static void count(NestedTube tube, Map<String, Integer> marks) {
        marks.merge(tube.mark(), 1, Integer::sum);
        tube.guests().forEach(g -> count(g, marks));
    }
}
