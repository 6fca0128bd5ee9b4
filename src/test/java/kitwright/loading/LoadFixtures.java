package kitwright.loading;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.CrateType;
import kitwright.model.VehicleType;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;
import kitwright.model.Status;

/**
 * Vehicles with the sizes of src/docs/sources.md (invented costs) and crate plans made directly, for the loading
 * tests.
 */
public final class LoadFixtures {
    private LoadFixtures() {
    }

    /** Semi-trailer, about 13.6 x 2.48 x 2.7 m inside and 24 t payload (common practice). */
    public static final VehicleType SEMI = new VehicleType("semi-trailer", 13600, 2480, 2700, 24000, 1000,
            "common practice (src/docs/sources.md)");
    /** 7.5 t box truck, about 6.2 x 2.45 x 2.4 m and 2.8 t payload (common practice). */
    public static final VehicleType BOX_TRUCK = new VehicleType("7.5 t box truck", 6200, 2450, 2400, 2800, 400,
            "common practice (src/docs/sources.md)");
    /** ISO 668 1CC (20 ft): inside about 5898 x 2352 x 2393, payload about 28.2 t (common practice). */
    public static final VehicleType CONTAINER_20 = new VehicleType("20 ft container", 5898, 2352, 2393, 28200, 900,
            "ISO 668 1CC; inside sizes common practice");
    /** ISO 668 1AA (40 ft): inside about 12032 x 2352 x 2393, payload about 26.7 t (common practice). */
    public static final VehicleType CONTAINER_40 = new VehicleType("40 ft container", 12032, 2352, 2393, 26700,
            1400, "ISO 668 1AA; inside sizes common practice");

    public static final List<VehicleType> FLEET = List.of(SEMI, BOX_TRUCK, CONTAINER_20, CONTAINER_40);

    public static CrateType crateType(String name, double l, double w, double h, boolean stackable, double topLoad) {
        return new CrateType(name, l - 50, w - 50, h - 50, l, w, h, 40, 5000, stackable, topLoad, 100.0);
    }

    /** A crate plan of n crates of one type, each with the given gross mass (contents not modelled). */
    public static CratePlan plan(CrateType type, int n, double grossKg) {
        List<Crate> crates = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            crates.add(new Crate("C" + i, type.name(), type.innerLengthMm(), type.innerWidthMm(),
                    type.innerHeightMm(), type.outerLengthMm(), type.outerWidthMm(), type.outerHeightMm(),
                    type.tareKg(), type.maxGrossKg(), grossKg, List.of()));
        }
        return new CratePlan(Status.FEASIBLE, 1, crates, List.of(), null, null);
    }

    /** Two crate plans joined (crate ids continue). */
    public static CratePlan join(CratePlan a, CratePlan b) {
        List<Crate> crates = new ArrayList<>(a.crates());
        for (Crate c : b.crates()) {
            crates.add(new Crate("C" + (crates.size() + 1), c.type(), c.innerLengthMm(), c.innerWidthMm(),
                    c.innerHeightMm(), c.outerLengthMm(), c.outerWidthMm(), c.outerHeightMm(), c.tareKg(),
                    c.maxGrossKg(), c.grossKg(), List.of()));
        }
        return new CratePlan(Status.FEASIBLE, 1, crates, List.of(), null, null);
    }
}
