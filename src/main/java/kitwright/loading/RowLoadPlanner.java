package kitwright.loading;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.cutting.Deadline;
import kitwright.ids.IdScheme;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.model.VehicleType;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;
import kitwright.packing.PatternCover;

/**
 * Loading by stacks and floor rows ({@link DeckFiller}) with the vehicle mix of least trip cost
 * ({@link VehicleChoice}); when no vehicle type has a cost, the number of trips is minimised. Crates of the same
 * size, mass and stacking limits are interchangeable. Places a chosen load has beyond the demand are left empty
 * from the tops of stacks; each load then moves to the cheapest vehicle type that still takes all of it.
 *
 * <p>Status: OPTIMAL when the trip cost meets the proven bound (the larger of {@link FleetCostBound}, the issue's
 * linear relaxation, and {@link WholeVehicleBound}), else FEASIBLE with the gap;
 * FEASIBLE with the reason "stopped by the time limit" when the stage's deadline, not a work limit, cut a step
 * short; INFEASIBLE when a crate fits no vehicle type (the reason names it). Crates of types missing from the crate
 * catalog are treated as not stackable. Each load is then arranged for the road ({@link DeckArrangement}: joints
 * near the doors, heaviest forward, rows centred across the deck, the load moved back where the axle limits ask;
 * INFEASIBLE, naming the limit, when no place keeps them); load securing (EN 12195-1) is not checked. Loads take the trip ids of the kit's
 * {@link IdScheme} (TRIP-1, TRIP-2, ... unless a mark reads like them).
 */
public final class RowLoadPlanner implements LoadPlanner {
    private static final double EPS = 1e-6;

    /**
     * Solver limits: CP-SAT deterministic work limit, the wall-clock safety net of the whole loading stage (one
     * deadline, set when {@link #load} starts, for every loop and solver call; kit.json timeLimitSeconds), column
     * generation rounds.
     */
    public record Limits(double deterministicTime, double safetySeconds, int pricingRounds) {
        public static final Limits DEFAULT = new Limits(1.0, 10.0, 10);
    }

    private final Limits limits;
    private final IdScheme ids;
    private final DeckFiller filler = new DeckFiller();

    public RowLoadPlanner() {
        this(Limits.DEFAULT);
    }

    /** Trip ids of the first-choice stems: a crate plan holds no marks to avoid. */
    public RowLoadPlanner(Limits limits) {
        this(limits, IdScheme.FIRST_CHOICE);
    }

    /** Trip ids of the kit's scheme ({@link IdScheme#of}). */
    public RowLoadPlanner(Limits limits, IdScheme ids) {
        this.limits = limits;
        this.ids = java.util.Objects.requireNonNull(ids, "ids");
    }

