package kitwright.packing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import kitwright.cutting.Deadline;
import kitwright.model.CrateType;

/**
 * Local search after the crate mix: empties the least filled crates into the others. Crates are taken least filled
 * first (the larger of the contents' mass share and bounding-box volume share). Such a crate is first merged with
 * another, the most filled first, into one crate of a type that costs less than the two, when the filler
 * ({@link CrateFiller}) holds exactly their items; else the other crates, most filled first (best fit), are filled
 * again from their own items plus what is still to move, each kept when the new layout holds every one of its own
 * items and takes at least one more. The crate is dropped only when all its items moved (the total price does not
 * rise and the count falls); otherwise nothing changes. A move repeats until no crate can be emptied or the budget
 * of crate fillings is spent (half of it at most for merges), so the result depends only on the input (or, on a
 * slow machine, the crating stage's deadline passes first).
 * When no crate can be emptied, two crates are repacked as two of types that cost less in all (see
 * {@link #repack}), and the emptying starts again.
 * The same idea as the "eliminate a bin" moves of bin-packing local search (e.g. Fleszar &amp; Hindi 2002).
 */
final class CrateElimination {
    /**
     * How much more bounding-box volume than its inside a crate may hold: staggered rows of bundles beat the
     * squares (105 in 100, src/docs/sources.md), so a little more than 1, to skip hopeless fillings only.
     */
    private static final double STAGGERED_GAIN = 1.2;
    private final CrateFiller filler = new CrateFiller();
    private final int budget;
    private final Deadline deadline;

    /** @param budget the most crate fillings ({@link CrateFiller#fills} calls) to try in all */
    CrateElimination(int budget) {
        this(budget, Deadline.in(Double.POSITIVE_INFINITY));
    }

    /** With the crating stage's deadline: once it has passed no further filling is tried. */
    CrateElimination(int budget, Deadline deadline) {
        this.budget = budget;
        this.deadline = deadline;
    }

    /** True when the budget of fillings is spent or the deadline has passed. */
    private boolean out(int[] spent) {
        return spent[0] >= budget || deadline.passed();
    }

    /**
     * The layouts with what crates could be emptied gone, the others refilled; each item type's count is kept.
     *
     * @param cost price of each crate type (1 each when the catalog has no prices)
     */
    List<CrateLayout> improve(List<CrateLayout> layouts, List<CrateType> crates, double[] cost,
                              List<ItemType> types) {
        List<CrateLayout> current = new ArrayList<>(layouts);
        // fillings spent: in all, and on merges
        int[] spent = {0, 0};
        boolean emptied = true;
        while (emptied && !out(spent) && current.size() > 1) {
            emptied = false;
            List<Integer> order = byFill(current, crates, types);
            for (int victim : order) {
                List<CrateLayout> next = merge(current, victim, crates, cost, types, spent);
                if (next == null) {
                    next = empty(current, victim, crates, types, spent);
                }
                if (next != null) {
                    current = next;
                    emptied = true;
                    break;
                }
                if (out(spent)) {
                    break;
                }
            }
            if (!emptied && !out(spent)) {
                List<CrateLayout> next = repack(current, crates, cost, types, spent);
                if (next != null) {
                    current = next;
                    emptied = true;
                }
            }
        }
        return current;
    }

    /**
     * Two crates repacked as two crates of types that cost less in all (a large and a small crate for two large
     * ones, say): the first new crate filled from both crates' items as the filler manages, the second from what
     * is left, kept when it holds exactly that. Pairs least filled first; null when no pair gets cheaper.
     */
    private List<CrateLayout> repack(List<CrateLayout> layouts, List<CrateType> crates, double[] cost,
                                     List<ItemType> types, int[] spent) {
        List<Integer> order = byFill(layouts, crates, types);
        for (int i = 0; i < order.size(); i++) {
            for (int j = i + 1; j < order.size(); j++) {
                CrateLayout a = layouts.get(order.get(i));
                CrateLayout b = layouts.get(order.get(j));
                int[] both = a.counts().clone();
                for (int k = 0; k < both.length; k++) {
                    both[k] += b.counts()[k];
                }
                double pair = cost[a.crateType()] + cost[b.crateType()];
                for (int first = 0; first < crates.size(); first++) {
                    for (int second = 0; second < crates.size(); second++) {
                        if (cost[first] + cost[second] >= pair - 1e-9) {
                            continue;
                        }
                        if (out(spent)) {
                            return null;
                        }
                        spent[0]++;
                        for (CrateLayout one : filler.fills(first, crates.get(first), types, both)) {
                            int[] rest = both.clone();
                            for (int k = 0; k < rest.length; k++) {
                                rest[k] -= one.counts()[k];
                            }
                            if (one.isEmpty() || Arrays.stream(rest).allMatch(n -> n == 0)) {
                                continue;
                            }
                            if (out(spent)) {
                                return null;
                            }
                            spent[0]++;
                            for (CrateLayout two : filler.fills(second, crates.get(second), types, rest)) {
                                if (Arrays.equals(two.counts(), rest)) {
                                    List<CrateLayout> result = new ArrayList<>(layouts);
                                    result.set(order.get(i), one);
                                    result.set(order.get(j), two);
                                    return result;
                                }
                            }
                        }
                    }
                }
            }
        }
        return null;
    }

