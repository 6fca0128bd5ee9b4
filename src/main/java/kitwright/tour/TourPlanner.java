package kitwright.tour;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import kitwright.cutting.CutPlan;
import kitwright.ids.IdScheme;
import kitwright.loading.LoadPlan;
import kitwright.loading.Shipping;
import kitwright.model.Kit;
import kitwright.model.KitSettings;
import kitwright.model.StructureCount;
import kitwright.nesting.FitRule;
import kitwright.nesting.NestResult;
import kitwright.nesting.Nester;
import kitwright.nesting.NestingOptions;
import kitwright.nesting.NestingProblem;
import kitwright.nesting.Tube;
import kitwright.nesting.TubeList;
import kitwright.packing.CratePlan;
import kitwright.packing.StructureShare;

/**
 * Plans every leg of a kit's tour (kit.json {@code tour}), as a pure function of the kit and its cutting plan.
 *
 * <p>Problem: each leg ships what its arriving structure needs; the last leg brings the last structure's parts
 * home. Method, per structure: its bars (structures.csv counts, taken from the pieces the cutting plan makes, in
 * their order) are nested on their own by the kit's nesting stage ({@link Nester}: the kit's fit rule, end
 * allowance and bundle mass limit), {@link StructureShare} (the code of {@code pack --for}) takes those bundles and
 * the structure's joints (its joint rows, or every joint when it has none), and {@link Shipping} crates and loads
 * them for the least crate price plus trip cost, against its proven bound, with the joints nearest the doors.
 * Structures with the same rows in structures.csv (the same structure coming back, or two names alike) are
 * planned once and their legs share the shipment; the distinct shipments are planned side by side.
 *
 * <p>Guarantee: each leg's crates hold exactly its structure's bars and joints, by mark and count; the plans are
 * deterministic (the stages use work limits; the wall-clock limits are a safety net only).
 */
public final class TourPlanner {
    private TourPlanner() {
    }

    /** The tour's legs; empty when the kit has no tour. */
    public static TourPlan plan(Kit kit, CutPlan cutting) {
        List<String> tour = kit.settings().tour();
        if (tour.isEmpty()) {
            return new TourPlan(List.of());
        }
        KitSettings s = kit.settings();
        FitRule rule = new FitRule(s.nestTolerance(), s.nestClearanceMm());
        List<Tube> pieces = TubeList.of(kit, cutting, rule);
        Map<Map<String, Integer>, Integer> firstLeg = new HashMap<>();
        List<Integer> sameAs = new ArrayList<>();
        Map<Integer, String> distinct = new TreeMap<>();
        for (int i = 0; i <= tour.size(); i++) {
            String structure = structure(tour, i);
            int number = i + 1;
            int first = firstLeg.computeIfAbsent(rows(kit.structures(), structure), r -> number);
            sameAs.add(first);
            distinct.putIfAbsent(first, structure);
        }
        Map<Integer, LegShipment> shipments = shipAll(kit, distinct, pieces, rule);
        List<Leg> legs = new ArrayList<>();
        for (int i = 0; i <= tour.size(); i++) {
            String from = i == 0 ? TourPlan.DEPOT : tour.get(i - 1);
            String to = i == tour.size() ? TourPlan.DEPOT : tour.get(i);
            legs.add(new Leg(i + 1, from, to, structure(tour, i), sameAs.get(i), shipments.get(sameAs.get(i))));
        }
        return new TourPlan(legs);
    }

    /** The structure leg i + 1 ships: the one it arrives for, or on the way home the last one. */
    private static String structure(List<String> tour, int i) {
        return tour.get(Math.min(i, tour.size() - 1));
    }

