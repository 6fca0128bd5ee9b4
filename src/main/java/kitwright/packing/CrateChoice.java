package kitwright.packing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.CrateType;

/**
 * Which crates to fill and how: the crate mix of least total cost, then fewest crates, as a list of layouts that
 * together hold at least every item (surplus places are dropped later).
 *
 * <ol>
 *   <li>Construction, a greedy set cover (Chvátal 1979): fill one crate of every type from what is left, keep the
 *   one with the least cost per share of the remaining job (the larger of its volume share and mass share),
 *   repeat. The same run with one crate type and with each pair of types, and all again with the boxes-first layouts of
 *   {@link CrateFiller#fills} as further choices, give more complete covers; the cheapest starts the search.</li>
 *   <li>Candidate patterns: every crate filled on the way, one crate of each type holding a single item type, and
 *   patterns priced by the duals of {@link CoverRelaxation} (column generation, Gilmore &amp; Gomory 1961; the
 *   pricing is {@link CrateFiller}, a heuristic, so the LP value is no bound).</li>
 *   <li>{@link PatternCover}: CP-SAT picks how often to use each pattern, started from the cheapest cover.</li>
 * </ol>
 */
final class CrateChoice {
    private static final double EPS = 1e-9;
    /** How many of the first patterns get complements. */
    private static final int COMPLEMENTS = 40;

    private final CrateFiller filler = new CrateFiller();
    private final PatternCover cover;
    private final int pricingRounds;

    CrateChoice(PatternCover cover, int pricingRounds) {
        this.cover = cover;
        this.pricingRounds = pricingRounds;
    }

    /** Layouts, one per crate, covering every item; empty when some item fits no crate. */
    List<CrateLayout> choose(List<CrateType> crates, double[] crateCost, List<ItemType> types) {
        int[] demand = types.stream().mapToInt(ItemType::demand).toArray();
        Map<String, CrateLayout> patterns = new LinkedHashMap<>();
        List<CrateLayout> best = List.of();
        double bestCost = Double.MAX_VALUE;
        List<int[]> subsets = new ArrayList<>();
        subsets.add(allTypes(crates.size()));
        for (int t = 0; t < crates.size(); t++) {
            for (int u = t; u < crates.size(); u++) {
                subsets.add(t == u ? new int[] {t} : new int[] {t, u});
            }
        }
        for (boolean boxesFirst : new boolean[] {false, true}) {
            for (int[] allowed : subsets) {
                List<CrateLayout> run = greedy(crates, crateCost, types, demand, allowed, boxesFirst, patterns);
                double c = cost(run, crateCost);
                if (!run.isEmpty() && (best.isEmpty() || c < bestCost - EPS
                        || (Math.abs(c - bestCost) <= EPS && run.size() < best.size()))) {
                    best = run;
                    bestCost = c;
                }
            }
        }
        if (best.isEmpty()) {
            return best;
        }
        for (int t = 0; t < crates.size(); t++) {
            for (ItemType it : types) {
                int[] only = new int[types.size()];
                only[it.index()] = it.demand();
                add(patterns, filler.fill(t, crates.get(t), types, only));
            }
        }
        complements(crates, types, demand, patterns);
        priceColumns(crates, crateCost, types, demand, patterns);

        List<CrateLayout> list = new ArrayList<>(patterns.values());
        int[][] counts = list.stream().map(CrateLayout::counts).toArray(int[][]::new);
        double[] cost = list.stream().mapToDouble(l -> crateCost[l.crateType()]).toArray();
        int[] hint = new int[list.size()];
        Map<String, Integer> index = new LinkedHashMap<>();
        for (int p = 0; p < list.size(); p++) {
            index.put(list.get(p).key(), p);
        }
        for (CrateLayout l : best) {
            hint[index.get(l.key())]++;
        }
        int[] uses = cover.solve(counts, cost, demand, hint).uses();
        List<CrateLayout> chosen = new ArrayList<>();
        for (int p = 0; p < list.size(); p++) {
            for (int k = 0; k < uses[p]; k++) {
                chosen.add(list.get(p));
            }
        }
        chosen.sort(Comparator.comparingInt(CrateLayout::crateType));
        return chosen;
    }

    private static int[] allTypes(int n) {
        int[] all = new int[n];
        Arrays.setAll(all, i -> i);
        return all;
    }

    private static double cost(List<CrateLayout> layouts, double[] crateCost) {
        return layouts.stream().mapToDouble(l -> crateCost[l.crateType()]).sum();
    }

    private static void add(Map<String, CrateLayout> patterns, CrateLayout layout) {
        if (!layout.isEmpty()) {
            patterns.putIfAbsent(layout.key(), layout);
        }
    }

