package kitwright.cutting;

import java.util.List;
import kitwright.model.Origin;

/**
 * A saw pattern: how one stock piece is cut, and how many stock pieces are cut this way. Cuts are listed in saw
 * order from the first trim line.
 *
 * @param offcutMm   stockLength - 2*trim - sum(lengths) - pieces*kerf, floored at 0
 * @param offcutKind "remnant" when offcutMm >= minRemnant, else "scrap"
 */
public record CutPattern(double stockLengthMm, Origin origin, int count, List<Cut> cuts, double offcutMm,
                         String offcutKind) {
    public CutPattern {
        cuts = List.copyOf(cuts);
    }
}
