package kitwright.nesting;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Brute force for tiny instances, written apart from the production code: every way to give each tube a host (or
 * none), keeping the ones where every host's guests fit the channel model, and the best by (bundles, volume).
 * A host's guests fit when they can be split into classes by channel count k (each guest at most the channel
 * diameter (bore - clearance) / ratio(k)), the guests of each class spread over at most k lanes, and the classes'
 * longest lanes add up to at most the host length less both end allowances.
 */
final class ExhaustiveNesting {
    private static final int[] KS = {1, 2, 3, 4, 5, 6, 7, 8, 19};

    private final NestingProblem problem;
    private final Map<String, Boolean> memo = new HashMap<>();
    int bestBundles = Integer.MAX_VALUE;
    double bestVolume = Double.POSITIVE_INFINITY;

    ExhaustiveNesting(NestingProblem problem) {
        this.problem = problem;
        int n = problem.tubes().size();
        search(0, new int[n]);
    }

    private void search(int i, int[] parent) {
        List<Tube> tubes = problem.tubes();
        if (i == tubes.size()) {
            evaluate(parent);
            return;
        }
        parent[i] = -1;
        search(i + 1, parent);
        for (int j = 0; j < tubes.size(); j++) {
            Tube g = tubes.get(i);
            Tube h = tubes.get(j);
            if (j != i && g.outerDiameterMm() + problem.clearanceMm() <= h.boreMm() + 1e-9
                    && g.lengthMm() <= h.lengthMm() - 2 * problem.endAllowanceMm() + 1e-9) {
                parent[i] = j;
                search(i + 1, parent);
            }
        }
        parent[i] = -1;
    }

    private void evaluate(int[] parent) {
        List<Tube> tubes = problem.tubes();
        int bundles = 0;
        double volume = 0;
        for (int i = 0; i < tubes.size(); i++) {
            if (parent[i] < 0) {
                bundles++;
                volume += Math.PI / 4 * Math.pow(tubes.get(i).outerDiameterMm(), 2) * tubes.get(i).lengthMm();
                double mass = mass(parent, i);
                boolean alone = mass == tubes.get(i).massKg();
                if (problem.maxBundleMassKg() != null && !alone && mass > problem.maxBundleMassKg() + 1e-9) {
                    return;
                }
            }
        }
        if (bundles > bestBundles || (bundles == bestBundles && volume >= bestVolume)) {
            return;
        }
        for (int h = 0; h < tubes.size(); h++) {
            List<Tube> guests = new ArrayList<>();
            for (int i = 0; i < tubes.size(); i++) {
                if (parent[i] == h) {
                    guests.add(tubes.get(i));
                }
            }
            if (!guests.isEmpty() && !fits(tubes.get(h), guests)) {
                return;
            }
        }
        bestBundles = bundles;
        bestVolume = volume;
    }

    private double mass(int[] parent, int root) {
        double m = problem.tubes().get(root).massKg();
        for (int i = 0; i < parent.length; i++) {
            if (parent[i] == root) {
                m += mass(parent, i);
            }
        }
        return m;
    }

    private boolean fits(Tube host, List<Tube> guests) {
        StringBuilder key = new StringBuilder(host.boreMm() + "/" + host.lengthMm());
        guests.stream().map(g -> g.outerDiameterMm() + "x" + g.lengthMm()).sorted().forEach(k -> key.append(',').append(k));
        return memo.computeIfAbsent(key.toString(), k -> classes(host, guests, 0, new int[guests.size()]));
    }

    /** Tries every channel count for every guest, then the best lane split per class. */
    private boolean classes(Tube host, List<Tube> guests, int i, int[] kOf) {
        double inner = host.boreMm() - problem.clearanceMm();
        if (i == guests.size()) {
            double used = 0;
            for (int k : KS) {
                List<Double> lengths = new ArrayList<>();
                for (int g = 0; g < guests.size(); g++) {
                    if (kOf[g] == k) {
                        lengths.add(guests.get(g).lengthMm());
                    }
                }
                used += makespan(lengths, Math.min(k, lengths.size()));
            }
            return used <= host.lengthMm() - 2 * problem.endAllowanceMm() + 1e-9;
        }
        for (int k : KS) {
            if (guests.get(i).outerDiameterMm() <= inner / EqualCirclePacking.ratio(k) + 1e-9) {
                kOf[i] = k;
                if (classes(host, guests, i + 1, kOf)) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Shortest longest lane over all ways to put the lengths on that many lanes. */
    private static double makespan(List<Double> lengths, int lanes) {
        if (lengths.isEmpty()) {
            return 0;
        }
        double[] best = {Double.POSITIVE_INFINITY};
        assign(lengths, 0, new double[lanes], best);
        return best[0];
    }

    private static void assign(List<Double> lengths, int i, double[] lane, double[] best) {
        if (i == lengths.size()) {
            double m = 0;
            for (double v : lane) {
                m = Math.max(m, v);
            }
            best[0] = Math.min(best[0], m);
            return;
        }
        for (int l = 0; l < lane.length; l++) {
            lane[l] += lengths.get(i);
            assign(lengths, i + 1, lane, best);
            lane[l] -= lengths.get(i);
        }
    }
}
