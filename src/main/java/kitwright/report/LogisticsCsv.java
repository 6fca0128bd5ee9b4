package kitwright.report;

import java.io.IOException;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import kitwright.loading.LoadPlan;
import kitwright.loading.PlacedCrate;
import kitwright.loading.VehicleLoad;
import kitwright.nesting.Bundle;
import kitwright.packing.Crate;
import kitwright.packing.CratePlan;
import kitwright.packing.ItemKind;
import kitwright.packing.JointBoxLoad;
import org.apache.commons.csv.CSVPrinter;

/**
 * The logistics sheets as CSV (laid out by {@link CsvFile}; numbers with a point and no grouping so a spreadsheet
 * reads them as numbers):
 * <ul>
 *   <li>{@code packing-lists.csv}, one row per crate: {@code crate,type,marks,bundles,bundle_ids,boxes,box_ids,
 *   gross_kg,max_gross_kg} (marks as "A1 x 12; N90 x 40", tubes of the bundles and joints of the boxes; ids in
 *   number order, BDL-2 before BDL-10);</li>
 *   <li>{@code manifests.csv}, one row per vehicle: {@code vehicle,type,crates,crate_ids,mass_kg,payload_kg,
 *   floor_length_mm,deck_length_mm,centre_of_gravity_mm,cost_per_trip,lateral_centre_of_gravity_mm,front_load_kg,
 *   max_front_kg,rear_load_kg,max_rear_kg,front_support} (floor length from the front of the deck to the rear face
 *   of the last crate; centre of gravity from the front; lateral centre signed from the centreline, positive towards
 *   growing y; front support "kingpin" on a semi-trailer, "front axle" on a rigid truck, "axle loads not checked"
 *   with the axle columns blank when the catalog gives no geometry);</li>
 *   <li>{@code load-lists.csv}, one row per crate per vehicle: {@code vehicle,loading_step,unloading_step,crate,
 *   outer_length_mm,outer_width_mm,outer_height_mm,gross_kg} (steps from 1 on each vehicle; unloading runs from the
 *   doors, the reverse of loading).</li>
 * </ul>
 * Pure functions returning the file's text.
 */
public final class LogisticsCsv {
    public static final String PACKING_LISTS = "packing-lists.csv";
    public static final String MANIFESTS = "manifests.csv";
    public static final String LOAD_LISTS = "load-lists.csv";
    /** What the manifest says of a vehicle without axle geometry. */
    public static final String NOT_CHECKED = "axle loads not checked";

    private LogisticsCsv() {
    }

    /** The columns of {@code packing-lists.csv}. */
    public static final List<String> PACKING_LIST_COLUMNS = List.of("crate", "type", "marks", "bundles", "bundle_ids",
            "boxes", "box_ids", "gross_kg", "max_gross_kg");

    public static String packingLists(CratePlan plan, Iterable<Bundle> bundles) {
        return CsvFile.text(PACKING_LIST_COLUMNS, packingListRows(plan, bundles));
    }

    /** The rows of {@link #packingLists}, cells as text, under {@link #PACKING_LIST_COLUMNS}. */
    public static List<List<String>> packingListRows(CratePlan plan, Iterable<Bundle> bundles) {
        Map<String, Bundle> byId = new java.util.HashMap<>();
        bundles.forEach(b -> byId.put(b.id(), b));
        Map<String, JointBoxLoad> boxes = plan.boxes().stream()
                .collect(Collectors.toMap(JointBoxLoad::id, Function.identity()));
        List<List<String>> rows = new java.util.ArrayList<>();
        for (Crate c : plan.crates()) {
            rows.add(List.of(c.id(), c.type(), CrateContents.plainText(CrateContents.marks(c, byId, boxes)),
                    String.valueOf(c.items(ItemKind.BUNDLE).size()), CrateContents.refs(c, ItemKind.BUNDLE),
                    String.valueOf(c.items(ItemKind.BOX).size()), CrateContents.refs(c, ItemKind.BOX),
                    number(c.grossKg(), 1), number(c.maxGrossKg(), 1)));
        }
        return rows;
    }

    public static String manifests(LoadPlan plan) {
        StringWriter out = new StringWriter();
        try (CSVPrinter csv = CsvFile.printer(out, List.of("vehicle", "type", "crates", "crate_ids", "mass_kg",
                "payload_kg", "floor_length_mm", "deck_length_mm", "centre_of_gravity_mm", "cost_per_trip",
                "lateral_centre_of_gravity_mm", "front_load_kg", "max_front_kg", "rear_load_kg", "max_rear_kg",
                "front_support"))) {
            for (VehicleLoad v : plan.vehicles()) {
                boolean checked = v.axleLoadsKg() != null && v.axles() != null;
                csv.printRecord(SpreadsheetCell.row(v.id(), v.type(), v.crates().size(),
                        CrateContents.ids(v.crates().stream().map(PlacedCrate::ref).toList(), " "),
                        number(v.massKg(), 1), number(v.payloadKg(), 1), number(v.floorLengthMm(), 0),
                        number(v.deckLengthMm(), 0), number(v.centreOfGravityMm(), 0), number(v.costPerTrip(), 2),
                        number(v.lateralCentreOfGravityMm(), 0),
                        checked ? number(v.axleLoadsKg().front(), 0) : "",
                        checked ? number(v.axles().maxFrontKg(), 0) : "",
                        checked ? number(v.axleLoadsKg().rear(), 0) : "",
                        checked ? number(v.axles().maxRearKg(), 0) : "",
                        checked ? frontSupport(v) : NOT_CHECKED));
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out.toString();
    }

    /** "kingpin" on a semi-trailer (front support on the deck), else "front axle". */
    public static String frontSupport(VehicleLoad v) {
        return v.axles() != null && v.axles().kingpin() ? "kingpin" : "front axle";
    }

    /** The columns of {@code load-lists.csv}. */
    public static final List<String> LOAD_LIST_COLUMNS = List.of("vehicle", "loading_step", "unloading_step", "crate",
            "outer_length_mm", "outer_width_mm", "outer_height_mm", "gross_kg");

    /** One row per crate per vehicle, in loading order. */
    public static String loadLists(LoadPlan plan, CratePlan crates) {
        return CsvFile.text(LOAD_LIST_COLUMNS, loadListRows(plan, crates));
    }

    /** The rows of {@link #loadLists}, cells as text, under {@link #LOAD_LIST_COLUMNS}. */
    public static List<List<String>> loadListRows(LoadPlan plan, CratePlan crates) {
        Map<String, Crate> byId = crates.crates().stream().collect(Collectors.toMap(Crate::id, Function.identity()));
        List<List<String>> rows = new java.util.ArrayList<>();
        for (VehicleLoad v : plan.vehicles()) {
            int n = v.crates().size();
            for (int i = 0; i < n; i++) {
                Crate c = byId.get(v.crates().get(i).ref());
                rows.add(List.of(v.id(), String.valueOf(i + 1), String.valueOf(n - i), c.id(),
                        number(c.outerLengthMm(), 0), number(c.outerWidthMm(), 0), number(c.outerHeightMm(), 0),
                        number(c.grossKg(), 1)));
            }
        }
        return rows;
    }

    /** Plain decimal, rounded half up to {@code places}, without trailing zeros: 1234.50 gives "1234.5". */
    public static String number(double value, int places) {
        BigDecimal d = BigDecimal.valueOf(value).setScale(places, RoundingMode.HALF_UP).stripTrailingZeros();
        if (d.signum() == 0) {
            return "0";
        }
        return d.scale() < 0 ? d.setScale(0).toPlainString() : d.toPlainString();
    }
}
