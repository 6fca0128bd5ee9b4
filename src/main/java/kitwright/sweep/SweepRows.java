package kitwright.sweep;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import kitwright.compare.OptionSummary;

/**
 * The rows of the sweep: each option's grouping figures beside its planned summary, and the Pareto front over
 * total cost and largest change. Pure function.
 */
public final class SweepRows {
    private SweepRows() {
    }

    /**
     * What the plan of an option adds to its {@link OptionSummary}.
     *
     * @param crateCost the crates' price, or null when unknown
     * @param reason    why a part has no plan, or null
     */
    public record Planned(OptionSummary summary, Double crateCost, String reason) {
    }

    /** The rows in the options' order (K ascending), Pareto flags set. */
    public static List<SweepRow> of(List<SweepOption> options, List<Planned> planned) {
        if (options.size() != planned.size()) {
            throw new IllegalArgumentException(options.size() + " options, " + planned.size() + " plans");
        }
        List<SweepRow> rows = new ArrayList<>();
        for (int i = 0; i < options.size(); i++) {
            SweepOption o = options.get(i);
            Planned p = planned.get(i);
            OptionSummary s = p.summary();
            Double total = s.cost() == null || p.crateCost() == null || s.tripCost() == null ? null
                    : round(s.cost() + p.crateCost() + s.tripCost());
            rows.add(new SweepRow(o.marks(), o.kit(), o.largestChangeMm(), round(o.meanChangeMm()), s.reuseRatio(),
                    s.cost(), p.crateCost() == null ? null : round(p.crateCost()), s.tripCost(), total,
                    s.offcutPct(), s.bundles(), s.crates(), s.vehicles(), s.co2eKg(), s.status(), p.reason(),
                    false));
        }
        return pareto(rows);
    }

    /**
     * Marks the Pareto front: a ranked row is on it when no other ranked row has both total cost and largest change
     * no larger and one of them smaller. Rows with equal figures are all on it or all off it.
     */
    static List<SweepRow> pareto(List<SweepRow> rows) {
        List<SweepRow> marked = new ArrayList<>();
        for (SweepRow r : rows) {
            boolean front = r.ranked();
            for (SweepRow o : rows) {
                if (front && o.ranked() && o.totalCost() <= r.totalCost() && o.maxChangeMm() <= r.maxChangeMm()
                        && (o.totalCost() < r.totalCost() || o.maxChangeMm() < r.maxChangeMm())) {
                    front = false;
                }
            }
            marked.add(r.withPareto(front));
        }
        return marked;
    }

    private static double round(double value) {
        return BigDecimal.valueOf(value).setScale(2, RoundingMode.HALF_EVEN).doubleValue();
    }
}