    /**
     * The distinct shipments (by first leg), planned side by side on at most as many threads as the machine has
     * processors: each is a pure function of its structure, so the plans do not depend on the threads.
     */
    private static Map<Integer, LegShipment> shipAll(Kit kit, Map<Integer, String> distinct, List<Tube> pieces,
                                                     FitRule rule) {
        int threads = Math.max(1, Math.min(distinct.size(), Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, runnable -> {
            Thread t = new Thread(runnable, "kitwright-tour");
            t.setDaemon(true);
            return t;
        });
        try {
            Map<Integer, Future<LegShipment>> futures = new TreeMap<>();
            distinct.forEach((leg, structure) -> futures.put(leg, pool.submit(() -> ship(kit, structure, pieces,
                    rule))));
            Map<Integer, LegShipment> shipments = new TreeMap<>();
            for (Map.Entry<Integer, Future<LegShipment>> f : futures.entrySet()) {
                shipments.put(f.getKey(), f.getValue().get());
            }
            return shipments;
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException("planning a tour leg failed: " + e.getCause(), e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while planning the tour's legs", e);
        } finally {
            pool.shutdownNow();
        }
    }

    /** The structure's rows of structures.csv, bars and joints, by mark. */
    private static Map<String, Integer> rows(List<StructureCount> counts, String structure) {
        Map<String, Integer> rows = new TreeMap<>();
        counts.stream().filter(c -> c.structure().equals(structure))
                .forEach(c -> rows.merge(c.mark(), c.count(), Integer::sum));
        return rows;
    }

    /** One structure's shipment: its bars nested, then with its joints crated and loaded. */
    static LegShipment ship(Kit kit, String structure, List<Tube> pieces, FitRule rule) {
        Map<String, Integer> bars = new TreeMap<>();
        kit.barCounts().stream().filter(c -> c.structure().equals(structure))
                .forEach(c -> bars.merge(c.mark(), c.count(), Integer::sum));
        List<Tube> tubes = new ArrayList<>();
        Map<String, Integer> left = new TreeMap<>(bars);
        for (Tube t : pieces) {
            if (left.getOrDefault(t.mark(), 0) > 0) {
                left.merge(t.mark(), -1, Integer::sum);
                tubes.add(new Tube(tubes.size(), t.mark(), t.section(), t.outerDiameterMm(), t.boreMm(),
                        t.lengthMm(), t.massKg()));
            }
        }
        left.values().removeIf(n -> n == 0);
        if (!left.isEmpty()) {
            String reason = "the cutting plan makes too few bars for " + structure + ": short of " + left;
            return unplanned(kit, structure, bars, null, reason);
        }
        KitSettings s = kit.settings();
        NestResult nesting = Nester.run(new NestingProblem(tubes, s.nestClearanceMm(), s.nestEndAllowanceMm(),
                s.maxBundleMassKg(), IdScheme.of(kit)), rule,
                NestingOptions.DEFAULT.withWallSeconds(s.timeLimitSeconds()));
        if (nesting.reason() != null) {
            String reason = "no nesting plan for " + structure + ": " + nesting.reason();
            return unplanned(kit, structure, bars, nesting, reason);
        }
        StructureShare share = StructureShare.of(structure, nesting.plan().bundles(), kit.joints(),
                kit.structures());
        Shipping.Shipment shipment = Shipping.plan(kit, share.bundles(), share.joints());
        return new LegShipment(bars, share.joints(), share.allJoints(), nesting, shipment.crates(), shipment.loads(),
                shipment.crates().price(kit.crates()));
    }

    /**
     * A shipment that cannot be planned, with the structure's joints as {@link StructureShare} counts them (from its
     * joint rows alone, as its bars have no bundles).
     */
    private static LegShipment unplanned(Kit kit, String structure, Map<String, Integer> bars, NestResult nesting,
                                         String reason) {
        List<StructureCount> jointRows = kit.structures().stream().filter(c -> c.structure().equals(structure))
                .filter(c -> kit.bar(c.mark()).isEmpty()).toList();
        StructureShare joints = jointRows.isEmpty() ? null
                : StructureShare.of(structure, List.of(), kit.joints(), jointRows);
        return new LegShipment(bars, joints == null ? kit.joints() : joints.joints(), joints == null, nesting,
                CratePlan.infeasible(reason), LoadPlan.infeasible(reason), null);
    }
}
