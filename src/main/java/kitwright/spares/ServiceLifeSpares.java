package kitwright.spares;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.Bar;
import kitwright.model.SparesPolicy;
import org.apache.commons.statistics.distribution.BinomialDistribution;

/**
 * Sizes the service-life spares of a kit.
 *
 * <p><b>Problem.</b> Bars are lost or damaged at each assembly and take-down. How many spares per mark keep every
 * mark covered over the kit's whole life with a stated probability (the kit's service level)?
 *
 * <p><b>Method.</b> A bar survives {@code c} cycles at loss rate {@code p} with probability {@code (1 - p)^c}
 * (each bar is lost at most once), so the losses of a mark of {@code n} bars in service follow
 * Binomial(n, q) with {@code q = 1 - (1 - p)^c}; the expected losses are {@code n q} (src/docs/sources.md). The
 * kit's level {@code L} is split over the {@code m} marks that have bars in service as {@code L^(1/m)} per mark:
 * with independent marks the chance that all are covered is the product of the marks' chances, hence at least
 * {@code L} (common practice). A mark's spares are the Binomial quantile: the smallest {@code s} with
 * {@code P(losses <= s) >= L^(1/m)}, taken from Apache Commons Statistics' {@link BinomialDistribution} and
 * confirmed against its cumulative probability, so the definition holds exactly in that library's arithmetic.
 *
 * <p><b>Simplifications (stated in the report).</b> The bars in service are the quantity the structures need
 * ({@link Bar#requiredQuantity()}); the kit's surplus over that counts towards the spares; the spares' own losses
 * after they enter service are not modelled.
 *
 * <p>Pure functions: no state, no I/O.
 */
public final class ServiceLifeSpares {
    private ServiceLifeSpares() {
    }

    /**
     * Spares of every mark of a kit, in the order of {@code bars}.
     *
     * @throws IllegalArgumentException when the policy is out of range (see {@link #checkPolicy})
     */
    public static SparesPlan plan(List<Bar> bars, SparesPolicy policy) {
        checkPolicy(policy);
        int marksInService = (int) bars.stream().filter(b -> b.requiredQuantity() > 0).count();
        double perMarkLevel = perMarkLevel(policy.serviceLevel(), marksInService);
        List<MarkSpares> marks = new ArrayList<>(bars.size());
        int totalSpares = 0;
        int totalToMake = 0;
        double totalExpected = 0;
        double kitLevel = 1;
        for (Bar bar : bars) {
            MarkSpares m = forMark(bar.mark(), bar.requiredQuantity(), bar.surplus(), policy, perMarkLevel);
            marks.add(m);
            totalSpares += m.spares();
            totalToMake += m.toMake();
            totalExpected += m.expectedLosses();
            kitLevel *= coverage(m.bars(), m.lossProbability(), m.spares());
        }
        return new SparesPlan(policy, marks, totalSpares, totalToMake, totalExpected, kitLevel);
    }

    /**
     * Spares of one mark.
     *
     * @param bars         bars of the mark in service
     * @param alreadyInKit surplus bars the kit already holds for this mark
     * @param perMarkLevel the probability this mark must be covered with, in (0, 1]
     */
    public static MarkSpares forMark(String mark, int bars, int alreadyInKit, SparesPolicy policy,
                                     double perMarkLevel) {
        checkPolicy(policy);
        double q = lossProbability(policy.lossRatePerCycle(), policy.cycles());
        int spares = quantile(bars, q, perMarkLevel);
        return new MarkSpares(mark, bars, q, bars * q, spares, perMarkLevel, alreadyInKit);
    }

    /** Probability that one bar is lost over {@code cycles} cycles: {@code 1 - (1 - p)^c}, computed without cancellation. */
    public static double lossProbability(double lossRatePerCycle, int cycles) {
        if (lossRatePerCycle >= 1) {
            return cycles > 0 ? 1 : 0;
        }
        // 1 - exp(c * ln(1 - p)), accurate also for tiny p
        return -Math.expm1(cycles * Math.log1p(-lossRatePerCycle));
    }

    /** The per-mark share of a kit's service level, {@code level^(1/marks)}; the level itself for one mark or none. */
    public static double perMarkLevel(double kitLevel, int marks) {
        return marks <= 1 ? kitLevel : Math.pow(kitLevel, 1.0 / marks);
    }

    /**
     * The smallest {@code s} in [0, n] with {@code P(X <= s) >= level} for X ~ Binomial(n, q).
     *
     * @param level in (0, 1]
     */
    public static int quantile(int n, double q, double level) {
        if (n < 0 || !(q >= 0 && q <= 1) || !(level > 0 && level <= 1)) {
            throw new IllegalArgumentException("bad binomial quantile arguments: n=" + n + " q=" + q
                    + " level=" + level);
        }
        if (n == 0 || q == 0) {
            return 0;
        }
        BinomialDistribution d = BinomialDistribution.of(n, q);
        int s = d.inverseCumulativeProbability(level);
        // Confirm the defining inequality in the library's own cumulative probability (guards rounding at the edge).
        while (s < n && d.cumulativeProbability(s) < level) {
            s++;
        }
        while (s > 0 && d.cumulativeProbability(s - 1) >= level) {
            s--;
        }
        return s;
    }

    /** P(X <= spares) for X ~ Binomial(bars, q): the chance that a mark is covered. */
    public static double coverage(int bars, double q, int spares) {
        if (bars == 0 || q == 0 || spares >= bars) {
            return 1;
        }
        return BinomialDistribution.of(bars, q).cumulativeProbability(spares);
    }

    /**
     * Checks a policy: loss rate in [0, 1], cycles at least 0, service level in (0, 1].
     *
     * @throws IllegalArgumentException naming the value out of range
     */
    public static void checkPolicy(SparesPolicy policy) {
        if (!(policy.lossRatePerCycle() >= 0 && policy.lossRatePerCycle() <= 1)) {
            throw new IllegalArgumentException("lossRatePerCycle must be in [0, 1]: " + policy.lossRatePerCycle());
        }
        if (policy.cycles() < 0) {
            throw new IllegalArgumentException("cycles must not be negative: " + policy.cycles());
        }
        if (!(policy.serviceLevel() > 0 && policy.serviceLevel() <= 1)) {
            throw new IllegalArgumentException("serviceLevel must be in (0, 1]: " + policy.serviceLevel());
        }
    }
}
