package kitwright.packing;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.CrateType;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestedTube;

/** Small literal inputs for the crating and loading tests (invented values). */
public final class Fixtures {
    private Fixtures() {
    }

    /**
     * The slots of a layout that the shared validator's independent support rule finds unsupported (empty when all
     * stand), so that the packing tests do not check the packing code's support with its own {@code Support}.
     */
    static List<CrateItem> unsupported(List<CrateLayout.Slot> slots, List<ItemType> types, double innerWidthMm) {
        List<CrateItem> items = new ArrayList<>();
        for (int k = 0; k < slots.size(); k++) {
            CrateLayout.Slot s = slots.get(k);
            items.add(new CrateItem(types.get(s.itemType()).kind(), "S" + k, s.x(), s.y(), s.z(), s.length(),
                    s.width(), s.height(), 1));
        }
        return kitwright.validate.CratePlanValidator.unsupported(items, innerWidthMm);
    }

    /** A bundle that is one tube of the given mark, no guests. */
    public static Bundle bundle(String id, String mark, double lengthMm, double diameterMm, double massKg) {
        return new Bundle(id, lengthMm, diameterMm, massKg,
                new NestedTube(mark, diameterMm, diameterMm * 0.9, lengthMm, 0, 0, 0, List.of()));
    }

    /** n equal single-tube bundles B1..Bn of mark M. */
    public static List<Bundle> bundles(int n, double lengthMm, double diameterMm, double massKg) {
        List<Bundle> list = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            list.add(bundle("B" + i, "M", lengthMm, diameterMm, massKg));
        }
        return list;
    }

    /** A crate with 25 mm walls (outer = inner + 50 in each direction). */
    public static CrateType crate(String name, double innerL, double innerW, double innerH, double tare,
                                  double maxGross, Double price) {
        return new CrateType(name, innerL, innerW, innerH, innerL + 50, innerW + 50, innerH + 50, tare, maxGross,
                true, 2000, price);
    }
}
