package kitwright.cli;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;
import kitwright.model.SparesPolicy;
import kitwright.spares.SparesOutcome;
import kitwright.spares.SparesPlan;

/**
 * The console lines on the service-life spares. {@code check} and {@code plan} print the same sizing line, from the
 * same sizing ({@link kitwright.spares.SparesStage#sizing}), so the two always state the same numbers; {@code plan}
 * adds where the spares came from.
 */
final class SparesText {
    private SparesText() {
    }

    /**
     * "Service-life spares: N bars to make (policy; needed, surplus held; kit level reached)", or "none" without a
     * policy.
     */
    static String sizing(SparesPlan sizing) {
        if (sizing == null) {
            return "Service-life spares: none (kit.json sets no spares policy)";
        }
        SparesPolicy p = sizing.policy();
        int surplus = sizing.marks().stream().mapToInt(m -> m.alreadyInKit()).sum();
        return String.format(Locale.ROOT, "Service-life spares: %d bars to make (%s %% of the bars in service lost"
                        + " per cycle, %d cycles, kit level %s %%; %d needed, %d surplus bars in the kit count"
                        + " towards them; every mark covered with probability %.1f %%)",
                sizing.totalToMake(), plain(100 * p.lossRatePerCycle()), p.cycles(), plain(100 * p.serviceLevel()),
                sizing.totalSpares(), surplus, 100 * sizing.kitLevel());
    }

    /** The sizing line, then where the spares a plan cut came from and what they added to the stock cost. */
    static String outcome(SparesOutcome spares) {
        return sizing(spares.sizing()) + System.lineSeparator()
                + String.format(Locale.ROOT, "  %d cut from offcuts, %d bought%s, extra stock cost %s.",
                spares.fromOffcuts(), spares.bought(),
                spares.missing() > 0 ? ", " + spares.missing() + " MISSING (stock too short or too few)" : "",
                spares.extraCost() == null ? "unknown (no prices)" : String.format(Locale.ROOT, "%.2f",
                        spares.extraCost()));
    }

    private static String plain(double value) {
        return BigDecimal.valueOf(value).setScale(4, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
    }
}