    /** Greedy set cover with the given crate types; empty when it cannot cover everything. */
    private List<CrateLayout> greedy(List<CrateType> crates, double[] crateCost, List<ItemType> types, int[] demand,
                                     int[] allowed, boolean boxesFirst, Map<String, CrateLayout> patterns) {
        int[] left = demand.clone();
        List<CrateLayout> result = new ArrayList<>();
        while (Arrays.stream(left).anyMatch(n -> n > 0)) {
            double volumeLeft = 0;
            double massLeft = 0;
            for (ItemType t : types) {
                volumeLeft += left[t.index()] * t.boxVolume();
                massLeft += left[t.index()] * t.massKg();
            }
            CrateLayout pick = null;
            double pickScore = Double.MAX_VALUE;
            double pickShare = 0;
            for (int t : allowed) {
                List<CrateLayout> layouts = boxesFirst ? filler.fills(t, crates.get(t), types, left)
                        : List.of(filler.fill(t, crates.get(t), types, left));
                for (CrateLayout layout : layouts) {
                    if (layout.isEmpty()) {
                        continue;
                    }
                    add(patterns, layout);
                    double share = Math.max(layout.volume(types) / volumeLeft,
                            massLeft > 0 ? layout.massKg() / massLeft : 0);
                    double score = crateCost[t] / Math.max(share, EPS);
                    if (pick == null || score < pickScore - EPS
                            || (Math.abs(score - pickScore) <= EPS && share > pickShare + EPS)) {
                        pick = layout;
                        pickScore = score;
                        pickShare = share;
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
     * For the first patterns found, a crate of every type filled with what such a pattern leaves: pairs of crates
     * that together hold a small job, which the greedy runs, filling the first crate fullest, may miss.
     */
    private void complements(List<CrateType> crates, List<ItemType> types, int[] demand,
                             Map<String, CrateLayout> patterns) {
        List<CrateLayout> first = new ArrayList<>(patterns.values()).subList(0, Math.min(COMPLEMENTS,
                patterns.size()));
        for (CrateLayout p : first) {
            int[] rest = new int[demand.length];
            for (int i = 0; i < rest.length; i++) {
                rest[i] = Math.max(0, demand[i] - p.counts()[i]);
            }
            if (Arrays.stream(rest).allMatch(n -> n == 0)) {
                continue;
            }
            for (int t = 0; t < crates.size(); t++) {
                for (CrateLayout layout : filler.fills(t, crates.get(t), types, rest)) {
                    add(patterns, layout);
                }
            }
        }
    }

    /** Column generation rounds: add crates whose reduced cost under the LP duals is negative. */
    private void priceColumns(List<CrateType> crates, double[] crateCost, List<ItemType> types, int[] demand,
                              Map<String, CrateLayout> patterns) {
        CoverRelaxation relaxation = new CoverRelaxation();
        for (int round = 0; round < pricingRounds; round++) {
            List<CrateLayout> list = new ArrayList<>(patterns.values());
            CoverRelaxation.Solution lp = relaxation.solve(list.stream().map(CrateLayout::counts)
                    .toArray(int[][]::new), list.stream().mapToDouble(l -> crateCost[l.crateType()]).toArray(),
                    demand);
            if (lp == null) {
                return;
            }
            int before = patterns.size();
            for (int t = 0; t < crates.size(); t++) {
                for (int[] offer : offers(crates.get(t), types, lp.duals())) {
                    for (CrateLayout layout : filler.fills(t, crates.get(t), types, offer)) {
                        double value = 0;
                        for (int i = 0; i < offer.length; i++) {
                            value += lp.duals()[i] * layout.counts()[i];
                        }
                        if (crateCost[t] - value < -1e-7 * Math.max(1, crateCost[t])) {
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
     * What to offer a crate when pricing: every item type with a positive dual; and the types in order of dual
     * per share of the crate (the larger of volume share and mass share), until the crate is notionally full.
     */
    private static List<int[]> offers(CrateType crate, List<ItemType> types, double[] duals) {
        int[] positive = new int[types.size()];
        for (ItemType t : types) {
            positive[t.index()] = duals[t.index()] > EPS ? t.demand() : 0;
        }
        double volume = crate.innerLengthMm() * crate.innerWidthMm() * crate.innerHeightMm();
        double net = Math.max(EPS, crate.maxGrossKg() - crate.tareKg());
        double[] share = new double[types.size()];
        for (ItemType t : types) {
            share[t.index()] = Math.max(t.boxVolume() / volume, t.massKg() / net);
        }
        List<ItemType> byDensity = types.stream().filter(t -> duals[t.index()] > EPS)
                .sorted(Comparator.<ItemType>comparingDouble(t -> -duals[t.index()] / share[t.index()])
                        .thenComparingInt(ItemType::index))
                .toList();
        int[] dense = new int[types.size()];
        double used = 0;
        for (ItemType t : byDensity) {
            while (dense[t.index()] < t.demand() && used + share[t.index()] <= 1 + EPS) {
                dense[t.index()]++;
                used += share[t.index()];
            }
        }
        return List.of(positive, dense);
    }
}
