package kitwright.cli;

import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Set;
import kitwright.model.Status;
import kitwright.report.tour.LegsCsv;
import kitwright.report.tour.TourSection;
import kitwright.tour.Leg;
import kitwright.tour.LegShipment;
import kitwright.tour.TourPlan;

/** The lines {@code plan} prints for a tour: one per leg, then the joints assumed where structures.csv names none. */
final class TourText {
    private TourText() {
    }

    static String format(TourPlan tour) {
        String nl = System.lineSeparator();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "Tour: %d legs, %d distinct shipment%s (%s):%n", tour.legs().size(),
                tour.distinctShipments(), tour.distinctShipments() == 1 ? "" : "s", LegsCsv.LEGS));
        Set<String> assumed = new LinkedHashSet<>();
        for (Leg leg : tour.legs()) {
            LegShipment s = leg.shipment();
            sb.append("  Leg ").append(leg.number()).append(' ').append(leg.from()).append(" -> ").append(leg.to())
                    .append(": ");
            if (s.status() == Status.INFEASIBLE) {
                sb.append("INFEASIBLE: ").append(s.reason()).append(nl);
                continue;
            }
            sb.append(s.crates().crates().size()).append(s.crates().crates().size() == 1 ? " crate, " : " crates, ")
                    .append(s.loads().vehicles().size()).append(s.loads().vehicles().size() == 1 ? " trip" : " trips");
            if (s.loads().totalCost() != null) {
                sb.append(String.format(Locale.ROOT, "; crates and trips %.2f, lower bound %.2f, gap %.1f %%",
                        s.loads().totalCost(), s.loads().totalLowerBound(), 100 * s.loads().totalGap()));
            }
            sb.append("; ").append(s.status());
            if (leg.sameAs() != leg.number()) {
                sb.append(" (as leg ").append(leg.sameAs()).append(')');
            }
            sb.append('.').append(nl);
            String assumption = TourSection.assumption(leg);
            if (assumption != null) {
                assumed.add(assumption);
            }
        }
        assumed.forEach(a -> sb.append("  Assumed: ").append(a).append('.').append(nl));
        return sb.toString();
    }
}
