package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;

/**
 * Keeps what each stock piece of a plan holds and moves it to the cheapest stock length that still holds it: a
 * half-empty 12 m piece at the end of a plan is often cheaper as a 6 m piece, and a rack offcut left on the rack
 * may hold a whole pattern for next to nothing.
 *
 * <p>Method: every piece first takes the cheapest unlimited stock type whose capacity holds its load (or keeps its
 * limited type when that is cheaper); then, while a limited type has pieces left, it takes the piece of the plan
 * with the largest saving that it can hold. Never raises the cost; respects every limit. O(B * K) per step for
 * B pieces and K stock types.
 */
final class StockReassignment {
    private StockReassignment() {
    }

    /** The plan with each stock piece on the cheapest stock that holds it, within the stock left. */
    static Packing cheapest(IntegerInstance instance, Packing packing, int[] available) {
        int bins = packing.pieces().size();
        int[] stock = new int[bins];
        long[] load = new long[bins];
        int[] used = new int[instance.stocks()];
        for (int b = 0; b < bins; b++) {
            Pattern p = packing.pieces().get(b);
            stock[b] = p.stock();
            load[b] = instance.load(p.counts());
            used[p.stock()]++;
        }
        for (int b = 0; b < bins; b++) {
            int best = stock[b];
            for (int k = 0; k < instance.stocks(); k++) {
                if (available[k] < 0 && instance.capacity[k] >= load[b] && instance.cost[k] < instance.cost[best]) {
                    best = k;
                }
            }
            used[stock[b]]--;
            used[best]++;
            stock[b] = best;
        }
        for (int k = 0; k < instance.stocks(); k++) {
            if (available[k] < 0) {
                continue;
            }
            while (used[k] < available[k]) {
                int chosen = -1;
                long saving = 0;
                for (int b = 0; b < bins; b++) {
                    long s = instance.cost[stock[b]] - instance.cost[k];
                    if (stock[b] != k && instance.capacity[k] >= load[b] && s > saving) {
                        saving = s;
                        chosen = b;
                    }
                }
                if (chosen < 0) {
                    break;
                }
                used[stock[chosen]]--;
                used[k]++;
                stock[chosen] = k;
            }
        }
        List<Pattern> result = new ArrayList<>(bins);
        for (int b = 0; b < bins; b++) {
            result.add(new Pattern(stock[b], packing.pieces().get(b).counts()));
        }
        return new Packing(result);
    }
}
