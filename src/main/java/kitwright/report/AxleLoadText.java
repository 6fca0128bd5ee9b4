package kitwright.report;

import kitwright.loading.VehicleLoad;

/**
 * How the report and the deck plan name a vehicle's balance: the lateral centre from the centreline and the support
 * loads against their limits ("kingpin" on a semi-trailer), or "axle loads not checked".
 */
final class AxleLoadText {
    private AxleLoadText() {
    }

    /** "kingpin 9 120 / 12 000 kg, rear axles 17 400 / 24 000 kg", or "axle loads not checked". */
    static String of(VehicleLoad v) {
        if (v.axleLoadsKg() == null || v.axles() == null) {
            return LogisticsCsv.NOT_CHECKED;
        }
        return LogisticsCsv.frontSupport(v) + " " + ShopFormat.kg(v.axleLoadsKg().front()) + " / "
                + ShopFormat.kg(v.axles().maxFrontKg()) + " kg, rear axles " + ShopFormat.kg(v.axleLoadsKg().rear())
                + " / " + ShopFormat.kg(v.axles().maxRearKg()) + " kg";
    }

    /** "+120 mm" towards growing y, "-80 mm", "0 mm". */
    static String lateral(VehicleLoad v) {
        long mm = Math.round(v.lateralCentreOfGravityMm());
        return (mm > 0 ? "+" : mm < 0 ? "\u2212" : "") + ShopFormat.mm(Math.abs(mm));
    }
}
