package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;
import kitwright.cutting.Deadline;

/**
 * Diving with column generation, the rounding that turns the LP into whole patterns: solve the LP over what is
 * left, fix every pattern whose LP count is 1 or more at its whole part (or, when none is, the one with the largest
 * fraction at 1), take the guests and hosts it uses off the right-hand sides, generate columns for the residual
 * problem and repeat until the LP has nothing left to nest. A fixed pattern is capped at the guests still left, so
 * the counts always respect the supply. The same scheme is the usual primal heuristic of column generation for
 * cutting stock (residual rounding; see Wascher and Gau 1996, "Heuristics for the integer one-dimensional cutting
 * stock problem: a computational study", OR Spektrum 18). Stops early when the pricing work budget is spent or the
 * stage's deadline passes; what is not fixed by then is left to best-fit decreasing.
 */
final class PatternDiving {
    /** Fixed pattern counts: the layouts and how many hosts use each. */
    record Dive(List<Pattern> patterns, long[] counts) {
    }

    private PatternDiving() {
    }

    static Dive dive(PatternColumnGeneration cg, List<TubeType> types, int roundsPerDive, int maxDives,
                     Deadline deadline) {
        int n = types.size();
        int[] guests = types.stream().mapToInt(TubeType::count).toArray();
        int[] freeHosts = guests.clone();
        List<Pattern> patterns = new ArrayList<>();
        List<Long> counts = new ArrayList<>();
        double[] weights = PatternColumnGeneration.bulkyWeights(types);
        for (int dive = 0; dive < maxDives && !cg.exhausted() && !deadline.passed(); dive++) {
            cg.setSupply(guests, freeHosts);
            if (cg.generate(weights, roundsPerDive, deadline) < 1e-6) {
                break;
            }
            double[] x = cg.values();
            boolean fixed = false;
            for (int c = 0; c < x.length; c++) {
                long whole = (long) Math.floor(x[c] + 1e-9);
                if (whole >= 1) {
                    fixed |= fix(cg, c, whole, guests, freeHosts, patterns, counts);
                }
            }
            if (!fixed) {
                int best = -1;
                for (int c = 0; c < x.length; c++) {
                    if (x[c] > 1e-9 && (best < 0 || x[c] > x[best] + 1e-12)) {
                        best = c;
                    }
                }
                if (best < 0 || !fix(cg, best, 1, guests, freeHosts, patterns, counts)) {
                    break;
                }
            }
        }
        return new Dive(patterns, counts.stream().mapToLong(Long::longValue).toArray());
    }

    /** Fixes up to {@code wanted} hosts on column c's layout, as far as hosts and guests are left. */
    private static boolean fix(PatternColumnGeneration cg, int column, long wanted, int[] guests, int[] freeHosts,
                               List<Pattern> patterns, List<Long> counts) {
        Pattern p = cg.realisable(column, guests);
        long k = Math.min(wanted, freeHosts[p.hostType()]);
        TypeCounts used = p.counts();
        for (int i = 0; i < used.size(); i++) {
            k = Math.min(k, guests[used.type(i)] / used.count(i));
        }
        if (k <= 0 || p.guests() == 0) {
            return false;
        }
        for (int i = 0; i < used.size(); i++) {
            guests[used.type(i)] -= (int) (k * used.count(i));
        }
        freeHosts[p.hostType()] -= (int) k;
        patterns.add(p);
        counts.add(k);
        return true;
    }
}
