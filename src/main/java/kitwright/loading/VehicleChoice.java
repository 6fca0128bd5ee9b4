package kitwright.loading;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.model.VehicleType;
import kitwright.packing.CoverRelaxation;
import kitwright.packing.PatternCover;

/**
 * Which vehicles to load and how: the vehicle mix of least total trip cost, then fewest trips.
 *
 * <ol>
 *   <li>Construction, a greedy set cover (Chvátal 1979): load one vehicle of every type from the crates left,
 *   keep the one with the least cost per share of the remaining job (the larger of its mass and volume shares),
 *   repeat; the same with one vehicle type at a time.</li>
 *   <li>Candidate loads: every deck filled on the way, each type with a single crate class, and decks priced by
 *   the duals of the linear relaxation (column generation; a heuristic pricing, so no bound).</li>
 *   <li>{@link PatternCover}: CP-SAT chooses how often to use each load, started from the cheapest construction.</li>
 * </ol>
 */
final class VehicleChoice {
    private static final double EPS = 1e-9;

    private final DeckFiller filler = new DeckFiller();
    private final PatternCover cover;
    private final int pricingRounds;

    VehicleChoice(PatternCover cover, int pricingRounds) {
        this.cover = cover;
        this.pricingRounds = pricingRounds;
    }

    /** The cheapest construction found (a complete cover), or empty when some crate cannot be loaded. */
    List<DeckLayout> construct(List<VehicleType> vehicles, double[] cost, List<CrateClass> classes,
                               Map<String, DeckLayout> patterns) {
        int[] demand = classes.stream().mapToInt(CrateClass::demand).toArray();
        int[] all = new int[vehicles.size()];
        Arrays.setAll(all, i -> i);
        List<DeckLayout> best = greedy(vehicles, cost, classes, demand, all, patterns);
        for (int v = 0; v < vehicles.size(); v++) {
            List<DeckLayout> single = greedy(vehicles, cost, classes, demand, new int[] {v}, patterns);
            if (!single.isEmpty() && (best.isEmpty() || total(single, cost) < total(best, cost) - EPS
                    || (Math.abs(total(single, cost) - total(best, cost)) <= EPS && single.size() < best.size()))) {
                best = single;
            }
        }
        return best;
    }

    /** Improves a construction by the pattern cover; the result may cover some classes more than demanded. */
    List<DeckLayout> improve(List<VehicleType> vehicles, double[] cost, List<CrateClass> classes,
                             Map<String, DeckLayout> patterns, List<DeckLayout> construction) {
        int[] demand = classes.stream().mapToInt(CrateClass::demand).toArray();
        for (int v = 0; v < vehicles.size(); v++) {
            for (CrateClass c : classes) {
                int[] only = new int[classes.size()];
                only[c.index()] = c.demand();
                add(patterns, filler.fill(v, vehicles.get(v), classes, only));
            }
        }
        price(vehicles, cost, classes, demand, patterns);
        List<DeckLayout> list = new ArrayList<>(patterns.values());
        Map<String, Integer> index = new LinkedHashMap<>();
        for (int p = 0; p < list.size(); p++) {
            index.put(list.get(p).key(), p);
        }
        int[] hint = new int[list.size()];
        for (DeckLayout d : construction) {
            hint[index.get(d.key())]++;
        }
        int[] uses = cover.solve(list.stream().map(DeckLayout::counts).toArray(int[][]::new),
                list.stream().mapToDouble(d -> cost[d.vehicleType()]).toArray(), demand, hint).uses();
        List<DeckLayout> chosen = new ArrayList<>();
        for (int p = 0; p < list.size(); p++) {
            for (int k = 0; k < uses[p]; k++) {
                chosen.add(list.get(p));
            }
        }
        chosen.sort(Comparator.comparingInt(DeckLayout::vehicleType));
        return chosen;
    }

    static double total(List<DeckLayout> decks, double[] cost) {
        return decks.stream().mapToDouble(d -> cost[d.vehicleType()]).sum();
    }

    private static void add(Map<String, DeckLayout> patterns, DeckLayout d) {
        if (!d.isEmpty()) {
            patterns.putIfAbsent(d.key(), d);
        }
    }

    private List<DeckLayout> greedy(List<VehicleType> vehicles, double[] cost, List<CrateClass> classes,
                                    int[] demand, int[] allowed, Map<String, DeckLayout> patterns) {
        int[] left = demand.clone();
        List<DeckLayout> result = new ArrayList<>();
        while (Arrays.stream(left).anyMatch(n -> n > 0)) {
            double massLeft = 0;
            double volumeLeft = 0;
            for (CrateClass c : classes) {
                massLeft += left[c.index()] * c.massKg();
                volumeLeft += left[c.index()] * c.volume();
            }
            DeckLayout pick = null;
            double pickScore = Double.MAX_VALUE;
            double pickShare = 0;
            for (int v : allowed) {
                DeckLayout d = filler.fill(v, vehicles.get(v), classes, left);
                if (d.isEmpty()) {
                    continue;
                }
                add(patterns, d);
                double volume = 0;
                for (CrateClass c : classes) {
                    volume += d.counts()[c.index()] * c.volume();
                }
                double share = Math.max(massLeft > 0 ? d.massKg() / massLeft : 0, volume / volumeLeft);
                double score = cost[v] / Math.max(share, EPS);
                if (pick == null || score < pickScore - EPS
                        || (Math.abs(score - pickScore) <= EPS && share > pickShare + EPS)) {
                    pick = d;
                    pickScore = score;
                    pickShare = share;
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

    private void price(List<VehicleType> vehicles, double[] cost, List<CrateClass> classes, int[] demand,
                       Map<String, DeckLayout> patterns) {
        CoverRelaxation relaxation = new CoverRelaxation();
        for (int round = 0; round < pricingRounds; round++) {
            List<DeckLayout> list = new ArrayList<>(patterns.values());
            CoverRelaxation.Solution lp = relaxation.solve(list.stream().map(DeckLayout::counts)
                    .toArray(int[][]::new), list.stream().mapToDouble(d -> cost[d.vehicleType()]).toArray(), demand);
            if (lp == null) {
                return;
            }
            int before = patterns.size();
            for (int v = 0; v < vehicles.size(); v++) {
                int[] offer = new int[classes.size()];
                for (CrateClass c : classes) {
                    offer[c.index()] = lp.duals()[c.index()] > EPS ? c.demand() : 0;
                }
                DeckLayout d = filler.fill(v, vehicles.get(v), classes, offer);
                double value = 0;
                for (int i = 0; i < offer.length; i++) {
                    value += lp.duals()[i] * d.counts()[i];
                }
                if (cost[v] - value < -1e-7 * Math.max(1, cost[v])) {
                    add(patterns, d);
                }
            }
            if (patterns.size() == before) {
                return;
            }
        }
    }
}
