package kitwright.cutting;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import kitwright.model.Origin;

/** Small section problems for unit tests (invented data, fixed seeds). */
final class TestSections {
    /** Small deterministic work limits for unit tests; the wall-clock limit is generous and never reached. */
    static final SearchLimits LIMITS = new SearchLimits(60, 2000, 60, 0.5, 1.0, 20_000);

    private TestSections() {
    }

    static Demand demand(String mark, double length, int quantity) {
        return new Demand(mark, length, quantity);
    }

    static StockOption mill(double length, Double price) {
        return new StockOption(length, price, null, Origin.MILL);
    }

    static StockOption rack(double length, Double price, int available) {
        return new StockOption(length, price, available, Origin.RACK);
    }

    static SectionProblem section(List<Demand> demands, List<StockOption> stock, double kerf, double trim,
                                  double minRemnant) {
        return new SectionProblem("CHS 48.3x3.2", demands, stock, kerf, trim, minRemnant, LIMITS);
    }

    /**
     * A small random section: 2-5 marks of whole millimetres, 1-3 stock lengths (prices or none, sometimes a
     * limited mill length), sometimes a rack row; kerf 0-3 mm, trim 0-5 mm. Total pieces at most {@code maxPieces}.
     */
    static SectionProblem random(long seed, int maxPieces) {
        SplittableRandom random = new SplittableRandom(seed);
        int stockLength = 1000 + 100 * random.nextInt(21);
        int marks = 2 + random.nextInt(4);
        List<Demand> demands = new ArrayList<>();
        int pieces = 0;
        for (int m = 0; m < marks && pieces < maxPieces; m++) {
            int quantity = 1 + random.nextInt(Math.max(1, Math.min(6, maxPieces - pieces)));
            int length = 150 + random.nextInt(stockLength * 2 / 3);
            demands.add(new Demand("M" + (m + 1), length, quantity));
            pieces += quantity;
        }
        boolean priced = random.nextInt(4) != 0;
        List<StockOption> stock = new ArrayList<>();
        stock.add(new StockOption(stockLength, priced ? (double) 20 + random.nextInt(30) : null, null, Origin.MILL));
        int lengths = 1 + random.nextInt(3);
        for (int l = 1; l < lengths; l++) {
            int length = stockLength + 200 * (1 + random.nextInt(10)) * (l == 1 ? 1 : 2);
            Integer available = random.nextInt(3) == 0 ? 1 + random.nextInt(3) : null;
            stock.add(new StockOption(length, priced ? (double) 20 + random.nextInt(40) : null, available,
                    Origin.MILL));
        }
        if (random.nextBoolean()) {
            int length = 400 + random.nextInt(stockLength - 300);
            stock.add(new StockOption(length, priced ? (double) random.nextInt(5) : null, 1 + random.nextInt(3),
                    Origin.RACK));
        }
        double kerf = random.nextInt(4);
        double trim = random.nextInt(6);
        return new SectionProblem("random-" + seed, demands, stock, kerf, trim, 300, LIMITS);
    }
}
