package kitwright.nesting;

import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Brings every bundle within the mass limit by taking guests out: from a bundle over the limit, the guest whose
 * subtree is the lightest that still removes the excess (or else the heaviest subtree) leaves and becomes a bundle
 * of its own, which is checked in turn. Ends with every bundle within the limit, except a single tube that is above
 * it by itself. The bundles it makes are offered back to the other hosts by {@link BestFitDecreasingNester#fill}.
 */
final class MassRepair {
    private MassRepair() {
    }

    static void repair(NestForest forest) {
        NestingProblem problem = forest.problem();
        if (problem.maxBundleMassKg() == null) {
            return;
        }
        Deque<Integer> work = new ArrayDeque<>();
        for (int t = 0; t < forest.size(); t++) {
            if (forest.isBundle(t)) {
                work.add(t);
            }
        }
        while (!work.isEmpty()) {
            int root = work.poll();
            while (!problem.massAllowed(forest.subtreeMassKg(root))) {
                double excess = forest.subtreeMassKg(root) - problem.maxBundleMassKg();
                int lightestEnough = -1;
                int heaviest = -1;
                for (int d : forest.descendants(root)) {
                    double mass = forest.subtreeMassKg(d);
                    if (mass >= excess - 1e-9 && (lightestEnough < 0 || mass < forest.subtreeMassKg(lightestEnough))) {
                        lightestEnough = d;
                    }
                    if (heaviest < 0 || mass > forest.subtreeMassKg(heaviest)) {
                        heaviest = d;
                    }
                }
                int leaving = lightestEnough >= 0 ? lightestEnough : heaviest;
                if (leaving < 0) {
                    break; // a single tube above the limit by itself
                }
                forest.detach(leaving);
                work.add(leaving);
            }
        }
    }
}
