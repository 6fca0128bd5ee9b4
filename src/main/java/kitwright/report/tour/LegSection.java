package kitwright.report.tour;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import kitwright.model.CrateType;
import kitwright.model.Status;
import kitwright.packing.Crate;
import kitwright.report.CrateContents;
import kitwright.report.LogisticsSection;
import kitwright.report.ReportSection;
import kitwright.report.ShopFormat;
import kitwright.tour.Leg;
import kitwright.tour.LegShipment;
import kitwright.tour.TourPlan;

/**
 * The report block of one leg ("leg-N"): what it carries, its costs against the proven bound and status, the
 * loading order of each vehicle (joints nearest the doors, off first), then, on the first leg of each shipment,
 * the packing lists, crate cross-sections, manifests and deck plans as the whole kit's block shows them
 * ({@link LogisticsSection}); a leg whose shipment an earlier leg already has points to it. A pure function.
 */
public final class LegSection {
    record Figure(String label, String value, String note) {
    }

    /** One crate of a vehicle in loading order; the trip and vehicle are shown on the vehicle's first row. */
    record Step(String trip, String vehicle, String type, String step, String crate, String crateType, String gross,
                String unloading) {
    }

    /**
     * @param legFiles  the leg's number: also read by the logistics template, whose file notes then name the leg
     *                  files
     * @param logistics the whole kit's block view for this leg's plans, or null when an earlier leg shows them
     */
    record View(String legFiles, String carries, String leaves, String assumption, String sameAs, String reason,
                List<Figure> figures, String status, String statusClass, boolean loaded, List<Step> steps,
                Object logistics) {
    }

    private LegSection() {
    }

    public static String id(Leg leg) {
        return "leg-" + leg.number();
    }

    public static ReportSection of(Leg leg, List<CrateType> catalog, Map<String, String> fillByMark) {
        LegShipment s = leg.shipment();
        boolean planned = s.status() != Status.INFEASIBLE;
        String carries = (leg.to().equals(TourPlan.DEPOT) ? "Brings " + leg.structure() + "'s parts back to the"
                + " depot: " : "Carries what " + leg.structure() + " needs: ") + ShopFormat.count(LegFigures.bars(s))
                + " bars (" + CrateContents.text(s.bars()) + ") in " + ShopFormat.count(LegFigures.bundles(s))
                + " bundles of their own, and " + ShopFormat.count(LegFigures.joints(s)) + " joints ("
                + CrateContents.text(LegFigures.jointMarks(s)) + ").";
        String leaves = "Not on this leg: parts " + leg.structure() + " does not use, the miscut allowance, surplus"
                + " bars and spares; where they travel is not planned here (the whole kit's move is the block"
                + " above).";
        String assumption = TourSection.assumption(leg);
        List<Figure> figures = new ArrayList<>();
        int crates = s.crates().crates().size();
        int trips = s.loads().vehicles().size();
        figures.add(new Figure("Crates and trips", TourSection.money(s.loads().totalCost()),
                "proven lower bound " + TourSection.money(s.loads().totalLowerBound())));
        figures.add(new Figure("Crate cost", TourSection.money(planned ? s.crateCost() : null),
                ShopFormat.count(crates) + (crates == 1 ? " crate, " : " crates, ")
                        + (planned ? ShopFormat.kg(LegFigures.grossKg(s)) : ShopFormat.UNKNOWN) + " kg gross"));
        figures.add(new Figure("Trip cost", TourSection.money(planned ? s.tripCost() : null),
                ShopFormat.count(trips) + (trips == 1 ? " trip" : " trips")));
        List<Step> steps = new ArrayList<>();
        if (planned) {
            Map<String, Crate> byId = new java.util.HashMap<>();
            s.crates().crates().forEach(c -> byId.put(c.id(), c));
            for (var v : s.loads().vehicles()) {
                int n = v.crates().size();
                for (int i = 0; i < n; i++) {
                    Crate c = byId.get(v.crates().get(i).ref());
                    steps.add(new Step(v.id(), i == 0 ? v.id() : "", i == 0 ? v.type() : "", String.valueOf(i + 1), c.id(),
                            c.type(), ShopFormat.kg(c.grossKg()), String.valueOf(n - i)));
                }
            }
        }
        boolean first = leg.sameAs() == leg.number();
        Object logistics = first && planned && s.nesting() != null
                ? LogisticsSection.of(s.crates(), s.loads(), s.nesting().plan().bundles(), catalog, fillByMark,
                        id(leg) + "-").view()
                : null;
        String sameAs = first ? null : "Same shipment as leg " + leg.sameAs() + ": its packing lists, crate"
                + " cross-sections, manifests and deck plans hold for this leg too.";
        View view = new View(String.valueOf(leg.number()), carries, leaves, assumption, sameAs,
                planned ? null : s.reason(), figures, TourSection.status(s), TourSection.statusClass(s),
                !steps.isEmpty(), steps, logistics);
        return new ReportSection(id(leg), LegFigures.title(leg), "leg", view);
    }
}
