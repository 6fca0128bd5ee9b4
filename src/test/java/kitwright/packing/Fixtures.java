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
