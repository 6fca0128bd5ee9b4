package kitwright.report.tour;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import kitwright.tour.Leg;
import kitwright.tour.LegShipment;
import kitwright.tour.TourPlan;

/**
 * plan.json's {@code legs}: one object per leg, in tour order, with the keys {@code leg, from, to, structure,
 * status, crateCost, tripCost, totalCost, totalLowerBound, cratesLowerBound, tripsLowerBound, sameAsLeg,
 * jointsAssumed, bars, joints, bundles, crates, vehicles} and {@code reason} when the leg has no plan. The
 * {@code bundles} are records as in plan.json's {@code nesting}, the {@code crates} as in {@code crates.crates}
 * and the {@code vehicles} as in {@code loads.vehicles}, so that one reader (and one validator) takes both; their
 * ids start from 1 on each leg. Costs are null where the catalogs give no prices.
 */
public final class LegsJson {
    private LegsJson() {
    }

    public static List<Map<String, Object>> of(TourPlan tour) {
        List<Map<String, Object>> legs = new ArrayList<>();
        for (Leg leg : tour.legs()) {
            LegShipment s = leg.shipment();
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("leg", leg.number());
            o.put("from", leg.from());
            o.put("to", leg.to());
            o.put("structure", leg.structure());
            o.put("status", s.status());
            o.put("crateCost", s.crateCost());
            o.put("tripCost", s.reason() == null ? s.tripCost() : null);
            o.put("totalCost", s.loads().totalCost());
            o.put("totalLowerBound", s.loads().totalLowerBound());
            o.put("cratesLowerBound", s.crates().lowerBound());
            o.put("tripsLowerBound", s.loads().lowerBound());
            o.put("sameAsLeg", leg.sameAs());
            o.put("jointsAssumed", s.jointsAssumed());
            o.put("bars", s.bars());
            o.put("joints", LegFigures.jointMarks(s));
            o.put("bundles", s.nesting() == null ? List.of() : s.nesting().plan().bundles());
            o.put("crates", s.crates().crates());
            o.put("vehicles", s.loads().vehicles());
            if (s.reason() != null) {
                o.put("reason", s.reason());
            }
            legs.add(o);
        }
        return legs;
    }
}
