package kitwright.cli;

import java.util.Locale;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestResult;
import kitwright.plan.PlanResult;

/** The short text {@code plan} prints when it has finished: stock, bundles, crates and trips with their bounds. */
final class PlanSummaryText {
    private PlanSummaryText() {
    }

    static String format(PlanResult result) {
        StringBuilder sb = new StringBuilder(CutSummaryText.format(result.kit(), result.cutting()));
        if (result.spares() != null) {
            sb.append(SparesText.outcome(result.spares())).append(System.lineSeparator());
        }
        NestResult nesting = result.nesting();
        NestPlan nest = nesting.plan();
        sb.append(String.format(Locale.ROOT,
                "%nNesting (%s, clearance %.1f mm): %d pieces in %d bundles; lower bound %s; %s."
                        + " Shipping volume %.2f m3 nested, %.2f m3 loose.%n",
                nest.tolerance().code(), nest.clearanceMm(), nesting.pieces(), nest.bundles().size(),
                bound(nest.lowerBound()), nesting.statusText(), nesting.bundledVolumeM3(), nesting.looseVolumeM3()));
        if (nesting.reason() != null) {
            sb.append("  ").append(nesting.reason()).append(System.lineSeparator());
        }
        if (result.logisticsPlanned()) {
            sb.append(PackSummary.text(null, null, result.crates(), result.loads(), result.kit().crates()));
        } else {
            sb.append("Crates and trucks: not planned (no crate or vehicle catalog).").append(System.lineSeparator());
        }
        if (result.tour() != null) {
            sb.append(TourText.format(result.tour()));
        }
        sb.append(System.lineSeparator()).append("Material and logistics planning only: no structural, lifting or"
                + " load-securing check. Follow local codes and licensed professionals.").append(System.lineSeparator());
        return sb.toString();
    }

    /** A bundle-count bound: whole, or fractional with the whole count it proves ("154.33, so at least 155"). */
    static String bound(double value) {
        if (Math.abs(value - Math.rint(value)) < 1e-6) {
            return String.valueOf(Math.round(value));
        }
        return String.format(Locale.ROOT, "%.2f, so at least %d", value, (long) Math.ceil(value - 1e-6));
    }
}
