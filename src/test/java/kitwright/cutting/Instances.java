package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import kitwright.model.Origin;

/** Generated section problems for tests and benchmarks (invented data, fixed seeds). */
public final class Instances {
    private Instances() {
    }

    /**
     * Triplet instances after Falkenauer (1996), "A hybrid grouping genetic algorithm for bin packing", Journal of
     * Heuristics 2: bins of 1000; each triplet's first item is uniform in [380, 490], the second uniform in
     * [250, s/2] of the space s left, the third fills the bin exactly. The optimum is the number of triplets. No
     * kerf, no trim; one price per bin.
     */
    public static SectionProblem triplets(int triplets, long seed, SearchLimits limits) {
        SplittableRandom random = new SplittableRandom(seed);
        Map<Integer, Integer> sizes = new TreeMap<>();
        for (int t = 0; t < triplets; t++) {
            int first = 380 + random.nextInt(111);
            int space = 1000 - first;
            int second = 250 + random.nextInt(space / 2 - 250 + 1);
            int third = space - second;
            sizes.merge(first, 1, Integer::sum);
            sizes.merge(second, 1, Integer::sum);
            sizes.merge(third, 1, Integer::sum);
        }
        List<Demand> demands = new ArrayList<>();
        sizes.forEach((size, count) -> demands.add(new Demand("T" + size, size, count)));
        return new SectionProblem("triplets-" + (3 * triplets), demands,
                List.of(new StockOption(1000, 1.0, null, Origin.MILL)), 0, 0, 0, limits);
    }

    /**
     * A random section like a kit's: {@code marks} marks of 300-3300 mm, one in seven up to 5800 mm (whole or half
     * millimetres) with 2 to {@code maxQuantity} bars each; stock from 6 m and, with more lengths, 12 m and 9 m, cheaper per metre when longer; {@code rackRows}
     * limited rack offcuts of 1.5-4.5 m at a low price; kerf 2-3 mm, trim 5 mm, remnants from 500 mm.
     */
    public static SectionProblem kitSection(String name, int marks, int stockLengths, int rackRows, int maxQuantity,
                                            long seed, SearchLimits limits) {
        SplittableRandom random = new SplittableRandom(seed);
        List<Demand> demands = new ArrayList<>();
        for (int m = 0; m < marks; m++) {
            int span = random.nextInt(7) == 0 ? 5500 : 3000; // mostly short bars, some long ones
            double length = 300 + random.nextInt(span) + (random.nextInt(4) == 0 ? 0.5 : 0);
            demands.add(new Demand("M" + (m + 1), length, 2 + random.nextInt(maxQuantity - 1)));
        }
        double perMetre = 5 + random.nextInt(10);
        List<StockOption> stock = new ArrayList<>();
        stock.add(new StockOption(6000, round2(6 * perMetre), null, Origin.MILL));
        if (stockLengths >= 2) {
            stock.add(new StockOption(12000, round2(12 * perMetre * 0.92), null, Origin.MILL));
        }
        if (stockLengths >= 3) {
            stock.add(new StockOption(9000, round2(9 * perMetre * 0.95), null, Origin.MILL));
        }
        for (int r = 0; r < rackRows; r++) {
            double length = 1500 + 10 * random.nextInt(301);
            stock.add(new StockOption(length, round2(length / 1000 * perMetre * 0.2), 1 + random.nextInt(5),
                    Origin.RACK));
        }
        double kerf = random.nextBoolean() ? 2.0 : (random.nextBoolean() ? 2.5 : 3.0);
        return new SectionProblem(name, demands, stock, kerf, 5, 500, limits);
    }

    private static double round2(double value) {
        return Math.round(value * 100) / 100.0;
    }
}
