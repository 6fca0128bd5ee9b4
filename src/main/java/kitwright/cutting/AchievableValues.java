package kitwright.cutting;

/**
 * Lower bounds that exploit the objective's granularity.
 *
 * <p>Every plan costs {@code sum_k c_k * n_k} with whole stock piece counts {@code 0 <= n_k <= available_k}, so
 * any bound B can be raised to the smallest such value at or above B. With one stock length and one price the
 * values are the multiples of the price and this is the classic "value = ceil(LP bound)" proof of optimality;
 * with several lengths the achievable values are found by a subset-sum over bitsets,
 * O(K log(n) * V / 64) for K stock types and values up to V (skipped above 5e7 value units, where the bound is
 * only rounded up to a multiple of the greatest common divisor of the costs).
 */
final class AchievableValues {
    private static final long MAX_BITS = 50_000_000L;

    private AchievableValues() {
    }

    /**
     * The material bound: the total size of the pieces, bought at the lowest cost per unit of capacity first
     * (a fractional knapsack over the stock types, respecting their limits); rounded up to a whole cost unit.
     */
    static long materialBound(IntegerInstance instance, int[] demand) {
        double need = instance.load(demand);
        Integer[] order = new Integer[instance.stocks()];
        for (int k = 0; k < order.length; k++) {
            order[k] = k;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(perUnit(instance, a), perUnit(instance, b)));
        double cost = 0;
        for (int k : order) {
            if (need <= 0 || instance.capacity[k] <= 0) {
                continue;
            }
            double take = instance.limited(k)
                    ? Math.min(need, (double) instance.limit[k] * instance.capacity[k]) : need;
            cost += take * perUnit(instance, k);
            need -= take;
        }
        return (long) Math.ceil(cost - 1e-7 * Math.max(1, cost));
    }

    /**
     * A lower bound that holds for the true lengths: {@code bound} itself when the instance holds every length
     * exactly; otherwise the achievable material bound of the lengths rounded the other way
     * ({@link IntegerInstance#relaxed()}: sizes down, capacities up), since a bound proven on sizes rounded up
     * may lie above the true optimum.
     */
    static long trueLengthBound(IntegerInstance instance, long bound, long known) {
        if (instance.lengthScale.exact()) {
            return bound;
        }
        IntegerInstance relaxed = instance.relaxed();
        return Math.min(bound, nextAchievable(relaxed, materialBound(relaxed, relaxed.demands()), known));
    }

    private static double perUnit(IntegerInstance instance, int k) {
        return instance.capacity[k] <= 0 ? Double.MAX_VALUE : instance.cost[k] / (double) instance.capacity[k];
    }

    /**
     * The smallest achievable total cost in [bound, known], where {@code known} is the cost of a plan at hand
     * (so it is achievable itself). Any plan costing at least {@code bound} costs at least this value.
     */
    static long nextAchievable(IntegerInstance instance, double bound, long known) {
        long g = 0;
        for (long c : instance.cost) {
            g = IntegerInstance.gcd(g, c);
        }
        if (g == 0) {
            return 0;
        }
        long low = (long) Math.ceil(bound / g - 1e-9);
        long high = known / g;
        if (low >= high) {
            return Math.min(known, Math.max(0, low) * g);
        }
        low = Math.max(0, low);
        if (high >= MAX_BITS) {
            return low * g;
        }
        long[] reach = new long[(int) (high / 64) + 1];
        reach[0] = 1L;
        for (int k = 0; k < instance.stocks(); k++) {
            long coin = instance.cost[k] / g;
            if (coin == 0) {
                continue;
            }
            long copies = high / coin;
            if (instance.limited(k)) {
                copies = Math.min(copies, instance.limit[k]);
            }
            // binary splitting: copies = 1 + 2 + 4 + ... + rest, each part a 0/1 coin
            for (long part = 1; copies > 0; part <<= 1) {
                long take = Math.min(part, copies);
                copies -= take;
                orShifted(reach, take * coin);
            }
        }
        for (long v = low; v <= high; v++) {
            if ((reach[(int) (v >>> 6)] & (1L << (v & 63))) != 0) {
                return v * g;
            }
        }
        return known;
    }

    /** reach |= reach << shift, over the bits the array holds. */
    private static void orShifted(long[] reach, long shift) {
        if (shift >= (long) reach.length * 64) {
            return;
        }
        int words = (int) (shift >>> 6);
        int bits = (int) (shift & 63);
        for (int w = reach.length - 1; w >= words; w--) {
            long moved = reach[w - words] << bits;
            if (bits != 0 && w - words - 1 >= 0) {
                moved |= reach[w - words - 1] >>> (64 - bits);
            }
            reach[w] |= moved;
        }
    }
}
