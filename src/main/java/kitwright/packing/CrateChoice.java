package kitwright.packing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Deadline;
import kitwright.model.CrateType;

/**
 * Which crates to fill and how: the crate mix of least total cost, then fewest crates, as a list of layouts that
 * together hold at least every item (surplus places are dropped later), by the steps of {@link CoverSearch} with
 * {@link CrateFiller} as the filling.
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
    private final long maxFillings;
    private final Deadline deadline;
    /** Crate fillings spent so far: the deterministic step counter of this choice. */
    private long fillings;

    /**
     * @param maxFillings crate fillings ({@link CrateFiller} calls) the choice may spend in all: there is one
     *                    construction per crate type and per pair of types, so their work grows with the square of
     *                    the catalog, and the candidate patterns take (40 + item types) fillings per crate type;
     *                    past the budget no further construction, candidate or pricing filling is tried (the first
     *                    construction, over every crate type, always runs, so a cover is always found)
     * @param deadline    the crating stage's deadline: once passed, likewise
     */
    CrateChoice(PatternCover cover, int pricingRounds, long maxFillings, Deadline deadline) {
        this.cover = cover;
        this.pricingRounds = pricingRounds;
        this.maxFillings = maxFillings;
        this.deadline = deadline;
    }

    /** Crate fillings spent in the last {@link #choose}. */
    long fillings() {
        return fillings;
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
        CoverSearch.Share<CrateLayout> share = (layout, left) -> share(layout, left, types);
        fillings = 0;
        boolean first = true;
        for (boolean boxesFirst : new boolean[] {false, true}) {
            CoverSearch.Filling<CrateLayout> filling = boxesFirst
                    ? (t, left) -> count(filler.fills(t, crates.get(t), types, left))
                    : (t, left) -> count(List.of(filler.fill(t, crates.get(t), types, left)));
            for (int[] allowed : subsets) {
                if (!first && spent()) {
                    break;
                }
                first = false;
                List<CrateLayout> run = CoverSearch.greedy(demand, allowed, crateCost, filling, share, patterns);
                double c = CoverSearch.total(run, crateCost);
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
        for (int t = 0; t < crates.size() && !spent(); t++) {
            for (ItemType it : types) {
                int[] only = new int[types.size()];
                only[it.index()] = it.demand();
                fillings++;
                CoverSearch.add(patterns, filler.fill(t, crates.get(t), types, only));
            }
        }
        complements(crates, types, demand, patterns);
        CoverSearch.price(pricingRounds, crates.size(), crateCost, demand,
                (t, duals) -> offers(crates.get(t), types, duals),
                (t, offer) -> spent() ? List.of() : count(filler.fills(t, crates.get(t), types, offer)), patterns,
                deadline);
        return CoverSearch.choose(cover, patterns, crateCost, demand, best);
    }

    /** True when the budget of fillings is spent or the deadline has passed. */
    private boolean spent() {
        return fillings >= maxFillings || deadline.passed();
    }

    private List<CrateLayout> count(List<CrateLayout> layouts) {
        fillings++;
        return layouts;
    }

    private static int[] allTypes(int n) {
        int[] all = new int[n];
        Arrays.setAll(all, i -> i);
        return all;
    }

    /** A layout's share of what is left: the larger of its bounding-box volume share and its mass share. */
    private static double share(CrateLayout layout, int[] left, List<ItemType> types) {
        double volumeLeft = 0;
        double massLeft = 0;
        for (ItemType t : types) {
            volumeLeft += left[t.index()] * t.boxVolume();
            massLeft += left[t.index()] * t.massKg();
        }
        return Math.max(layout.volume(types) / volumeLeft, massLeft > 0 ? layout.massKg() / massLeft : 0);
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
            if (spent()) {
                return;
            }
            int[] rest = new int[demand.length];
            for (int i = 0; i < rest.length; i++) {
                rest[i] = Math.max(0, demand[i] - p.counts()[i]);
            }
            if (Arrays.stream(rest).allMatch(n -> n == 0)) {
                continue;
            }
            for (int t = 0; t < crates.size(); t++) {
                for (CrateLayout layout : count(filler.fills(t, crates.get(t), types, rest))) {
                    CoverSearch.add(patterns, layout);
                }
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
