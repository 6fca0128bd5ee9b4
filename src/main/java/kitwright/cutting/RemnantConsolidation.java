package kitwright.cutting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.TreeSet;

/**
 * Gathers the waste of a plan into fewer, longer offcuts without buying anything more: among plans of equal cost
 * the one with longer remnants is worth more, since a remnant goes back to the rack.
 *
 * <p>Method: a local search that moves single pieces between stock pieces of the plan. Visiting stock pieces from
 * the one with the most free length down, it moves each piece (largest first) into the stock piece with the least
 * free length that still holds it (best fit), when that raises {@code sum_b free_b^2}: moving size s from A to B
 * changes it by {@code 2s(free_A - free_B + s)}, so the move is taken when {@code free_B < free_A + s}. The sum
 * grows by at least 2 with every move and is bounded, so the search ends; passes stop when none moves a piece.
 * A stock piece emptied this way is not needed at all, which can only lower the cost. Best-fit queries use an
 * ordered set, O(log n) each.
 */
final class RemnantConsolidation {
    private static final int MAX_PASSES = 8;

    private RemnantConsolidation() {
    }

    static Packing consolidate(IntegerInstance instance, Packing packing) {
        int bins = packing.pieces().size();
        int types = instance.types();
        int[][] counts = new int[bins][];
        int[] stock = new int[bins];
        long[] free = new long[bins];
        TreeSet<long[]> byFree = new TreeSet<>(Comparator.<long[]>comparingLong(e -> e[0])
                .thenComparingLong(e -> e[1]));
        for (int b = 0; b < bins; b++) {
            Pattern p = packing.pieces().get(b);
            counts[b] = p.counts();
            stock[b] = p.stock();
            free[b] = instance.capacity[p.stock()] - instance.load(counts[b]);
            byFree.add(new long[] {free[b], b});
        }
        for (int pass = 0; pass < MAX_PASSES; pass++) {
            boolean moved = false;
            Integer[] order = new Integer[bins];
            for (int b = 0; b < bins; b++) {
                order[b] = b;
            }
            final long[] snapshot = free.clone();
            Arrays.sort(order, Comparator.<Integer>comparingLong(b -> -snapshot[b]).thenComparingInt(b -> b));
            for (int a : order) {
                for (int i = 0; i < types; i++) {
                    int size = instance.size[i];
                    while (counts[a][i] > 0) {
                        long[] target = byFree.ceiling(new long[] {size, -1});
                        if (target != null && target[1] == a) {
                            target = byFree.higher(target);
                        }
                        if (target == null || target[0] >= free[a] + size) {
                            break;
                        }
                        int b = (int) target[1];
                        byFree.remove(new long[] {free[a], a});
                        byFree.remove(target);
                        counts[a][i]--;
                        counts[b][i]++;
                        free[a] += size;
                        free[b] -= size;
                        byFree.add(new long[] {free[a], a});
                        byFree.add(new long[] {free[b], b});
                        moved = true;
                    }
                }
            }
            if (!moved) {
                break;
            }
        }
        List<Pattern> result = new ArrayList<>();
        for (int b = 0; b < bins; b++) {
            Pattern p = new Pattern(stock[b], counts[b]);
            if (!p.isEmpty()) {
                result.add(p);
            }
        }
        return new Packing(result);
    }
}
