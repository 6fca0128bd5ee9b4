package kitwright.cutting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import kitwright.model.Origin;
import org.junit.jupiter.api.Test;

/** The bounded-knapsack pricing against brute force over every pattern of small random instances. */
class KnapsackPricingTest {

    @Test
    void bestPatternOfEveryStockLengthMatchesExhaustiveEnumeration() {
        SplittableRandom random = new SplittableRandom(42);
        for (int round = 0; round < 40; round++) {
            List<Demand> demands = new ArrayList<>();
            int marks = 2 + random.nextInt(4);
            for (int m = 0; m < marks; m++) {
                demands.add(new Demand("M" + m, 100 + random.nextInt(900), 1 + random.nextInt(5)));
            }
            List<StockOption> stock = List.of(new StockOption(1000 + random.nextInt(2000), 1.0, null, Origin.MILL),
                    new StockOption(3000 + random.nextInt(1000), 2.0, null, Origin.MILL));
            SectionProblem problem = new SectionProblem("s", demands, stock, random.nextInt(4), random.nextInt(6), 0,
                    TestSections.LIMITS);
            IntegerInstance instance = new IntegerInstance(problem);
            double[] profit = new double[instance.types()];
            int[] bound = new int[instance.types()];
            for (int i = 0; i < profit.length; i++) {
                profit[i] = random.nextDouble();
                bound[i] = instance.demand[i];
            }
            KnapsackPricing.Priced priced = new KnapsackPricing(instance).price(profit, bound);
            for (int k = 0; k < instance.stocks(); k++) {
                double best = bruteForce(instance, profit, bound, instance.capacity[k], 0, 0);
                assertThat(priced.value()[k]).isCloseTo(best, within(1e-9));
                Pattern p = priced.pattern()[k];
                assertThat(instance.fits(p)).isTrue();
                double value = 0;
                for (int i = 0; i < profit.length; i++) {
                    assertThat(p.count(i)).isLessThanOrEqualTo(bound[i]);
                    value += profit[i] * p.count(i);
                }
                assertThat(value).isCloseTo(best, within(1e-9));
            }
        }
    }

    private static double bruteForce(IntegerInstance instance, double[] profit, int[] bound, long room, int type,
                                     double value) {
        if (type == profit.length) {
            return value;
        }
        double best = 0;
        for (int c = 0; c <= bound[type] && (long) c * instance.size[type] <= room; c++) {
            best = Math.max(best, bruteForce(instance, profit, bound, room - (long) c * instance.size[type], type + 1,
                    value + c * profit[type]));
        }
        return best;
    }
}
