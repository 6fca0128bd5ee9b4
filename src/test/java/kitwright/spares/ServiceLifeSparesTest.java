package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import kitwright.model.Bar;
import kitwright.model.SparesPolicy;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ServiceLifeSparesTest {

    private static Bar bar(String mark, int quantity, int required) {
        return new Bar(mark, "CHS 48.3x3.2", 1000, quantity, required, null, null, "");
    }

    @Test
    @DisplayName("Binomial quantiles agree with Apache Commons Math 3 BinomialDistribution (independent reference)")
    void quantilesAgreeWithCommonsMath() {
        int checked = 0;
        for (int n : new int[] {1, 2, 7, 24, 60, 150, 600}) {
            for (double q : new double[] {0.001, 0.01, 0.05, 0.183, 0.5, 0.9}) {
                for (double level : new double[] {0.5, 0.8, 0.9, 0.95, 0.99, 0.999}) {
                    // Reference: org.apache.commons.math3.distribution.BinomialDistribution (commons-math3 3.6.1)
                    int expected = new BinomialDistribution(null, n, q).inverseCumulativeProbability(level);
                    assertThat(ServiceLifeSpares.quantile(n, q, level))
                            .as("n=%d q=%s level=%s (reference: commons-math3)", n, q, level)
                            .isEqualTo(expected);
                    checked++;
                }
            }
        }
        assertThat(checked).isEqualTo(7 * 6 * 6);
    }

    @Test
    @DisplayName("Quantile of Binomial(2, 0.5) by hand: P(X<=0)=0.25, P(X<=1)=0.75, P(X<=2)=1")
    void quantileByHand() {
        assertThat(ServiceLifeSpares.quantile(2, 0.5, 0.25)).isZero();
        assertThat(ServiceLifeSpares.quantile(2, 0.5, 0.26)).isEqualTo(1);
        assertThat(ServiceLifeSpares.quantile(2, 0.5, 0.75)).isEqualTo(1);
        assertThat(ServiceLifeSpares.quantile(2, 0.5, 0.76)).isEqualTo(2);
        assertThat(ServiceLifeSpares.quantile(2, 0.5, 1.0)).isEqualTo(2);
        assertThat(ServiceLifeSpares.quantile(0, 0.5, 0.99)).isZero();
        assertThat(ServiceLifeSpares.quantile(50, 0.0, 0.99)).isZero();
    }

    @Test
    @DisplayName("Losses over the life: n bars in service for c cycles are n c trials at p (lost bars replaced)")
    void barCyclesAreTheTrials() {
        MarkSpares m = ServiceLifeSpares.forMark("A", 12, 0, new SparesPolicy(0.02, 10, 0.9), 0.9);
        assertThat(m.barCycles()).isEqualTo(120);
        assertThat(m.expectedLosses()).isCloseTo(2.4, within(1e-12));
        // One bar, one cycle: lost with p, so one spare covers it for sure and none with 1 - p.
        assertThat(ServiceLifeSpares.coverage(1, 0.02, 0)).isCloseTo(0.98, within(1e-15));
        assertThat(ServiceLifeSpares.coverage(1, 0.02, 1)).isEqualTo(1.0);
        assertThat(ServiceLifeSpares.forMark("A", 0, 3, new SparesPolicy(0.5, 10, 0.9), 0.9).spares()).isZero();
        assertThat(ServiceLifeSpares.forMark("A", 5, 0, new SparesPolicy(0.0, 10, 0.9), 0.9).spares()).isZero();
        // Every bar lost at every cycle: all n c bar-cycles need a spare.
        assertThat(ServiceLifeSpares.forMark("A", 3, 0, new SparesPolicy(1.0, 4, 0.9), 0.9).spares()).isEqualTo(12);
    }

    @Test
    @DisplayName("More bar-cycles than an int holds are refused with the mark named, not wrapped round")
    void tooManyBarCycles() {
        assertThatThrownBy(() -> ServiceLifeSpares.forMark("A", 100_000, 0, new SparesPolicy(0.01, 30_000, 0.9),
                0.9)).hasMessageContaining("mark A").hasMessageContaining("bar-cycles");
    }

    @Test
    @DisplayName("The kit level is split as level^(1/marks) over the marks in service (common practice)")
    void perMarkLevelSplitsTheKitLevel() {
        SparesPlan plan = ServiceLifeSpares.plan(
                List.of(bar("A", 100, 100), bar("B", 40, 40), bar("C", 10, 10), bar("X", 3, 0)),
                new SparesPolicy(0.01, 8, 0.95));
        double perMark = Math.pow(0.95, 1.0 / 3);
        assertThat(plan.marks()).allSatisfy(m -> assertThat(m.perMarkLevel()).isCloseTo(perMark, within(1e-15)));
        // Each mark covered with perMark, so all three with perMark^3 = 0.95 at least (independence).
        assertThat(plan.kitLevel()).isGreaterThanOrEqualTo(0.95 - 1e-12);
        MarkSpares x = plan.mark("X");
        assertThat(x.bars()).isZero();
        assertThat(x.spares()).isZero();
        assertThat(x.alreadyInKit()).isEqualTo(3);
    }

    @Test
    @DisplayName("Each mark's spares meet its level and one fewer would not (defining inequality, commons-math3 CDF)")
    void sparesAreTheSmallestCovering() {
        SparesPolicy policy = new SparesPolicy(0.03, 6, 0.9);
        SparesPlan plan = ServiceLifeSpares.plan(
                List.of(bar("A", 240, 240), bar("B", 120, 120), bar("C", 36, 36)), policy);
        for (MarkSpares m : plan.marks()) {
            // Reference: org.apache.commons.math3.distribution.BinomialDistribution (commons-math3 3.6.1)
            BinomialDistribution reference = new BinomialDistribution(null, m.bars() * 6, 0.03);
            assertThat(reference.cumulativeProbability(m.spares())).isGreaterThanOrEqualTo(m.perMarkLevel());
            assertThat(reference.cumulativeProbability(m.spares() - 1)).isLessThan(m.perMarkLevel());
            assertThat(m.coverage()).isCloseTo(reference.cumulativeProbability(m.spares()), within(1e-12));
            assertThat(m.expectedLosses()).isCloseTo(m.bars() * 6 * 0.03, within(1e-12));
        }
        assertThat(plan.totalSpares()).isEqualTo(plan.marks().stream().mapToInt(MarkSpares::spares).sum());
        assertThat(plan.totalExpectedLosses())
                .isCloseTo(plan.marks().stream().mapToDouble(MarkSpares::expectedLosses).sum(), within(1e-9));
    }

    @Test
    @DisplayName("A higher service level never needs fewer spares: 0.5 against 0.99")
    void higherLevelNeedsMoreSpares() {
        List<Bar> bars = List.of(bar("A", 300, 300), bar("B", 90, 90), bar("C", 12, 12));
        SparesPlan median = ServiceLifeSpares.plan(bars, new SparesPolicy(0.02, 10, 0.5));
        SparesPlan high = ServiceLifeSpares.plan(bars, new SparesPolicy(0.02, 10, 0.99));
        for (int i = 0; i < bars.size(); i++) {
            assertThat(high.marks().get(i).spares()).isGreaterThan(median.marks().get(i).spares());
        }
        // One mark at level 0.5: the spares are the Binomial median, which is floor(nq) or ceil(nq)
        // (Kaas & Buhrman 1980, Statistica Neerlandica 34; from memory).
        MarkSpares one = ServiceLifeSpares.plan(List.of(bar("A", 300, 300)), new SparesPolicy(0.02, 10, 0.5))
                .mark("A");
        assertThat(one.spares()).isBetween((int) Math.floor(one.expectedLosses()),
                (int) Math.ceil(one.expectedLosses()));
    }

    @Test
    @DisplayName("Surplus bars already in the kit count towards the spares")
    void surplusCountsTowardsSpares() {
        SparesPlan plan = ServiceLifeSpares.plan(List.of(bar("A", 110, 100), bar("B", 50, 50)),
                new SparesPolicy(0.05, 4, 0.95));
        MarkSpares a = plan.mark("A");
        assertThat(a.bars()).isEqualTo(100);
        assertThat(a.alreadyInKit()).isEqualTo(10);
        assertThat(a.toMake()).isEqualTo(Math.max(0, a.spares() - 10));
        assertThat(plan.totalToMake()).isEqualTo(a.toMake() + plan.mark("B").spares());
    }

    @Test
    void rejectsPoliciesOutOfRange() {
        List<Bar> bars = List.of(bar("A", 10, 10));
        assertThatThrownBy(() -> ServiceLifeSpares.plan(bars, new SparesPolicy(-0.1, 3, 0.9)))
                .hasMessageContaining("lossRatePerCycle");
        assertThatThrownBy(() -> ServiceLifeSpares.plan(bars, new SparesPolicy(0.1, -1, 0.9)))
                .hasMessageContaining("cycles");
        assertThatThrownBy(() -> ServiceLifeSpares.plan(bars, new SparesPolicy(0.1, 3, 0)))
                .hasMessageContaining("serviceLevel");
        assertThatThrownBy(() -> ServiceLifeSpares.plan(bars, new SparesPolicy(0.1, 3, Double.NaN)))
                .hasMessageContaining("serviceLevel");
    }
}
