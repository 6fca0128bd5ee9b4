package kitwright.loading;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import kitwright.cutting.Deadline;
import kitwright.model.VehicleType;
import kitwright.packing.CoverSearch;
import kitwright.packing.PatternCover;

/**
 * Which vehicles to load and how: the vehicle mix of least total trip cost, then fewest trips, by the steps
 * of {@link CoverSearch} with {@link DeckFiller} as the filling.
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
    private final Deadline deadline;

    /** @param deadline the loading stage's deadline: once passed, no further construction or pricing round runs */
    VehicleChoice(PatternCover cover, int pricingRounds, Deadline deadline) {
        this.cover = cover;
        this.pricingRounds = pricingRounds;
        this.deadline = deadline;
    }

    /** The cheapest construction found (a complete cover), or empty when some crate cannot be loaded. */
    List<DeckLayout> construct(List<VehicleType> vehicles, double[] cost, List<CrateClass> classes,
                               Map<String, DeckLayout> patterns) {
        int[] demand = classes.stream().mapToInt(CrateClass::demand).toArray();
        int[] all = new int[vehicles.size()];
        Arrays.setAll(all, i -> i);
        CoverSearch.Filling<DeckLayout> filling = (v, left) -> List.of(filler.fill(v, vehicles.get(v), classes,
                left));
        CoverSearch.Share<DeckLayout> share = (deck, left) -> share(deck, left, classes);
        List<DeckLayout> best = CoverSearch.greedy(demand, all, cost, filling, share, patterns);
        for (int v = 0; v < vehicles.size() && !deadline.passed(); v++) {
            List<DeckLayout> single = CoverSearch.greedy(demand, new int[] {v}, cost, filling, share, patterns);
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
        for (int v = 0; v < vehicles.size() && !deadline.passed(); v++) {
            for (CrateClass c : classes) {
                int[] only = new int[classes.size()];
                only[c.index()] = c.demand();
                CoverSearch.add(patterns, filler.fill(v, vehicles.get(v), classes, only));
            }
        }
        CoverSearch.price(pricingRounds, vehicles.size(), cost, demand, (v, duals) -> List.of(positive(classes,
                duals)), (v, offer) -> List.of(filler.fill(v, vehicles.get(v), classes, offer)), patterns, deadline);
        return CoverSearch.choose(cover, patterns, cost, demand, construction);
    }

    static double total(List<DeckLayout> decks, double[] cost) {
        return CoverSearch.total(decks, cost);
    }

    /** A deck's share of what is left: the larger of its mass share and its volume share. */
    private static double share(DeckLayout deck, int[] left, List<CrateClass> classes) {
        double massLeft = 0;
        double volumeLeft = 0;
        for (CrateClass c : classes) {
            massLeft += left[c.index()] * c.massKg();
            volumeLeft += left[c.index()] * c.volume();
        }
        double volume = 0;
        for (CrateClass c : classes) {
            volume += deck.counts()[c.index()] * c.volume();
        }
        return Math.max(massLeft > 0 ? deck.massKg() / massLeft : 0, volume / volumeLeft);
    }

    /** What to offer a vehicle when pricing: every crate class with a positive dual. */
    private static int[] positive(List<CrateClass> classes, double[] duals) {
        int[] offer = new int[classes.size()];
        for (CrateClass c : classes) {
            offer[c.index()] = duals[c.index()] > EPS ? c.demand() : 0;
        }
        return offer;
    }
}
