package kitwright.spares;

import java.util.List;
import java.util.Objects;

/**
 * What the service-life spares came to in a plan, without the cutting plan itself (the plan carries that): how many
 * spares each mark needs ({@link SparesPlan}), where the ones cut came from ({@link SparesSupply}: offcuts, bought,
 * missing) and what they added to the stock cost.
 *
 * @param sizing    the spares per mark and the kit's service level, as {@link ServiceLifeSpares} sized them
 * @param supply    per mark, in the kit's order (the same marks as {@code sizing})
 * @param extraCost stock cost of the plan with spares minus that of the plan without (null without prices)
 * @param rounds    how many times the demand was re-planned to buy spares (0 when the offcuts held them all)
 */
public record SparesOutcome(SparesPlan sizing, List<SparesSupply> supply, Double extraCost, int rounds) {
    public SparesOutcome {
        Objects.requireNonNull(sizing, "sizing");
        supply = List.copyOf(supply);
        if (supply.size() != sizing.marks().size()) {
            throw new IllegalArgumentException("supply must list the sized marks: " + sizing.marks().size()
                    + " marks, " + supply.size() + " supply lines");
        }
        if (rounds < 0) {
            throw new IllegalArgumentException("rounds must not be negative: " + rounds);
        }
    }

    /** The outcome of a spares cutting run sized by {@code sizing}. */
    public static SparesOutcome of(SparesPlan sizing, SparesCuttingResult cutting) {
        return new SparesOutcome(sizing, cutting.marks(), cutting.extraCost(), cutting.rounds());
    }

    /** Where the spares of a mark came from, or null when the mark is not in the kit. */
    public SparesSupply supply(String mark) {
        return supply.stream().filter(s -> s.mark().equals(mark)).findFirst().orElse(null);
    }

    /** Spares cut from offcuts of stock bought for the kit anyway, all marks. */
    public int fromOffcuts() {
        return supply.stream().mapToInt(SparesSupply::fromOffcuts).sum();
    }

    /** Spares bought (added to the demand), all marks. */
    public int bought() {
        return supply.stream().mapToInt(SparesSupply::bought).sum();
    }

    /** Spares that could not be cut at all (limited stock), all marks. */
    public int missing() {
        return supply.stream().mapToInt(SparesSupply::missing).sum();
    }
}
