package kitwright.report.tour;

import java.util.Map;
import kitwright.model.Joint;
import kitwright.packing.Crate;
import kitwright.tour.Leg;
import kitwright.tour.LegShipment;

/** The figures of one leg that its CSV row, JSON object and report section share. */
final class LegFigures {
    private LegFigures() {
    }

    /** Bars of the leg's structure by mark. */
    static int bars(LegShipment s) {
        return s.bars().values().stream().mapToInt(Integer::intValue).sum();
    }

    /** Joints shipped. */
    static int joints(LegShipment s) {
        return s.joints().stream().mapToInt(Joint::quantity).sum();
    }

    /** Joints shipped by mark, in joints.csv order. */
    static Map<String, Integer> jointMarks(LegShipment s) {
        Map<String, Integer> marks = new java.util.LinkedHashMap<>();
        s.joints().forEach(j -> marks.merge(j.mark(), j.quantity(), Integer::sum));
        return marks;
    }

    /** Bundles of the leg's bars (0 when they could not be nested). */
    static int bundles(LegShipment s) {
        return s.nesting() == null ? 0 : s.nesting().plan().bundles().size();
    }

    /** Gross mass of the leg's crates, kg. */
    static double grossKg(LegShipment s) {
        return s.crates().crates().stream().mapToDouble(Crate::grossKg).sum();
    }

    /** (total - bound) / total, or null without a total. */
    static Double gap(LegShipment s) {
        return s.loads().totalCost() == null ? null : s.loads().totalGap();
    }

    /** "Leg 2: screen-frame → ticket-canopy". */
    static String title(Leg leg) {
        return "Leg " + leg.number() + ": " + leg.route();
    }
}
