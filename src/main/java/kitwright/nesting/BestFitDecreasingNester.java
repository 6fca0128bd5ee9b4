package kitwright.nesting;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import kitwright.model.Status;

/**
 * Best-fit decreasing nesting, the fast fallback: tubes are taken widest first (then longest), and each goes into
 * the tube with the smallest bore (then the shortest) that still has room for it in a channel of its
 * {@link HostLoad} and keeps the bundle within the mass limit; a tube that fits nowhere stays a bundle's host.
 * Widest-first means every possible host of a tube has been placed before it, and the smallest-bore host keeps the
 * wide bores free for wide guests (the best-fit-decreasing rule of bin packing, applied to nesting).
 *
 * <p>The same pass completes a partial plan ({@link #fill(NestForest)}): bundles left over after the integer phase
 * are offered to every tube with room. A host that once refused a tube type refuses it for good (hosts only fill
 * up), which keeps the pass near-linear: O(n log n + types x hosts) insertion attempts.
 */
public final class BestFitDecreasingNester implements NestingAlgorithm {

    @Override
    public NestingSolution solve(NestingProblem problem) {
        NestForest forest = new NestForest(problem);
        fill(forest);
        LowerBounds bounds = LowerBounds.counting(problem);
        Status status = forest.bundles() <= Math.ceil(bounds.bundles() - 1e-9) ? Status.OPTIMAL : Status.FEASIBLE;
        return new NestingSolution(forest.placements(), status, bounds.bundles(), null);
    }

    /** Offers every bundle's host, widest first, to the tubes with room; changes the forest in place. */
    static void fill(NestForest forest) {
        NestingProblem problem = forest.problem();
        List<Tube> tubes = problem.tubes();
        List<Tube> hosts = new ArrayList<>(tubes);
        hosts.sort(Comparator.comparingDouble(Tube::boreMm).thenComparingDouble(Tube::lengthMm)
                .thenComparingInt(Tube::id));
        double[] bores = hosts.stream().mapToDouble(Tube::boreMm).toArray();
        List<Tube> guests = tubes.stream().filter(t -> forest.isBundle(t.id())).sorted(TubeType.LARGEST_FIRST).toList();
        java.util.Map<List<Object>, Integer> firstOpen = new java.util.HashMap<>();
        for (Tube guest : guests) {
            List<Object> key = List.of(guest.mark(), guest.section(), guest.outerDiameterMm(), guest.lengthMm());
            int start = firstOpen.computeIfAbsent(key,
                    k -> lowerBound(bores, guest.outerDiameterMm() + problem.clearanceMm() - 1e-6));
            for (int i = start; i < hosts.size(); i++) {
                Tube into = hosts.get(i);
                if (!forest.massAllows(guest.id(), into.id())) {
                    continue;
                }
                if (forest.tryInsert(guest.id(), into.id())) {
                    break;
                }
                if (i == start) {
                    start++;
                }
            }
            firstOpen.put(key, start);
        }
    }

    private static int lowerBound(double[] sorted, double value) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < value) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
