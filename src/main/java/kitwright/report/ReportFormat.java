package kitwright.report;

import java.math.BigDecimal;
import java.math.RoundingMode;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Status;

/** Wording shared by several sections: status, gap and objective values of a plan. */
final class ReportFormat {
    private ReportFormat() {
    }

    /** "optimal (proven)", "feasible, gap 0.42 %" (with the reason when the clock stopped it) or "no plan". */
    static String status(SectionCutPlan plan) {
        return switch (plan.status()) {
            case OPTIMAL -> "optimal (proven)";
            case FEASIBLE -> "feasible, gap " + gap(plan.gap())
                    + (plan.reason() == null ? "" : ", " + plan.reason()); // e.g. stopped by the time limit
            case INFEASIBLE -> "no plan";
        };
    }

    /** A CSS class per status. */
    static String statusClass(Status status) {
        return "status-" + status.name().toLowerCase(java.util.Locale.ROOT);
    }

    /** The gap in percent with two decimals ("0 %" when exactly zero, the unknown sign when null). */
    static String gap(Double gap) {
        if (gap == null) {
            return ShopFormat.UNKNOWN;
        }
        if (gap == 0) {
            return "0\u00A0%";
        }
        return BigDecimal.valueOf(gap * 100).setScale(2, RoundingMode.HALF_UP).toPlainString() + "\u00A0%";
    }

    /** An objective value in its unit: money for "cost", metres for "length" (the plan gives millimetres). */
    static String objective(String objective, Double value) {
        if (value == null) {
            return ShopFormat.UNKNOWN;
        }
        return "length".equals(objective) ? ShopFormat.metres(value) + "\u00A0m" : ShopFormat.money(value);
    }

    /** A value that may be unknown. */
    static String money(Double amount) {
        return amount == null ? ShopFormat.UNKNOWN : ShopFormat.money(amount);
    }

    /** A mass that may be unknown. */
    static String kg(Double kilograms) {
        return kilograms == null ? ShopFormat.UNKNOWN : ShopFormat.kg(kilograms) + "\u00A0kg";
    }
}
