package kitwright.report.tour;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import kitwright.loading.VehicleLoad;
import kitwright.model.Status;
import kitwright.report.CrateContents;
import kitwright.report.CsvFile;
import kitwright.report.LogisticsCsv;
import kitwright.tour.Leg;
import kitwright.tour.LegShipment;
import kitwright.tour.TourPlan;

/**
 * The tour's sheets as CSV, laid out by {@link CsvFile}, numbers as {@link LogisticsCsv} writes them:
 * <ul>
 *   <li>{@code legs.csv}, one row per leg: {@code leg,from,to,structure,bars,bar_marks,joints,joint_marks,
 *   joints_assumed,bundles,crates,joint_boxes,trips,vehicle_types,gross_kg,crate_cost,trip_cost,total_cost,
 *   total_lower_bound,gap_percent,status,same_as_leg} (marks as "A1 x 56; B1 x 32"; joints_assumed "yes" when the
 *   structure's rows in structures.csv name no joint mark and every joint of the kit is shipped; costs blank when
 *   the catalogs give no prices or the leg has no plan; same_as_leg the first leg with the same shipment);</li>
 *   <li>{@code leg-packing-lists.csv}: {@code leg} and the columns of {@code packing-lists.csv}, every leg's
 *   crates;</li>
 *   <li>{@code leg-load-lists.csv}: {@code leg} and the columns of {@code load-lists.csv}, every leg's vehicles in
 *   loading order.</li>
 * </ul>
 * Crate and trip ids start from 1 on each leg: a leg's rows are read with its leg number.
 */
public final class LegsCsv {
    public static final String LEGS = "legs.csv";
    public static final String PACKING_LISTS = "leg-packing-lists.csv";
    public static final String LOAD_LISTS = "leg-load-lists.csv";
    public static final List<String> LEG_COLUMNS = List.of("leg", "from", "to", "structure", "bars", "bar_marks",
            "joints", "joint_marks", "joints_assumed", "bundles", "crates", "joint_boxes", "trips", "vehicle_types",
            "gross_kg", "crate_cost", "trip_cost", "total_cost", "total_lower_bound", "gap_percent", "status",
            "same_as_leg");

    private LegsCsv() {
    }

    /** The three files by name, in this order: legs, packing lists, load lists. */
    public static Map<String, String> files(TourPlan tour) {
        Map<String, String> files = new java.util.LinkedHashMap<>();
        files.put(LEGS, legs(tour));
        files.put(PACKING_LISTS, packingLists(tour));
        files.put(LOAD_LISTS, loadLists(tour));
        return files;
    }

    public static String legs(TourPlan tour) {
        List<List<String>> rows = new ArrayList<>();
        for (Leg leg : tour.legs()) {
            LegShipment s = leg.shipment();
            boolean planned = s.status() != Status.INFEASIBLE;
            Double gap = LegFigures.gap(s);
            rows.add(List.of(String.valueOf(leg.number()), leg.from(), leg.to(), leg.structure(),
                    String.valueOf(LegFigures.bars(s)), CrateContents.plainText(s.bars()),
                    String.valueOf(LegFigures.joints(s)), CrateContents.plainText(LegFigures.jointMarks(s)),
                    s.jointsAssumed() ? "yes" : "no", String.valueOf(LegFigures.bundles(s)),
                    String.valueOf(s.crates().crates().size()), String.valueOf(s.crates().boxes().size()),
                    String.valueOf(s.loads().vehicles().size()), vehicleTypes(s.loads().vehicles()),
                    LogisticsCsv.number(LegFigures.grossKg(s), 1), money(planned ? s.crateCost() : null),
                    money(planned ? s.tripCost() : null), money(s.loads().totalCost()),
                    money(s.loads().totalLowerBound()),
                    gap == null ? "" : LogisticsCsv.number(100 * gap, 2), s.status().name(),
                    String.valueOf(leg.sameAs())));
        }
        return CsvFile.text(LEG_COLUMNS, rows);
    }

    public static String packingLists(TourPlan tour) {
        List<List<String>> rows = new ArrayList<>();
        for (Leg leg : tour.legs()) {
            LegShipment s = leg.shipment();
            if (s.nesting() != null && s.crates().status() != Status.INFEASIBLE) {
                LogisticsCsv.packingListRows(s.crates(), s.nesting().plan().bundles())
                        .forEach(r -> rows.add(withLeg(leg, r)));
            }
        }
        return CsvFile.text(withLeg(LogisticsCsv.PACKING_LIST_COLUMNS), rows);
    }

    public static String loadLists(TourPlan tour) {
        List<List<String>> rows = new ArrayList<>();
        for (Leg leg : tour.legs()) {
            LegShipment s = leg.shipment();
            if (s.loads().status() != Status.INFEASIBLE) {
                LogisticsCsv.loadListRows(s.loads(), s.crates()).forEach(r -> rows.add(withLeg(leg, r)));
            }
        }
        return CsvFile.text(withLeg(LogisticsCsv.LOAD_LIST_COLUMNS), rows);
    }

    /** The vehicle types of a leg's trips with their counts, "box-truck-7.5t x 2". */
    static String vehicleTypes(List<VehicleLoad> vehicles) {
        Map<String, Integer> types = new TreeMap<>();
        vehicles.forEach(v -> types.merge(v.type(), 1, Integer::sum));
        return CrateContents.plainText(types);
    }

    private static List<String> withLeg(Leg leg, List<String> row) {
        List<String> out = new ArrayList<>(row.size() + 1);
        out.add(String.valueOf(leg.number()));
        out.addAll(row);
        return out;
    }

    private static List<String> withLeg(List<String> columns) {
        List<String> out = new ArrayList<>(columns.size() + 1);
        out.add("leg");
        out.addAll(columns);
        return out;
    }

    private static String money(Double amount) {
        return amount == null ? "" : LogisticsCsv.number(amount, 2);
    }
}