    @Override
    public LoadPlan load(CratePlan plan, List<CrateType> crateCatalog, List<VehicleType> vehicles) {
        Deadline deadline = Deadline.in(limits.safetySeconds());
        if (plan.status() == Status.INFEASIBLE) {
            return LoadPlan.infeasible("no crate plan to load: " + plan.reason());
        }
        List<Crate> crates = plan.crates();
        if (crates.isEmpty()) {
            return new LoadPlan(Status.OPTIMAL, 0, List.of(), 0, LoadBounds.NONE, null);
        }
        if (vehicles.isEmpty()) {
            return LoadPlan.infeasible("the vehicle catalog is empty, so no crate can be loaded");
        }
        Map<List<Object>, List<Crate>> groups = new LinkedHashMap<>();
        for (Crate c : crates) {
            CrateType t = crateCatalog.stream().filter(x -> x.name().equals(c.type())).findFirst().orElse(null);
            boolean stackable = t != null && t.stackable();
            double topLoad = t == null ? 0 : t.maxTopLoadKg();
            groups.computeIfAbsent(List.of(c.outerLengthMm(), c.outerWidthMm(), c.outerHeightMm(), c.grossKg(),
                    stackable, topLoad), k -> new ArrayList<>()).add(c);
        }
        List<CrateClass> classes = new ArrayList<>();
        List<List<Crate>> members = new ArrayList<>();
        for (Map.Entry<List<Object>, List<Crate>> e : groups.entrySet()) {
            Crate c = e.getValue().get(0);
            classes.add(new CrateClass(classes.size(), c.outerLengthMm(), c.outerWidthMm(), c.outerHeightMm(),
                    c.grossKg(), (Boolean) e.getKey().get(4), (Double) e.getKey().get(5), e.getValue().size()));
            members.add(e.getValue());
        }
        for (CrateClass c : classes) {
            if (vehicles.stream().noneMatch(v -> DeckFiller.fitsVehicle(c, v))) {
                Crate x = members.get(c.index()).get(0);
                return LoadPlan.infeasible(String.format(Locale.ROOT, "crate %s (%s, %.0f x %.0f x %.0f mm, %.0f kg)"
                        + " fits no vehicle of the catalog (deck size or payload)", x.id(), x.type(),
                        x.outerLengthMm(), x.outerWidthMm(), x.outerHeightMm(), x.grossKg()));
            }
        }
        boolean costed = vehicles.stream().anyMatch(v -> v.costPerTrip() > 0);
        double[] cost = vehicles.stream().mapToDouble(v -> costed ? v.costPerTrip() : 1.0).toArray();

        VehicleChoice choice = new VehicleChoice(new PatternCover(limits.deterministicTime(), deadline),
                limits.pricingRounds(), deadline);
        Map<String, DeckLayout> patterns = new LinkedHashMap<>();
        List<DeckLayout> construction = choice.construct(vehicles, cost, classes, patterns);
        if (construction.isEmpty()) {
            return LoadPlan.infeasible("no vehicle load takes every crate (check the vehicle catalog)");
        }
        List<DeckLayout> decks = dropSurplus(choice.improve(vehicles, cost, classes, patterns, construction),
                classes);
        if (decks == null || VehicleChoice.total(decks, cost) > VehicleChoice.total(construction, cost) + EPS) {
            decks = construction;
        }
        decks = downsize(decks, vehicles, cost, classes);

        List<VehicleLoad> loads;
        try {
            loads = realise(decks, vehicles, classes, members, ids);
        } catch (AxleLimitException e) {
            return LoadPlan.infeasible("axle limit: " + e.getMessage());
        }
        double tripCost = VehicleChoice.total(decks, cost);
        double relaxation = FleetCostBound.compute(classes, vehicles, cost);
        double whole = WholeVehicleBound.compute(classes, vehicles, cost, deadline);
        whole = Double.isNaN(whole) ? relaxation : Math.max(relaxation, whole);
        double cheapest = Arrays.stream(cost).min().orElse(0);
        double bound = Math.max(whole, cheapest);
        double gap = tripCost <= 0 ? 0 : Math.max(0, (tripCost - bound) / tripCost);
        Status status = tripCost <= bound + 1e-6 * Math.max(1, tripCost) ? Status.OPTIMAL : Status.FEASIBLE;
        // a step the deadline cut short makes the plan depend on the machine's speed: say so, as cutting does
        String reason = status == Status.FEASIBLE && deadline.struck() ? Deadline.STOPPED_BY_TIME_LIMIT : null;
        return new LoadPlan(status, bound, loads, tripCost, new LoadBounds(relaxation, whole, bound, gap), reason);
    }

    /** Leaves empty, from the tops of stacks, the places beyond each class's demand; null when it cannot. */
    private static List<DeckLayout> dropSurplus(List<DeckLayout> decks, List<CrateClass> classes) {
        int[] surplus = new int[classes.size()];
        for (DeckLayout d : decks) {
            for (int i = 0; i < surplus.length; i++) {
                surplus[i] += d.counts()[i];
            }
        }
        classes.forEach(c -> surplus[c.index()] -= c.demand());
        List<List<DeckLayout.Slot>> slots = new ArrayList<>();
        decks.forEach(d -> slots.add(new ArrayList<>(d.slots())));
        boolean progress = true;
        while (progress && Arrays.stream(surplus).anyMatch(s -> s > 0)) {
            progress = false;
            for (int k = slots.size() - 1; k >= 0; k--) {
                List<DeckLayout.Slot> deck = slots.get(k);
                for (int s = deck.size() - 1; s >= 0; s--) {
                    DeckLayout.Slot slot = deck.get(s);
                    if (surplus[slot.crateClass()] > 0 && isTop(deck, slot)) {
                        surplus[slot.crateClass()]--;
                        deck.remove(s);
                        progress = true;
                    }
                }
            }
        }
        if (Arrays.stream(surplus).anyMatch(s -> s > 0)) {
            return null;
        }
        List<DeckLayout> result = new ArrayList<>();
        for (int k = 0; k < decks.size(); k++) {
            if (!slots.get(k).isEmpty()) {
                result.add(relayout(decks.get(k).vehicleType(), slots.get(k), classes));
            }
        }
        return result;
    }

