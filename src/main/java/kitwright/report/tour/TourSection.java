package kitwright.report.tour;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import kitwright.model.Status;
import kitwright.report.ReportSection;
import kitwright.report.ShopFormat;
import kitwright.tour.Leg;
import kitwright.tour.LegShipment;
import kitwright.tour.TourPlan;

/**
 * The report block for a tour ("tour"): what a leg carries and what it does not, one line per leg with its crates,
 * trips and costs against the proven bound, and the joints assumed for structures whose rows name none. The legs
 * themselves follow, one block each ({@link LegSection}). A pure function.
 */
public final class TourSection {
    public static final String ID = "tour";

    record Row(String leg, String route, String structure, String bars, String joints, String crates, String trips,
               String crateCost, String tripCost, String total, String bound, String status, String statusClass) {
    }

    record View(String stops, List<Row> legs, List<String> assumptions, String distinct) {
    }

    private TourSection() {
    }

    public static ReportSection of(TourPlan tour) {
        List<Row> rows = new ArrayList<>();
        List<String> assumptions = new ArrayList<>();
        for (Leg leg : tour.legs()) {
            LegShipment s = leg.shipment();
            boolean planned = s.status() != Status.INFEASIBLE;
            rows.add(new Row(String.valueOf(leg.number()), leg.route(), leg.structure(),
                    ShopFormat.count(LegFigures.bars(s)),
                    ShopFormat.count(LegFigures.joints(s)) + (s.jointsAssumed() ? " *" : ""),
                    planned ? ShopFormat.count(s.crates().crates().size()) : ShopFormat.UNKNOWN,
                    planned ? ShopFormat.count(s.loads().vehicles().size()) : ShopFormat.UNKNOWN,
                    money(planned ? s.crateCost() : null), money(planned ? s.tripCost() : null),
                    money(s.loads().totalCost()), money(s.loads().totalLowerBound()), status(s), statusClass(s)));
            String assumption = assumption(leg);
            if (assumption != null && !assumptions.contains(assumption)) {
                assumptions.add(assumption);
            }
        }
        String stops = String.join(" \u2192 ", tour.legs().stream().map(Leg::from).toList()) + " \u2192 "
                + TourPlan.DEPOT;
        String distinct = tour.distinctShipments() + " distinct shipment" + (tour.distinctShipments() == 1 ? "" : "s")
                + " for " + tour.legs().size() + " legs";
        return new ReportSection(ID, "Tour legs", "tour", new View(stops, rows, assumptions, distinct));
    }

    /** What the report and the plan command say of a structure whose rows name no joint, else null. */
    public static String assumption(Leg leg) {
        LegShipment s = leg.shipment();
        if (!s.jointsAssumed()) {
            return null;
        }
        return "structures.csv names no joint marks for " + leg.structure() + ", so its legs are assumed to carry"
                + " every joint of joints.csv (" + ShopFormat.count(LegFigures.joints(s)) + " joints)";
    }

    /** "optimal", "feasible, gap 1.2 %" (of the total against its bound) or "infeasible". */
    static String status(LegShipment s) {
        Double gap = LegFigures.gap(s);
        return switch (s.status()) {
            case OPTIMAL -> "optimal";
            case INFEASIBLE -> "infeasible";
            default -> s.status().name().toLowerCase(Locale.ROOT)
                    + (gap == null ? "" : ", gap " + ShopFormat.percent(gap) + " %");
        };
    }

    static String statusClass(LegShipment s) {
        return "status-" + s.status().name().toLowerCase(Locale.ROOT);
    }

    static String money(Double amount) {
        return amount == null ? ShopFormat.UNKNOWN : ShopFormat.money(amount);
    }
}
