package kitwright.nesting;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The pricing problem of nesting column generation: for every host type, the guests worth most to carry, given a
 * value per guest type. A guest type t that fits at most k_t channels of the host's bore fills a "row" of k_t
 * copies side by side; rows lie end to end, so a host's best pattern is a bounded knapsack over rows with weight
 * length_t, value k_t * value_t and at most n_t rows of type t, within the usable length.
 *
 * <p>Why rows bound every layout {@link HostLoad} allows. (1) Pick one channel in each segment and repeat it as
 * rows of the largest allowed k: the result is a row pattern with at most n_t rows of type t that fits the usable
 * length, and the average of these choices, taken uniformly per segment, is worth exactly the layout. So the
 * knapsack with at most n_t rows bounds the layout. (2) Guests of type t take a_t * length_t of lane length, and a
 * segment's k channels offer k times its length, so rows r_t = a_t / k_t (fractional, at most n_t / k_t) fit the
 * usable length: the fractional knapsack bounds it too. The bound is the smaller of the two.
 *
 * <p>The knapsack's rows, counted in full ({@link #rowCounts}), are the LP columns: their convex hull holds every
 * layout, so the LP over them is a relaxation. Capped at the supply n_t they become a layout a host can really carry
 * ({@link #rowPattern}), the integer phase's column. Lengths are counted in whole units of {@code unitMm}: rounded
 * up against the usable length rounded down to make columns (so they fit exactly), the other way round to bound. The
 * knapsack is solved by dynamic programming over length, once per distinct bore for all host lengths, after
 * splitting row bounds into powers of two (O(items x log n x capacity)).
 */
final class PatternPricing {
    private final NestingProblem problem;
    private final List<TubeType> types;
    private final double unitMm;
    /** Knapsack cells filled so far: the deterministic measure of the work done. */
    private long cells;
    /** Host types grouped by bore: one dynamic programme serves every length of a bore. */
    private final Map<Double, List<Integer>> hostsByBore = new LinkedHashMap<>();

    private final double cellBudget;

    PatternPricing(NestingProblem problem, List<TubeType> types, double unitMm) {
        this(problem, types, unitMm, Double.POSITIVE_INFINITY);
    }

    /** With a budget of knapsack cells for the whole run, after which {@link #exhausted()} says so. */
    PatternPricing(NestingProblem problem, List<TubeType> types, double unitMm, double cellBudget) {
        this.problem = problem;
        this.types = types;
        this.unitMm = unitMm;
        this.cellBudget = cellBudget;
        for (TubeType h : types) {
            if (problem.usableLengthMm(h.sample()) > 0 && !guestsOf(h.index()).isEmpty()) {
                hostsByBore.computeIfAbsent(h.sample().boreMm(), b -> new ArrayList<>()).add(h.index());
            }
        }
    }

    /** Host types that can carry at least one guest type. */
    List<Integer> hostTypes() {
        return hostsByBore.values().stream().flatMap(List::stream).sorted().toList();
    }

    /** Guest types that fit a host type's bore and usable length. */
    List<Integer> guestsOf(int hostType) {
        List<Integer> out = new ArrayList<>();
        Tube host = types.get(hostType).sample();
        for (TubeType g : types) {
            if (problem.fits(g.sample(), host)) {
                out.add(g.index());
            }
        }
        return out;
    }

    /** Estimated work of one pricing round with 1 mm units, to choose the unit. */
    static double workWithMillimetres(NestingProblem problem, List<TubeType> types) {
        PatternPricing p = new PatternPricing(problem, types, 1);
        double work = 0;
        for (List<Integer> hosts : p.hostsByBore.values()) {
            double capacity = hosts.stream().mapToDouble(h -> problem.usableLengthMm(types.get(h).sample())).max()
                    .orElse(0);
            int items = 0;
            for (int g : p.guestsOf(hosts.get(0))) {
                items += 1 + (int) Math.floor(Math.log(types.get(g).count()) / Math.log(2));
            }
            work += capacity * items;
        }
        return work;
    }

    /**
     * Best value per host type for the given guest values (only positive values count). With {@code bound} the
     * lengths are rounded so the values are upper bounds and no rows are returned; otherwise {@code rows} receives
     * the rows of each type in the best knapsack of each host type (null where nothing is worth carrying).
     */
    double[] price(double[] guestValue, boolean bound, int[][] patterns) {
        return price(guestValue, bound, patterns, supplyOfAll());
    }

    /** As {@link #price(double[], boolean, int[][])} with the guests still to be placed, per type. */
    double[] price(double[] guestValue, boolean bound, int[][] patterns, int[] supply) {
        double[] best = new double[types.size()];
        for (List<Integer> hosts : hostsByBore.values()) {
            priceBore(hosts, guestValue, bound, best, patterns, supply);
        }
        return best;
    }

    /** Knapsack cells filled so far by this object. */
    long cells() {
        return cells;
    }

    /** True when the cell budget is spent: column generation and diving stop. */
    boolean exhausted() {
        return cells > cellBudget;
    }

    /** Every tube of each type. */
    int[] supplyOfAll() {
        return types.stream().mapToInt(TubeType::count).toArray();
    }

    private void priceBore(List<Integer> hosts, double[] guestValue, boolean bound, double[] best,
                           int[][] patterns, int[] supply) {
        HostLoad shape = new HostLoad(0, problem.innerDiameterMm(types.get(hosts.get(0)).sample()));
        List<int[]> items = new ArrayList<>(); // {guest type, rows, weight}
        List<Double> itemValues = new ArrayList<>();
        for (int g : guestsOf(hosts.get(0))) {
            if (guestValue[g] <= 1e-12 || supply[g] <= 0) {
                continue;
            }
            Tube guest = types.get(g).sample();
            int channels = shape.mostChannels(guest.outerDiameterMm());
            int weight = bound ? (int) Math.floor(guest.lengthMm() / unitMm + 1e-9)
                    : (int) Math.ceil(guest.lengthMm() / unitMm - 1e-9);
            int rowsLeft = supply[g];
            for (int chunk = 1; rowsLeft > 0; chunk *= 2) {
                int rows = Math.min(chunk, rowsLeft);
                rowsLeft -= rows;
                items.add(new int[] {g, rows, weight * rows});
                itemValues.add(rows * channels * guestValue[g]);
            }
        }
        int capacity = 0;
        int[] hostCapacity = new int[hosts.size()];
        for (int i = 0; i < hosts.size(); i++) {
            double usable = problem.usableLengthMm(types.get(hosts.get(i)).sample()) / unitMm;
            hostCapacity[i] = bound ? (int) Math.ceil(usable - 1e-9) : (int) Math.floor(usable + 1e-9);
            capacity = Math.max(capacity, hostCapacity[i]);
        }
        double[] value = new double[capacity + 1];
        cells += (long) items.size() * (capacity + 1);
        boolean[][] keep = bound ? null : new boolean[items.size()][];
        for (int i = 0; i < items.size(); i++) {
            int w = items.get(i)[2];
            double v = itemValues.get(i);
            if (!bound) {
                keep[i] = new boolean[capacity + 1];
            }
            for (int c = capacity; c >= w; c--) {
                if (value[c - w] + v > value[c] + 1e-12) {
                    value[c] = value[c - w] + v;
                    if (!bound) {
                        keep[i][c] = true;
                    }
                }
            }
        }
        for (int i = 0; i < hosts.size(); i++) {
            int h = hosts.get(i);
            best[h] = value[hostCapacity[i]];
            if (bound) {
                best[h] = Math.min(best[h], fractionalBound(h, guestValue, shape, supply));
            }
            if (!bound && best[h] > 1e-12) {
                int[] rows = new int[types.size()];
                int c = hostCapacity[i];
                for (int item = items.size() - 1; item >= 0; item--) {
                    if (keep[item][c]) {
                        rows[items.get(item)[0]] += items.get(item)[1];
                        c -= items.get(item)[2];
                    }
                }
                patterns[h] = rows;
            }
        }
    }

    /** Fractional knapsack: rows r_t <= n_t / k_t of length_t, value k_t * value_t, within the usable length. */
    private double fractionalBound(int host, double[] guestValue, HostLoad shape, int[] supply) {
        List<double[]> rows = new ArrayList<>(); // {value per mm, length available, value of all}
        for (int g : guestsOf(host)) {
            if (guestValue[g] > 1e-12) {
                Tube guest = types.get(g).sample();
                int k = shape.mostChannels(guest.outerDiameterMm());
                double length = guest.lengthMm() * supply[g] / k;
                rows.add(new double[] {k * guestValue[g] / guest.lengthMm(), length});
            }
        }
        rows.sort((a, b) -> Double.compare(b[0], a[0]));
        double room = problem.usableLengthMm(types.get(host).sample());
        double total = 0;
        for (double[] row : rows) {
            double take = Math.min(room, row[1]);
            total += take * row[0];
            room -= take;
            if (room <= 0) {
                break;
            }
        }
        return total;
    }

    /** Guests of each type in the rows, k_t per row, not capped: the LP column. */
    TypeCounts rowCounts(int host, TypeCounts rows) {
        HostLoad shape = new HostLoad(0, problem.innerDiameterMm(types.get(host).sample()));
        int[] counts = new int[types.size()];
        for (int i = 0; i < rows.size(); i++) {
            int t = rows.type(i);
            counts[t] = rows.count(i) * shape.mostChannels(types.get(t).sample().outerDiameterMm());
        }
        return TypeCounts.of(counts);
    }

    /** The layout of rows: one segment per channel count, rows stacked; copies capped at the supply. */
    Pattern rowPattern(int host, TypeCounts rows) {
        return rowPattern(host, rows, supplyOfAll());
    }

    /** As {@link #rowPattern(int, TypeCounts)}, capped at the given supply per type. */
    Pattern rowPattern(int host, TypeCounts rows, int[] supply) {
        HostLoad shape = new HostLoad(0, problem.innerDiameterMm(types.get(host).sample()));
        Map<Integer, List<List<Integer>>> lanesByChannels = new java.util.TreeMap<>();
        int[] counts = new int[types.size()];
        for (int i = 0; i < rows.size(); i++) {
            int t = rows.type(i);
            int channels = shape.mostChannels(types.get(t).sample().outerDiameterMm());
            int copies = Math.min(rows.count(i) * channels, supply[t]);
            if (copies <= 0) {
                continue;
            }
            List<List<Integer>> lanes = lanesByChannels.computeIfAbsent(channels, k -> {
                List<List<Integer>> l = new ArrayList<>();
                for (int j = 0; j < k; j++) {
                    l.add(new ArrayList<>());
                }
                return l;
            });
            counts[t] = copies;
            for (int copy = 0; copy < copies; copy++) {
                lanes.get(copy % channels).add(t);
            }
        }
        List<Pattern.Segment> segments = new ArrayList<>();
        lanesByChannels.forEach((k, lanes) -> segments.add(new Pattern.Segment(k, lanes)));
        return new Pattern(host, TypeCounts.of(counts), segments);
    }
}