    private static boolean isTop(List<DeckLayout.Slot> deck, DeckLayout.Slot slot) {
        return deck.stream().noneMatch(o -> o.stack() == slot.stack() && o.level() > slot.level());
    }

    private static DeckLayout relayout(int vehicle, List<DeckLayout.Slot> slots, List<CrateClass> classes) {
        int[] counts = new int[classes.size()];
        double mass = 0;
        double floor = 0;
        for (DeckLayout.Slot s : slots) {
            CrateClass c = classes.get(s.crateClass());
            counts[c.index()]++;
            mass += c.massKg();
            floor = Math.max(floor, s.x() + c.alongDeck(s.rotated()));
        }
        return new DeckLayout(vehicle, counts, slots, mass, floor);
    }

    /** Moves each load onto the cheapest vehicle type that takes all of it. */
    private List<DeckLayout> downsize(List<DeckLayout> decks, List<VehicleType> vehicles, double[] cost,
                                      List<CrateClass> classes) {
        List<Integer> byCost = new ArrayList<>();
        for (int v = 0; v < vehicles.size(); v++) {
            byCost.add(v);
        }
        byCost.sort(Comparator.<Integer>comparingDouble(v -> cost[v]).thenComparingInt(v -> v));
        List<DeckLayout> result = new ArrayList<>();
        for (DeckLayout d : decks) {
            DeckLayout kept = d;
            for (int v : byCost) {
                if (cost[v] >= cost[d.vehicleType()] - EPS) {
                    break;
                }
                DeckLayout moved = filler.fill(v, vehicles.get(v), classes, d.counts());
                if (Arrays.equals(moved.counts(), d.counts())) {
                    kept = moved;
                    break;
                }
            }
            result.add(kept);
        }
        result.sort(Comparator.comparingInt(DeckLayout::vehicleType));
        return result;
    }

    /** The loads, each arranged for the road ({@link DeckArrangement}); throws with the limit none can keep. */
    private static List<VehicleLoad> realise(List<DeckLayout> decks, List<VehicleType> vehicles,
                                             List<CrateClass> classes, List<List<Crate>> members, IdScheme ids)
            throws AxleLimitException {
        int[] next = new int[classes.size()];
        List<VehicleLoad> loads = new ArrayList<>();
        for (DeckLayout d : decks) {
            VehicleType v = vehicles.get(d.vehicleType());
            List<DeckArrangement.Entry> entries = new ArrayList<>();
            for (DeckLayout.Slot s : d.slots()) {
                CrateClass c = classes.get(s.crateClass());
                entries.add(new DeckArrangement.Entry(members.get(c.index()).get(next[c.index()]++), c, s));
            }
            DeckArrangement.Arranged a = DeckArrangement.arrange(v, entries);
            String id = ids.trip(loads.size() + 1);
            if (a.failure() != null) {
                throw new AxleLimitException(id + " (" + a.failure() + ")");
            }
            loads.add(new VehicleLoad(id, v.name(), v.deckLengthMm(), v.deckWidthMm(), v.deckHeightMm(),
                    v.payloadKg(), a.massKg(), a.centreMm(), a.lateralMm(), a.balanceNote(), a.axleLoads(),
                    a.crates(), v.costPerTrip(), a.floorLengthMm(), v.axles()));
        }
        return loads;
    }

    /** A load whose axle limits no place along the deck keeps. */
    private static final class AxleLimitException extends Exception {
        AxleLimitException(String message) {
            super(message);
        }
    }
}
