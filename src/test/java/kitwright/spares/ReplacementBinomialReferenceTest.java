package kitwright.spares;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.List;
import kitwright.io.KitReader;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.SparesPolicy;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.ojalgo.random.Binomial;

/**
 * The spares of a mark of n bars over c cycles at loss rate p are the Binomial(n c, p) quantile at the mark's
 * level, checked against two references that production does not use (production uses Apache Commons Statistics):
 * <ul>
 *   <li>ojAlgo's {@code org.ojalgo.random.Binomial} (ojAlgo 55.1.0), which gives the probability of each count;
 *   the cumulative probability here is their sum. Its binomial coefficient is a {@code long} computed through
 *   doubles: exact to 1e-15 relative up to 66 trials, saturated at {@code Long.MAX_VALUE} above (seen here on
 *   160 trials), so it is used on at most 60 trials;</li>
 *   <li>for the larger marks of the sample kit, the binomial sum written out in exact decimal arithmetic
 *   ({@link BigDecimal}, p = 0.02 and 0.01 being exact decimals): no rounding until the final comparison.</li>
 * </ul>
 */
class ReplacementBinomialReferenceTest {
    /** Most trials ojAlgo's Binomial is used on (see the class comment). */
    private static final int OJALGO_MAX_TRIALS = 60;

    /** P(X <= s) for X ~ Binomial(trials, p), summed from ojAlgo's probabilities of 0..s. */
    private static double ojAlgoCumulative(int trials, double p, int s) {
        assertThat(trials).as("trials within ojAlgo's exact range").isLessThanOrEqualTo(OJALGO_MAX_TRIALS);
        Binomial reference = new Binomial(trials, p);
        double sum = 0;
        for (int k = 0; k <= s; k++) {
            sum += reference.getProbability(k);
        }
        return sum;
    }

    /** P(X <= s) for X ~ Binomial(trials, p), exactly: the sum of C(trials, k) p^k (1 - p)^(trials - k). */
    private static double exactCumulative(int trials, String p, int s) {
        BigDecimal loss = new BigDecimal(p);
        BigDecimal keep = BigDecimal.ONE.subtract(loss);
        BigDecimal sum = BigDecimal.ZERO;
        BigInteger choose = BigInteger.ONE; // C(trials, k), updated as k grows
        for (int k = 0; k <= s; k++) {
            if (k > 0) {
                choose = choose.multiply(BigInteger.valueOf(trials - k + 1)).divide(BigInteger.valueOf(k));
            }
            sum = sum.add(new BigDecimal(choose).multiply(loss.pow(k)).multiply(keep.pow(trials - k)));
        }
        return sum.doubleValue();
    }

    private static Bar bar(String mark, int quantity, int required) {
        return new Bar(mark, "CHS 48.3x3.2", 1000, quantity, required, null, null, "");
    }

    @Test
    @DisplayName("One mark: spares = least s with P(Binomial(n c, p) <= s) >= L, reference ojAlgo Binomial")
    void quantilesAgreeWithOjAlgo() {
        int checked = 0;
        for (int n : new int[] {1, 2, 3, 5, 8, 12}) {
            for (int c : new int[] {1, 2, 4, 5}) {
                for (double p : new double[] {0.005, 0.02, 0.1, 0.3, 0.6}) {
                    for (double level : new double[] {0.5, 0.9, 0.95, 0.99}) {
                        MarkSpares m = ServiceLifeSpares.plan(List.of(bar("A", n, n)), new SparesPolicy(p, c, level))
                                .mark("A");
                        int s = m.spares();
                        // Reference: org.ojalgo.random.Binomial (ojAlgo 55.1.0), trials n c
                        double covered = ojAlgoCumulative(n * c, p, s);
                        assertThat(covered).as("n=%d c=%d p=%s L=%s: P(X <= %d) (ojAlgo)", n, c, p, level, s)
                                .isGreaterThanOrEqualTo(level - 1e-12);
                        if (s > 0) {
                            assertThat(ojAlgoCumulative(n * c, p, s - 1))
                                    .as("n=%d c=%d p=%s L=%s: P(X <= %d) (ojAlgo)", n, c, p, level, s - 1)
                                    .isLessThan(level + 1e-12);
                        }
                        assertThat(ServiceLifeSpares.coverage(n * c, p, s)).isCloseTo(covered, within(1e-12));
                        assertThat(m.expectedLosses()).isCloseTo(n * c * p, within(1e-9));
                        checked++;
                    }
                }
            }
        }
        assertThat(checked).isEqualTo(6 * 4 * 5 * 4);
    }

    @Test
    @DisplayName("alu-kiosk: 54 spares, per mark the exact binomial quantile at 0.95^(1/5), kit level the product of"
            + " the exact cumulative probabilities")
    void aluKioskAgainstExactArithmetic() throws Exception {
        Kit kit = KitReader.read(Path.of("sample-kits", "alu-kiosk"));
        SparesPolicy policy = kit.settings().spares();
        assertThat(policy).isEqualTo(new SparesPolicy(0.02, 20, 0.95));
        SparesPlan plan = ServiceLifeSpares.plan(kit.bars(), policy);
        double perMark = Math.pow(0.95, 1.0 / 5);
        double kitLevel = 1;
        int total = 0;
        for (Bar bar : kit.bars()) {
            int trials = bar.requiredQuantity() * policy.cycles();
            int s = 0;
            // Reference: the binomial sum in exact decimal arithmetic, the least s it covers with the per-mark level
            while (exactCumulative(trials, "0.02", s) < perMark) {
                s++;
            }
            assertThat(plan.mark(bar.mark()).spares()).as(bar.mark()).isEqualTo(s);
            kitLevel *= exactCumulative(trials, "0.02", s);
            total += s;
        }
        assertThat(total).isEqualTo(54);
        assertThat(plan.totalToMake()).isEqualTo(54);
        assertThat(plan.kitLevel()).isCloseTo(kitLevel, within(1e-9)).isGreaterThanOrEqualTo(0.95);
    }

    @Test
    @DisplayName("Surplus counts as spares held: a mark whose surplus exceeds its need makes none, and its coverage"
            + " is that of the surplus (exact arithmetic)")
    void surplusIsHeld() {
        SparesPolicy policy = new SparesPolicy(0.01, 10, 0.95);
        // 20 bars in service over 10 cycles: 200 trials, 2 losses expected; the kit holds 10 more than needed.
        SparesPlan plan = ServiceLifeSpares.plan(List.of(bar("A", 30, 20)), policy);
        MarkSpares a = plan.mark("A");
        assertThat(a.bars()).isEqualTo(20);
        assertThat(a.alreadyInKit()).isEqualTo(10);
        assertThat(a.spares()).isLessThan(10);
        assertThat(a.toMake()).isZero();
        assertThat(plan.totalToMake()).isZero();
        // Reference: the binomial sum in exact decimal arithmetic
        assertThat(plan.kitLevel()).isCloseTo(exactCumulative(200, "0.01", 10), within(1e-9));
    }
}