    /**
     * The victim and another crate as one crate of a type that costs less than the two (a larger type, say), when
     * the filler holds exactly their items; the other crates most filled first. Null when no pair merges.
     */
    private List<CrateLayout> merge(List<CrateLayout> layouts, int victim, List<CrateType> crates, double[] cost,
                                    List<ItemType> types, int[] spent) {
        CrateLayout gone = layouts.get(victim);
        List<Integer> hosts = new ArrayList<>(byFill(layouts, crates, types));
        Collections.reverse(hosts);
        for (int host : hosts) {
            if (host == victim) {
                continue;
            }
            CrateLayout other = layouts.get(host);
            int[] both = other.counts().clone();
            for (int i = 0; i < both.length; i++) {
                both[i] += gone.counts()[i];
            }
            double pair = cost[gone.crateType()] + cost[other.crateType()];
            for (int t = 0; t < crates.size(); t++) {
                if (cost[t] >= pair - 1e-9 || !mayHold(crates.get(t), gone, other, types)) {
                    continue;
                }
                if (out(spent) || spent[1] >= budget / 2) {
                    return null;
                }
                spent[0]++;
                spent[1]++;
                for (CrateLayout layout : filler.fills(t, crates.get(t), types, both)) {
                    if (Arrays.equals(layout.counts(), both)) {
                        List<CrateLayout> result = new ArrayList<>(layouts);
                        result.set(host, layout);
                        result.remove(victim);
                        return result;
                    }
                }
            }
        }
        return null;
    }

    /** Whether a crate of this type could hold both layouts' items by mass and bounding-box volume. */
    private static boolean mayHold(CrateType type, CrateLayout a, CrateLayout b, List<ItemType> types) {
        double inner = type.innerLengthMm() * type.innerWidthMm() * type.innerHeightMm();
        return a.massKg() + b.massKg() <= type.maxGrossKg() - type.tareKg() + 1e-6
                && a.volume(types) + b.volume(types) <= inner * STAGGERED_GAIN;
    }

    /** The layouts without the victim, its items moved into the others; null when they cannot all move. */
    private List<CrateLayout> empty(List<CrateLayout> layouts, int victim, List<CrateType> crates,
                                    List<ItemType> types, int[] spent) {
        int[] toMove = layouts.get(victim).counts().clone();
        List<CrateLayout> result = new ArrayList<>(layouts);
        List<Integer> hosts = new ArrayList<>(byFill(layouts, crates, types));
        Collections.reverse(hosts);
        for (int host : hosts) {
            if (host == victim || out(spent)) {
                continue;
            }
            CrateLayout own = result.get(host);
            int[] offer = own.counts().clone();
            for (int i = 0; i < offer.length; i++) {
                offer[i] += toMove[i];
            }
            CrateType type = crates.get(own.crateType());
            CrateLayout best = null;
            spent[0]++;
            for (CrateLayout layout : filler.fills(own.crateType(), type, types, offer)) {
                if (holdsAll(layout, own) && (best == null || gained(layout, own) > gained(best, own))) {
                    best = layout;
                }
            }
            if (best != null && gained(best, own) > 0) {
                for (int i = 0; i < toMove.length; i++) {
                    toMove[i] -= best.counts()[i] - own.counts()[i];
                }
                result.set(host, best);
                if (Arrays.stream(toMove).allMatch(n -> n == 0)) {
                    result.remove(victim);
                    return result;
                }
            }
        }
        return null;
    }

    private static boolean holdsAll(CrateLayout layout, CrateLayout own) {
        for (int i = 0; i < own.counts().length; i++) {
            if (layout.counts()[i] < own.counts()[i]) {
                return false;
            }
        }
        return true;
    }

    private static int gained(CrateLayout layout, CrateLayout own) {
        return layout.slots().size() - own.slots().size();
    }

    /** Indices of the layouts, least filled first (ties by index). */
    private static List<Integer> byFill(List<CrateLayout> layouts, List<CrateType> crates, List<ItemType> types) {
        double[] fill = new double[layouts.size()];
        List<Integer> order = new ArrayList<>();
        for (int k = 0; k < layouts.size(); k++) {
            CrateLayout l = layouts.get(k);
            CrateType c = crates.get(l.crateType());
            double volume = l.volume(types) / (c.innerLengthMm() * c.innerWidthMm() * c.innerHeightMm());
            double net = c.maxGrossKg() - c.tareKg();
            fill[k] = Math.max(volume, net > 0 ? l.massKg() / net : 1);
            order.add(k);
        }
        order.sort(Comparator.<Integer>comparingDouble(k -> fill[k]).thenComparingInt(k -> k));
        return order;
    }
}
