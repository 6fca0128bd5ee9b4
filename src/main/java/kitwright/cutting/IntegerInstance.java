package kitwright.cutting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.model.Origin;

/**
 * A section problem in the integers the solvers work with.
 *
 * <p>Lengths become whole tenths of a millimetre, rounded against the plan (piece sizes up, capacities down), then
 * divided by the greatest common divisor {@code unit} of all piece sizes, which changes no fit decision:
 * <pre>
 *   size_i     = ceil(10 * (length_i + kerf)) / unit                 (a piece takes its length plus one kerf)
 *   capacity_k = floor(floor(10 * (L_k - 2*trim + kerf)) / unit)     (the last piece needs no kerf after it)
 *   pattern a fits stock k  &lt;=&gt;  sum_i a_i * size_i &lt;= capacity_k
 * </pre>
 * Marks of equal size become one item type; types are sorted by decreasing size. Costs are integers: prices in
 * the smallest power-of-ten fraction that makes every price whole (cost objective), or stock lengths in tenths of a
 * millimetre (length objective).
 */
final class IntegerInstance {
    final SectionProblem problem;
    final boolean costObjective;
    /** Objective value = cost / scale. */
    final long scale;
    /** Tenths of a millimetre per size unit. */
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
        this.problem = problem;
        this.costObjective = problem.objective().equals("cost");
        long kerfTenths = Math.round(problem.kerfMm() * 10);
        Map<Long, List<Integer>> bySize = new TreeMap<>((a, b) -> Long.compare(b, a));
        List<Demand> demands = problem.demands();
        for (int d = 0; d < demands.size(); d++) {
            long tenths = (long) Math.ceil(demands.get(d).lengthMm() * 10 - 1e-6) + kerfTenths;
            bySize.computeIfAbsent(tenths, k -> new ArrayList<>()).add(d);
        }
        long g = 0;
        for (long s : bySize.keySet()) {
            g = gcd(g, s);
        }
        this.unit = (int) Math.max(1, g);
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
        this.scale = costObjective ? priceScale(stock) : 10;
        int max = 0;
        for (int k = 0; k < stock.size(); k++) {
            StockOption s = stock.get(k);
            long capTenths = (long) Math.floor((s.lengthMm() - 2 * problem.trimMm()) * 10 + 1e-6) + kerfTenths;
            capacity[k] = (int) Math.max(0, Math.floorDiv(capTenths, unit));
            max = Math.max(max, capacity[k]);
            cost[k] = costObjective
                    ? Math.round((s.price() == null ? 0 : s.price()) * scale)
                    : Math.round(s.lengthMm() * 10);
            limit[k] = s.available() == null ? -1 : s.available();
        }
        maxCapacity = max;
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

    Origin origin(int k) {
        return problem.stock().get(k).origin();
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
