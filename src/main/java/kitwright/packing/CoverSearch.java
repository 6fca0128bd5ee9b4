package kitwright.packing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Deadline;

/**
 * The steps the crate mix and the vehicle mix share, over patterns of any container ({@link CoverPattern}):
 * <ol>
 *   <li>{@link #greedy}: a greedy set cover (Chvátal 1979): fill one container of every allowed type from what is
 *   left, keep the one with the least cost per share of the remaining job, repeat.</li>
 *   <li>{@link #price}: column generation rounds (Gilmore &amp; Gomory 1961): the duals of the linear relaxation
 *   over the patterns so far ({@link CoverRelaxation}) decide what to offer a container; fillings whose reduced
 *   cost is negative join the patterns. The filling is a heuristic, so the LP value is no bound.</li>
 *   <li>{@link #choose}: {@link PatternCover} (CP-SAT) picks how often to use each pattern, started from a known
 *   cover.</li>
 * </ol>
 * Patterns are kept by {@link CoverPattern#key()} in the order first found, so the result depends only on the
 * input.
 */
public final class CoverSearch {
    private static final double EPS = 1e-9;

    private CoverSearch() {
    }

    /** The fillings of one container of a type from the items on offer (per item type); may be empty ones. */
    @FunctionalInterface
    public interface Filling<L extends CoverPattern> {
        List<L> fill(int containerType, int[] offer);
    }

    /** A filling's share of the job still to do (items left per type), in (0, 1]. */
    @FunctionalInterface
    public interface Share<L extends CoverPattern> {
        double of(L pattern, int[] left);
    }

    /** What to offer a container of a type when pricing, given the duals of the item types. */
    @FunctionalInterface
    public interface Offers {
        List<int[]> of(int containerType, double[] duals);
    }

    /** Keeps a non-empty pattern, the first found of its key. */
    public static <L extends CoverPattern> void add(Map<String, L> patterns, L pattern) {
        if (!pattern.isEmpty()) {
            patterns.putIfAbsent(pattern.key(), pattern);
        }
    }

    /** Total cost of a list of patterns. */
    public static double total(List<? extends CoverPattern> patterns, double[] cost) {
        return patterns.stream().mapToDouble(p -> cost[p.containerType()]).sum();
    }

    /**
     * Greedy set cover with the allowed container types: each step the filling with the least cost per share
     * (ties: the larger share, then the first found); every filling seen joins {@code patterns}. Empty when some
     * items cannot be covered.
     */
    public static <L extends CoverPattern> List<L> greedy(int[] demand, int[] allowed, double[] cost,
                                                          Filling<L> filling, Share<L> share,
                                                          Map<String, L> patterns) {
        int[] left = demand.clone();
        List<L> result = new ArrayList<>();
        while (Arrays.stream(left).anyMatch(n -> n > 0)) {
            L pick = null;
            double pickScore = Double.MAX_VALUE;
            double pickShare = 0;
            for (int t : allowed) {
                for (L layout : filling.fill(t, left)) {
                    if (layout.isEmpty()) {
                        continue;
                    }
                    add(patterns, layout);
                    double s = share.of(layout, left);
                    double score = cost[t] / Math.max(s, EPS);
                    if (pick == null || score < pickScore - EPS
                            || (Math.abs(score - pickScore) <= EPS && s > pickShare + EPS)) {
                        pick = layout;
                        pickScore = score;
                        pickShare = s;
                    }
                }
            }
            if (pick == null) {
                return List.of();
            }
            for (int i = 0; i < left.length; i++) {
                left[i] -= pick.counts()[i];
            }
            result.add(pick);
        }
        return result;
    }

    /**
     * Column generation rounds: per round, the LP over the patterns so far; each container type filled from each
     * offer; fillings with negative reduced cost join {@code patterns}. Stops when a round adds none, or before a
     * round when the stage's deadline has passed.
     */
    public static <L extends CoverPattern> void price(int rounds, int containerTypes, double[] cost, int[] demand,
                                                      Offers offers, Filling<L> filling, Map<String, L> patterns,
                                                      Deadline deadline) {
        CoverRelaxation relaxation = new CoverRelaxation();
        for (int round = 0; round < rounds && !deadline.passed(); round++) {
            List<L> list = new ArrayList<>(patterns.values());
            CoverRelaxation.Solution lp = relaxation.solve(list.stream().map(CoverPattern::counts)
                    .toArray(int[][]::new), list.stream().mapToDouble(p -> cost[p.containerType()]).toArray(),
                    demand);
            if (lp == null) {
                return;
            }
            int before = patterns.size();
            for (int t = 0; t < containerTypes; t++) {
                for (int[] offer : offers.of(t, lp.duals())) {
                    for (L layout : filling.fill(t, offer)) {
                        double value = 0;
                        for (int i = 0; i < offer.length; i++) {
                            value += lp.duals()[i] * layout.counts()[i];
                        }
                        if (cost[t] - value < -1e-7 * Math.max(1, cost[t])) {
                            add(patterns, layout);
                        }
                    }
                }
            }
            if (patterns.size() == before) {
                return;
            }
        }
    }

    /**
     * How often to use each pattern (CP-SAT, {@link PatternCover}), started from {@code start}, whose patterns must
     * be among {@code patterns}; the chosen patterns, by container type. May cover some items more than demanded.
     */
    public static <L extends CoverPattern> List<L> choose(PatternCover cover, Map<String, L> patterns,
                                                          double[] cost, int[] demand, List<L> start) {
        List<L> list = new ArrayList<>(patterns.values());
        Map<String, Integer> index = new LinkedHashMap<>();
        for (int p = 0; p < list.size(); p++) {
            index.put(list.get(p).key(), p);
        }
        int[] hint = new int[list.size()];
        for (L l : start) {
            hint[index.get(l.key())]++;
        }
        int[] uses = cover.solve(list.stream().map(CoverPattern::counts).toArray(int[][]::new),
                list.stream().mapToDouble(p -> cost[p.containerType()]).toArray(), demand, hint).uses();
        List<L> chosen = new ArrayList<>();
        for (int p = 0; p < list.size(); p++) {
            for (int k = 0; k < uses[p]; k++) {
                chosen.add(list.get(p));
            }
        }
        chosen.sort(Comparator.comparingInt(CoverPattern::containerType));
        return chosen;
    }
}
