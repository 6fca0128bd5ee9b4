package kitwright.packing;

import java.util.List;
import kitwright.nesting.Bundle;

/**
 * What every crate plan of a set of bundles and joint boxes must hold, for bounds outside the crating stage: the
 * items grouped by kind, length, solid volume and mass.
 *
 * @param items one entry per group of identical items
 */
public record CratingDemand(List<Item> items) {

    /**
     * Identical items.
     *
     * @param bundle        a bundle (it lies lengthwise, so it needs a crate at least as long inside); else a box
     * @param lengthMm      a bundle's length (0 for a box, which may turn)
     * @param solidVolumeMm3 volume any packing must give one item: a bundle's cylinder, a box's box
     * @param count         how many
     */
    public record Item(boolean bundle, double lengthMm, double solidVolumeMm3, double massKg, int count) {
    }

    public CratingDemand {
        items = List.copyOf(items);
    }

    /** The demand of the given bundles and filled joint boxes. */
    public static CratingDemand of(List<Bundle> bundles, List<JointBoxLoad> boxes) {
        return new CratingDemand(ItemTypes.of(bundles, boxes).types().stream()
                .map(t -> new Item(t.kind() == ItemKind.BUNDLE, t.kind() == ItemKind.BUNDLE ? t.lengthMm() : 0,
                        t.solidVolume(), t.massKg(), t.demand()))
                .toList());
    }

    public double massKg() {
        return items.stream().mapToDouble(i -> i.massKg() * i.count()).sum();
    }

    public boolean isEmpty() {
        return items.isEmpty();
    }
}
