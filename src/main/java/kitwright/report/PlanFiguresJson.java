package kitwright.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import kitwright.metrics.KitMetrics;
import kitwright.metrics.MaterialCarbon;
import kitwright.model.SparesPolicy;
import kitwright.spares.MarkSpares;
import kitwright.spares.SparesOutcome;
import kitwright.spares.SparesSupply;

/**
 * The {@code "figures"} and {@code "spares"} blocks of plan.json: the kit's figures over its cutting plan and its
 * service-life spares, with their keys in a fixed order and their numbers rounded for reading, so that the same plan
 * gives the same bytes. Lengths to 0.1 mm, money to 0.01, percentages to 0.01, masses and CO2e to 0.001 kg (as the
 * kit summary), the reuse ratio to 0.001, expected losses to 0.001 bars, probabilities to six significant digits.
 * Emission factors and counts are written as they are. Pure functions.
 */
public final class PlanFiguresJson {
    private static final MathContext SIX_DIGITS = new MathContext(6, RoundingMode.HALF_UP);

    private PlanFiguresJson() {
    }

    /**
     * plan.json {@code "figures"}: see {@link KitMetrics} for each figure's definition.
     *
     * @param carbon embodied carbon per material of the stock bought (empty when materials are unknown)
     */
    public record Figures(int marks, int bars, Integer members, Double reuseRatio, int stockPieces, int boughtPieces,
                          double stockLengthMm, double boughtLengthMm, Double cost, double offcutPct,
                          double scrapPct, double remnantPct, Double kitMassKg, Double boughtMassKg,
                          Double usedStockMassKg, Double co2eKg,
                          List<Carbon> carbon) {
        public Figures {
            carbon = List.copyOf(carbon);
        }
    }

    /** Embodied carbon of one material: co2eKg = boughtMassKg x co2eKgPerKg, the factor with its source. */
    public record Carbon(String material, double boughtMassKg, double co2eKgPerKg, double co2eKg, String source) {
    }

    /**
     * plan.json {@code "spares"}.
     *
     * @param kitLevel  the chance that every mark is covered: the product of the marks' coverage (marks'
     *                  losses independent, common practice)
     * @param extraCost stock cost of the plan with spares minus that of the plan without, null without prices
     */
    public record Spares(Policy policy, double kitLevel, Double extraCost, int replans, List<Mark> marks,
                         Totals totals) {
        public Spares {
            marks = List.copyOf(marks);
        }
    }

    /** The kit.json {@code spares} policy the spares were sized for. */
    public record Policy(double lossRatePerCycle, int cycles, double serviceLevel) {
    }

    /**
     * One mark.
     *
     * @param bars            bars in service at once (the structures' need), n
     * @param barCycles       bars x cycles, n c: the trials of the mark's losses, lost bars being replaced
     * @param expectedLosses  barCycles x lossRatePerCycle
     * @param perMarkLevel    serviceLevel^(1/marks in service)
     * @param coverage        P(losses <= alreadyInKit + toMake) for losses ~ Binomial(barCycles, lossRatePerCycle)
     * @param sparesNeeded    the smallest s with P(losses <= s) >= perMarkLevel
     * @param alreadyInKit    surplus bars in bars.csv beyond the structures' need, counted as spares
     * @param toMake          sparesNeeded - alreadyInKit, at least 0
     * @param fromOffcuts     spares cut from offcuts of stock bought anyway
     * @param bought          spares for which stock was bought
     * @param missing         spares that could not be cut
     */
    public record Mark(String mark, int bars, int barCycles, double expectedLosses, double perMarkLevel,
                       double coverage, int sparesNeeded, int alreadyInKit, int toMake, int fromOffcuts, int bought,
                       int missing) {
    }

    /** Sums over the marks. */
    public record Totals(int bars, double expectedLosses, int sparesNeeded, int alreadyInKit, int toMake,
                         int fromOffcuts, int bought, int missing) {
    }

    public static Figures figures(KitMetrics m) {
        List<Carbon> carbon = m.carbon().stream().map(PlanFiguresJson::carbon).toList();
        return new Figures(m.marks(), m.bars(), m.members(), round(m.reuseRatio(), 3), m.stockPieces(),
                m.boughtPieces(), round(m.stockLengthMm(), 1), round(m.boughtLengthMm(), 1), round(m.cost(), 2),
                round(m.offcutPct(), 2), round(m.scrapPct(), 2), round(m.remnantPct(), 2), round(m.kitMassKg(), 3),
                round(m.boughtMassKg(), 3), round(m.usedStockMassKg(), 3), round(m.co2eKg(), 3), carbon);
    }

    private static Carbon carbon(MaterialCarbon c) {
        return new Carbon(c.material(), round(c.boughtMassKg(), 3), c.co2eKgPerKg(), round(c.co2eKg(), 3),
                c.source());
    }

    /** The spares block, or null when the plan has no service-life spares (no policy in kit.json). */
    public static Spares spares(SparesOutcome outcome) {
        if (outcome == null) {
            return null;
        }
        SparesPolicy p = outcome.sizing().policy();
        List<Mark> marks = new ArrayList<>();
        int bars = 0;
        int needed = 0;
        int inKit = 0;
        int toMake = 0;
        for (MarkSpares m : outcome.sizing().marks()) {
            SparesSupply s = outcome.supply(m.mark());
            marks.add(new Mark(m.mark(), m.bars(), m.barCycles(), round(m.expectedLosses(), 3),
                    probability(m.perMarkLevel()), probability(m.coverage()), m.spares(), m.alreadyInKit(), m.toMake(),
                    s.fromOffcuts(), s.bought(), s.missing()));
            bars += m.bars();
            needed += m.spares();
            inKit += m.alreadyInKit();
            toMake += m.toMake();
        }
        Totals totals = new Totals(bars, round(outcome.sizing().totalExpectedLosses(), 3), needed, inKit, toMake,
                outcome.fromOffcuts(), outcome.bought(), outcome.missing());
        return new Spares(new Policy(p.lossRatePerCycle(), p.cycles(), p.serviceLevel()),
                probability(outcome.sizing().kitLevel()), round(outcome.extraCost(), 2), outcome.rounds(), marks,
                totals);
    }

    /** A probability to six significant digits (so small loss probabilities keep their precision). */
    static double probability(double value) {
        return new BigDecimal(value).round(SIX_DIGITS).doubleValue();
    }

    static Double round(Double value, int decimals) {
        return value == null || !Double.isFinite(value) ? null : round(value.doubleValue(), decimals);
    }

    static double round(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_UP).doubleValue();
    }
}
