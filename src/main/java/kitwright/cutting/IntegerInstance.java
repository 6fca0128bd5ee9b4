package kitwright.cutting;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * A section problem in the integers the solvers work with.
 *
 * <p>Lengths become whole units of 10^-d mm, d the finest decimal the section's data uses ({@link LengthScale}),
 * so every fit is decided exactly; then sizes are divided by their greatest common divisor {@code unit}, which
 * changes no fit decision (whole-millimetre data keeps the sizes it always had):
 * <pre>
 *   size_i     = (up(length_i) + up(kerf)) / unit                         (a piece takes its length plus one kerf)
 *   capacity_k = floor((down(L_k) - up(2*trim) + down(kerf)) / unit)      (the last piece needs no kerf after it)
 *   pattern a fits stock k  &lt;=&gt;  sum_i a_i * size_i &lt;= capacity_k
 * </pre>
 * up and down are exact when the data has no finer decimal than d. Otherwise (more than three decimals, or a
 * capacity above {@link #MAX_UNITS} units) they round the safe way, so a plan never claims a fit the saw model
 * rejects; {@link #relaxed()} then rounds the other way round, for bounds that hold for the true lengths.
 * Marks of equal size become one item type; types are sorted by decreasing size. Costs are integers: prices in
 * the smallest power-of-ten fraction that makes every price whole (cost objective), or stock lengths in tenths of a
 * millimetre or finer (length objective).
 */
final class IntegerInstance {
    final SectionProblem problem;
    final boolean costObjective;
    /** Objective value = cost / scale. */
    final long scale;
    /**
     * Largest capacity in size units: the knapsack tables and arc-flow nodes stay within what 1 km of stock in
     * tenths of a millimetre always took.
     */
    static final long MAX_UNITS = 10_000_000;

    /** The length unit before the gcd division, and whether it holds every length exactly. */
    final LengthScale lengthScale;
    /** Length units (10^-decimals mm) per size unit. */
    final int unit;
    /** Item types by decreasing size. */
    final int[] size;
    final int[] demand;
    /** Indices into problem.demands() of the marks of each type, in problem order. */
    final int[][] marks;
    /** Stock types in problem order. */
    final int[] capacity;
    final long[] cost;
    /** Pieces available, or -1 for unlimited. */
    final int[] limit;
    final int maxCapacity;

    IntegerInstance(SectionProblem problem) {
        this(problem, scaleFor(problem), false);
    }

    /**
     * @param optimistic round the other way: sizes down, capacities up, so every true fit stays a fit (for bounds)
     */
    private IntegerInstance(SectionProblem problem, LengthScale lengthScale, boolean optimistic) {
        this.problem = problem;
        this.lengthScale = lengthScale;
        this.costObjective = problem.objective().equals("cost");
        long[] sizes = sizes(problem, lengthScale, optimistic);
        Map<Long, List<Integer>> bySize = new TreeMap<>((a, b) -> Long.compare(b, a));
        List<Demand> demands = problem.demands();
        for (int d = 0; d < demands.size(); d++) {
            bySize.computeIfAbsent(sizes[d], k -> new ArrayList<>()).add(d);
        }
        long g = 0;
        for (long s : bySize.keySet()) {
            g = gcd(g, s);
        }
        this.unit = Math.toIntExact(Math.max(1, g));
        int types = bySize.size();
        size = new int[types];
        demand = new int[types];
        marks = new int[types][];
        int t = 0;
        for (Map.Entry<Long, List<Integer>> e : bySize.entrySet()) {
            size[t] = Math.toIntExact(e.getKey() / unit);
            marks[t] = e.getValue().stream().mapToInt(Integer::intValue).toArray();
            for (int d : marks[t]) {
                demand[t] += demands.get(d).quantity();
            }
            t++;
        }
        List<StockOption> stock = problem.stock();
        capacity = new int[stock.size()];
        cost = new long[stock.size()];
        limit = new int[stock.size()];
        this.scale = costObjective ? priceScale(stock) : lengthCostScale(stock);
        int max = 0;
        for (int k = 0; k < stock.size(); k++) {
            StockOption s = stock.get(k);
            capacity[k] = Math.toIntExact(Math.max(0, Math.floorDiv(capacity(problem, s, lengthScale, optimistic),
                    unit)));
            max = Math.max(max, capacity[k]);
            cost[k] = costObjective
                    ? Math.round((s.price() == null ? 0 : s.price()) * scale)
                    : SawArithmetic.exact(s.lengthMm()).multiply(BigDecimal.valueOf(scale))
                            .setScale(0, java.math.RoundingMode.HALF_UP).longValueExact();
            limit[k] = s.available() == null ? -1 : s.available();
        }
        maxCapacity = max;
    }

    /**
     * The same section with lengths rounded the other way (sizes down, capacities up): every pattern that fits the
     * true lengths fits it, so its lower bounds are lower bounds of the true problem. This instance itself when its
     * lengths are exact.
     */
    IntegerInstance relaxed() {
        return lengthScale.exact() ? this : new IntegerInstance(problem, lengthScale, true);
    }

    /** The finest exact scale whose longest capacity stays within {@link #MAX_UNITS} size units. */
    private static LengthScale scaleFor(SectionProblem problem) {
        LengthScale scale = LengthScale.of(problem);
        while (scale.decimals() > 0 && largestCapacity(problem, scale) > MAX_UNITS) {
            scale = scale.coarser();
        }
        return scale;
    }

    /** The longest capacity in size units (after the gcd division) at a scale. */
    private static long largestCapacity(SectionProblem problem, LengthScale scale) {
        long g = 0;
        for (long s : sizes(problem, scale, false)) {
            g = gcd(g, s);
        }
        long max = 0;
        for (StockOption s : problem.stock()) {
            max = Math.max(max, capacity(problem, s, scale, false) / Math.max(1, g));
        }
        return max;
    }

    /** length + kerf of each mark in length units, rounded up (down when optimistic). */
    private static long[] sizes(SectionProblem problem, LengthScale scale, boolean optimistic) {
        BigDecimal kerf = SawArithmetic.exact(problem.kerfMm());
        List<Demand> demands = problem.demands();
        long[] sizes = new long[demands.size()];
        for (int d = 0; d < sizes.length; d++) {
            BigDecimal length = SawArithmetic.exact(demands.get(d).lengthMm());
            sizes[d] = optimistic ? scale.down(length) + scale.down(kerf) : scale.up(length) + scale.up(kerf);
        }
        return sizes;
    }

    /** L - 2*trim + kerf in length units, rounded down (up when optimistic). */
    private static long capacity(SectionProblem problem, StockOption s, LengthScale scale, boolean optimistic) {
        BigDecimal length = SawArithmetic.exact(s.lengthMm());
        BigDecimal trims = SawArithmetic.exact(problem.trimMm()).multiply(BigDecimal.valueOf(2));
        BigDecimal kerf = SawArithmetic.exact(problem.kerfMm());
        return optimistic
                ? scale.up(length) - scale.down(trims) + scale.up(kerf)
                : scale.down(length) - scale.up(trims) + scale.down(kerf);
    }

    int types() {
        return size.length;
    }

    int stocks() {
        return capacity.length;
    }

    boolean limited(int k) {
        return limit[k] >= 0;
    }

    int totalPieces(int[] counts) {
        int n = 0;
        for (int c : counts) {
            n += c;
        }
        return n;
    }

    /** Sum of size_i * a_i. */
    long load(int[] counts) {
        long l = 0;
        for (int i = 0; i < counts.length; i++) {
            l += (long) counts[i] * size[i];
        }
        return l;
    }

    boolean fits(Pattern p) {
        return load(p.counts()) <= capacity[p.stock()];
    }

    /** Objective value of a total integer cost. */
    double value(long totalCost) {
        return totalCost / (double) scale;
    }

    /** Stock limits as an array (-1 = unlimited), a fresh copy. */
    int[] limits() {
        return limit.clone();
    }

    int[] demands() {
        return demand.clone();
    }

    /** Pieces of stock type k an optimal plan can use at most: its limit, and never more than one per piece. */
    int usable(int k, int[] residual, int[] available) {
        int pieces = totalPieces(residual);
        return available[k] < 0 ? pieces : Math.min(available[k], pieces);
    }

    @Override
    public String toString() {
        return "sizes " + Arrays.toString(size) + " demand " + Arrays.toString(demand) + " capacity "
                + Arrays.toString(capacity) + " cost " + Arrays.toString(cost) + " limit " + Arrays.toString(limit);
    }

    /** Tenths of a millimetre, or the finest decimal of the stock lengths (to a micrometre and beyond, up to 6). */
    private static long lengthCostScale(List<StockOption> stock) {
        int decimals = 1;
        for (StockOption s : stock) {
            decimals = Math.max(decimals, Math.min(6, LengthScale.decimalsOf(s.lengthMm())));
        }
        return BigDecimal.ONE.movePointRight(decimals).longValueExact();
    }

    private static long priceScale(List<StockOption> stock) {
        long scale = 1;
        for (int e = 0; e <= 6; e++, scale *= 10) {
            boolean whole = true;
            for (StockOption s : stock) {
                double p = s.price() == null ? 0 : s.price() * scale;
                if (Math.abs(p - Math.rint(p)) > 1e-6 * Math.max(1, Math.abs(p))) {
                    whole = false;
                    break;
                }
            }
            if (whole) {
                return scale;
            }
        }
        return 1_000_000;
    }

    static long gcd(long a, long b) {
        while (b != 0) {
            long r = a % b;
            a = b;
            b = r;
        }
        return Math.abs(a);
    }
}
