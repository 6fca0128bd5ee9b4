package kitwright.compare;

import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Collection;
import java.util.Objects;
import kitwright.metrics.KitMetrics;
import kitwright.model.Status;

/**
 * The figures of one kit option, with exactly the keys of {@code compare.json} (src/docs/compare.md), in that
 * order. Lengths in millimetres, masses in kilograms, money in the catalogs' currency, percentages of the stock
 * length cut. A figure that is not known (no prices, no materials, a stage that did not run) is null.
 *
 * @param kit            the kit's name
 * @param marks          bar types
 * @param bars           bars in the kit
 * @param members        members in all structures, null without structures.csv
 * @param reuseRatio     members / bars (higher is better), null without structures.csv (then not ranked)
 * @param stockPieces    stock pieces cut (mill and rack)
 * @param stockLengthMm  their total length
 * @param cost           price of the stock cut, mill and rack at their catalog prices (what the cutting minimises)
 * @param payableCost    price of the mill stock bought, the amount payable (rack offcuts are already paid for)
 * @param offcutPct      offcut length in percent of the stock length cut
 * @param scrapPct       scrap (offcuts shorter than the minimum remnant) in percent
 * @param remnantPct     remnants (offcuts back on the rack) in percent
 * @param kitMassKg      mass of the kit's bars, spares cut included, and joints
 * @param boughtMassKg   mass of the mill stock bought
 * @param usedStockMassKg mass of all stock cut: mill stock bought and rack offcuts taken
 * @param co2eKg         embodied carbon of the stock bought (bought mass x the material's factor)
 * @param bundles        nested bundles
 * @param crates         crates
 * @param vehicles       vehicles or containers
 * @param tripCost       cost of the trips
 * @param crateCost      price of the crates
 * @param totalCost      stock cost + crate cost + trip cost, null when one of them is not known
 * @param status         the option's overall status: the worst of its stages
 * @param statusReason   which stages are not proven and by how much ("crates 12.5 % above the bound"), null when
 *                       every stage is OPTIMAL
 * @param stages         each stage's status and gap
 */
@JsonPropertyOrder({"kit", "marks", "bars", "members", "reuseRatio", "stockPieces", "stockLengthMm", "cost",
    "payableCost", "offcutPct", "scrapPct", "remnantPct", "kitMassKg", "boughtMassKg", "usedStockMassKg",
    "co2eKg", "bundles", "crates", "vehicles",
    "tripCost", "crateCost", "totalCost", "status", "statusReason", "stages"})
public record OptionSummary(String kit, int marks, int bars, Integer members, Double reuseRatio, int stockPieces,
                            double stockLengthMm, Double cost, Double payableCost, double offcutPct, double scrapPct,
                            double remnantPct,
                            Double kitMassKg, Double boughtMassKg, Double usedStockMassKg, Double co2eKg,
                            Integer bundles, Integer crates, Integer vehicles, Double tripCost, Double crateCost,
                            Double totalCost, Status status, String statusReason,
                            java.util.List<StageStatus> stages) {
    public OptionSummary {
        stages = stages == null ? java.util.List.of() : java.util.List.copyOf(stages);
        Objects.requireNonNull(kit, "kit");
        Objects.requireNonNull(status, "status");
        if (marks < 0 || bars < 0 || (members != null && members < 0) || stockPieces < 0) {
            throw new IllegalArgumentException("negative count in option " + kit);
        }
    }

    /** An option without crate cost, total or stages (fixtures of the figures before them). */
    public OptionSummary(String kit, int marks, int bars, Integer members, Double reuseRatio, int stockPieces,
                         double stockLengthMm, Double cost, Double payableCost, double offcutPct, double scrapPct,
                         double remnantPct, Double kitMassKg, Double boughtMassKg, Double usedStockMassKg,
                         Double co2eKg, Integer bundles, Integer crates, Integer vehicles, Double tripCost,
                         Status status) {
        this(kit, marks, bars, members, reuseRatio, stockPieces, stockLengthMm, cost, payableCost, offcutPct,
                scrapPct, remnantPct, kitMassKg, boughtMassKg, usedStockMassKg, co2eKg, bundles, crates, vehicles,
                tripCost, null, null, status, null, null);
    }

    /**
     * The summary of an option from its kit metrics, its shipping figures and its stages' statuses, rounded for
     * reading: ratio to 0.001, lengths to 0.1 mm, money to 0.01, percentages to 0.01, masses and CO2e to 0.1 kg.
     */
    public static OptionSummary of(String kit, KitMetrics metrics, Logistics logistics, Collection<Status> statuses) {
        return of(kit, metrics, logistics, statuses, java.util.List.of());
    }

    /** The same with each stage's status and gap; the reason names the stages that are not proven. */
    public static OptionSummary of(String kit, KitMetrics metrics, Logistics logistics, Collection<Status> statuses,
                                   java.util.List<StageStatus> stages) {
        Double total = metrics.cost() == null || logistics.crateCost() == null || logistics.tripCost() == null ? null
                : metrics.cost() + logistics.crateCost() + logistics.tripCost();
        java.util.List<String> reasons = stages.stream().map(StageStatus::reason).filter(Objects::nonNull).toList();
        return new OptionSummary(kit, metrics.marks(), metrics.bars(), metrics.members(),
                round(metrics.reuseRatio(), 3), metrics.stockPieces(), round(metrics.stockLengthMm(), 1),
                round(metrics.cost(), 2), round(metrics.payableCost(), 2), round(metrics.offcutPct(), 2),
                round(metrics.scrapPct(), 2),
                round(metrics.remnantPct(), 2), round(metrics.kitMassKg(), 1), round(metrics.boughtMassKg(), 1),
                round(metrics.usedStockMassKg(), 1), round(metrics.co2eKg(), 1), logistics.bundles(),
                logistics.crates(), logistics.vehicles(),
                round(logistics.tripCost(), 2), round(logistics.crateCost(), 2), round(total, 2), worst(statuses),
                reasons.isEmpty() ? null : String.join("; ", reasons), stages);
    }

    /** The worst of several statuses: INFEASIBLE before FEASIBLE before OPTIMAL; OPTIMAL for none. */
    public static Status worst(Collection<Status> statuses) {
        Status worst = Status.OPTIMAL;
        for (Status s : statuses) {
            if (s == Status.INFEASIBLE || (s == Status.FEASIBLE && worst == Status.OPTIMAL)) {
                worst = s;
            }
        }
        return worst;
    }

    /** Rounded half-even to the given decimals; null stays null, and so does a value that is not finite. */
    static Double round(Double value, int decimals) {
        if (value == null || !Double.isFinite(value)) {
            return null;
        }
        return round(value.doubleValue(), decimals);
    }

    private static double round(double value, int decimals) {
        return BigDecimal.valueOf(value).setScale(decimals, RoundingMode.HALF_EVEN).doubleValue();
    }
}
