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
 * <p><b>Method.</b> A mark has {@code n} bars in service at once. At each of the {@code c} cycles every bar in
 * service is lost with probability {@code p}, independently, and a lost bar is replaced from the spares before the
 * next cycle, so {@code n} bars serve every cycle and a replacement can be lost in turn. The mark's losses over the
 * life are then the successes of {@code n c} independent trials, Binomial(n c, p), with mean {@code n c p}; losses in
 * the last cycle count too (the kit goes back into store complete). The mark runs short at some cycle exactly when
 * its total losses exceed its spares, because the spares only ever go down. The kit's level {@code L} is split over
 * the {@code m} marks that have bars in service as {@code L^(1/m)} per mark: with independent marks the chance that
 * all are covered is the product of the marks' chances, hence at least {@code L} (common practice). A mark's spares
 * are the Binomial quantile: the smallest {@code s} with {@code P(losses <= s) >= L^(1/m)}, taken from Apache
 * Commons Statistics' {@link BinomialDistribution} and confirmed against its cumulative probability, so the
 * definition holds exactly in that library's arithmetic.
 *
 * <p><b>Surplus.</b> The bars in service are the quantity the structures need ({@link Bar#requiredQuantity()}); the
 * kit's surplus over that counts towards the spares, and a mark's coverage is that of the spares it then holds
 * ({@link MarkSpares#held()}).
 *
 * <p>Pure functions: no state, no I/O.
 */
public final class ServiceLifeSpares {
    private ServiceLifeSpares() {
    }

    /**
     * Spares of every mark of a kit, in the order of {@code bars}.
     *
     * @throws IllegalArgumentException when the policy is out of range (see {@link #checkPolicy}) or a mark has more
     *                                  bar-cycles than an {@code int} holds
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
            kitLevel *= m.coverage();
        }
        return new SparesPlan(policy, marks, totalSpares, totalToMake, totalExpected, kitLevel);
    }

    /**
     * Spares of one mark.
     *
     * @param bars         bars of the mark in service at once
     * @param alreadyInKit surplus bars the kit already holds for this mark
     * @param perMarkLevel the probability this mark must be covered with, in (0, 1]
     */
    public static MarkSpares forMark(String mark, int bars, int alreadyInKit, SparesPolicy policy,
                                     double perMarkLevel) {
        checkPolicy(policy);
        int barCycles = barCycles(mark, bars, policy.cycles());
        double p = policy.lossRatePerCycle();
        int spares = quantile(barCycles, p, perMarkLevel);
        int held = Math.max(spares, alreadyInKit);
        return new MarkSpares(mark, bars, barCycles, p, spares, perMarkLevel, alreadyInKit,
                coverage(barCycles, p, held));
    }

    /** The per-mark share of a kit's service level, {@code level^(1/marks)}; the level itself for one mark or none. */
    public static double perMarkLevel(double kitLevel, int marks) {
        return marks <= 1 ? kitLevel : Math.pow(kitLevel, 1.0 / marks);
    }

    /**
     * The smallest {@code s} in [0, trials] with {@code P(X <= s) >= level} for X ~ Binomial(trials, p).
     *
     * @param level in (0, 1]
     */
    public static int quantile(int trials, double p, double level) {
        if (trials < 0 || !(p >= 0 && p <= 1) || !(level > 0 && level <= 1)) {
            throw new IllegalArgumentException("bad binomial quantile arguments: trials=" + trials + " p=" + p
                    + " level=" + level);
        }
        if (trials == 0 || p == 0) {
            return 0;
        }
        BinomialDistribution d = BinomialDistribution.of(trials, p);
        int s = d.inverseCumulativeProbability(level);
        // Confirm the defining inequality in the library's own cumulative probability (guards rounding at the edge).
        while (s < trials && d.cumulativeProbability(s) < level) {
            s++;
        }
        while (s > 0 && d.cumulativeProbability(s - 1) >= level) {
            s--;
        }
        return s;
    }

    /** P(X <= spares) for X ~ Binomial(trials, p): the chance that a mark with {@code spares} is covered. */
    public static double coverage(int trials, double p, int spares) {
        if (trials == 0 || p == 0 || spares >= trials) {
            return 1;
        }
        return BinomialDistribution.of(trials, p).cumulativeProbability(spares);
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

    /** n * c, the trials of a mark's losses; the kit.json limit on cycles keeps it within an {@code int}. */
    private static int barCycles(String mark, int bars, int cycles) {
        long trials = (long) bars * cycles;
        if (trials > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("mark " + mark + ": " + bars + " bars x " + cycles
                    + " cycles is more bar-cycles than " + Integer.MAX_VALUE);
        }
        return (int) trials;
    }
}
