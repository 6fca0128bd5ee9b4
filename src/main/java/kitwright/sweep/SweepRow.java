package kitwright.sweep;

import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.Objects;
import kitwright.model.Status;

/**
 * One option of {@code sweep.json} and one row of {@code sweep.csv}: the grouping's changes beside the planned
 * figures, which are those {@code plan} and {@code compare} give for the option's kit folder. Money in the
 * catalogs' currency; unknown figures null.
 *
 * @param marks        K
 * @param kit          the option's folder name, kNN
 * @param maxChangeMm  largest |target - mark| of any member
 * @param meanChangeMm mean |target - mark| over all members, to 0.01 mm
 * @param reuseRatio   members / bars
 * @param cost         price of the stock cut (the cutting's objective, compare's "cost")
 * @param crateCost    price of the crates, null without prices or a crate plan
 * @param tripCost     cost of the trips, null without a load plan
 * @param totalCost    cost + crateCost + tripCost, null when one is unknown
 * @param offcutPct    offcut in percent of the stock length cut
 * @param bundles      nested bundles
 * @param crates       crates
 * @param vehicles     vehicles or containers
 * @param co2eKg       embodied carbon of the stock bought
 * @param status       the worst status of the option's stages
 * @param reason       why a part has no plan (INFEASIBLE), else null
 * @param pareto       no other option has both total cost and largest change no larger, one of them smaller
 */
@JsonPropertyOrder({"marks", "kit", "maxChangeMm", "meanChangeMm", "reuseRatio", "cost", "crateCost", "tripCost",
    "totalCost", "offcutPct", "bundles", "crates", "vehicles", "co2eKg", "status", "reason", "pareto"})
public record SweepRow(int marks, String kit, double maxChangeMm, double meanChangeMm, Double reuseRatio,
                       Double cost, Double crateCost, Double tripCost, Double totalCost, double offcutPct,
                       Integer bundles, Integer crates, Integer vehicles, Double co2eKg, Status status,
                       String reason, boolean pareto) {
    public SweepRow {
        Objects.requireNonNull(kit, "kit");
        Objects.requireNonNull(status, "status");
    }

    /** This row with its Pareto flag. */
    SweepRow withPareto(boolean flag) {
        return new SweepRow(marks, kit, maxChangeMm, meanChangeMm, reuseRatio, cost, crateCost, tripCost, totalCost,
                offcutPct, bundles, crates, vehicles, co2eKg, status, reason, flag);
    }

    /** Whether the row takes part in the Pareto front: planned, with a known total cost. */
    boolean ranked() {
        return status != Status.INFEASIBLE && totalCost != null;
    }
}
