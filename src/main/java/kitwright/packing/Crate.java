package kitwright.packing;

import java.util.List;
import kitwright.model.CrateType;

/**
 * One packed crate: its type's dimensions and limits, its gross mass (tare plus contents) and what lies in it.
 *
 * @param grossKg tare plus the mass of every item
 */
public record Crate(String id, String type, double innerLengthMm, double innerWidthMm, double innerHeightMm,
                    double outerLengthMm, double outerWidthMm, double outerHeightMm, double tareKg,
                    double maxGrossKg, double grossKg, List<CrateItem> items) {
    public Crate {
        items = List.copyOf(items);
    }

    /** A crate of the given type holding the items; the gross mass is computed. */
    public static Crate of(String id, CrateType type, List<CrateItem> items) {
        double gross = type.tareKg() + items.stream().mapToDouble(CrateItem::massKg).sum();
        return new Crate(id, type.name(), type.innerLengthMm(), type.innerWidthMm(), type.innerHeightMm(),
                type.outerLengthMm(), type.outerWidthMm(), type.outerHeightMm(), type.tareKg(), type.maxGrossKg(),
                gross, items);
    }

    /** Items of one kind, in crate order. */
    public List<CrateItem> items(ItemKind kind) {
        return items.stream().filter(i -> i.kind() == kind).toList();
    }
}
