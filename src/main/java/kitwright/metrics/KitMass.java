package kitwright.metrics;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.Spare;
import kitwright.model.Bar;
import kitwright.model.Joint;
import kitwright.model.Kit;

/**
 * The one definition of the kit mass that every output gives (check, summary.json, plan.json, the report and
 * compare): every bar the kit holds at its cut length, the bars of bars.csv, their miscut allowance and the spares
 * cut beyond them, plus the joints. It is the mass the bundles carry plus the joint boxes' joints, so a crate list
 * and the kit mass agree.
 *
 * @param bars        bars of bars.csv (their quantities, surplus included)
 * @param spares      spare bars made beyond bars.csv and the allowance (service-life spares, or spares cut from
 *                    offcuts)
 * @param barsMassKg  mass of all those bars, the allowance included (length x mass per metre, EN 10219-2 formula),
 *                    null when a section's material is unknown
 * @param joints      joint pieces
 * @param jointsMassKg mass of the joints
 * @param allowance   miscut allowance pieces ({@link Kit#allowance}), cut beyond bars.csv and shipped with the kit
 */
public record KitMass(int bars, int spares, Double barsMassKg, int joints, double jointsMassKg, int allowance) {

    /** Bars and joints, or null when the bars' mass is unknown. */
    public Double totalKg() {
        return barsMassKg == null ? null : barsMassKg + jointsMassKg;
    }

    /**
     * The mass of a kit holding its miscut allowance and {@code spares} more bars per mark than bars.csv.
     *
     * @param spares spare bars per mark beyond bars.csv and the allowance; marks not named have none
     */
    public static KitMass of(Kit kit, Map<String, Integer> spares) {
        int bars = 0;
        int allowance = 0;
        int spareBars = 0;
        double mass = 0;
        boolean known = true;
        for (Bar bar : kit.bars()) {
            int extra = spares.getOrDefault(bar.mark(), 0);
            int allowed = kit.allowance(bar);
            bars += bar.quantity();
            allowance += allowed;
            spareBars += extra;
            Optional<Double> one = kit.barMassKg(bar);
            known &= one.isPresent();
            mass += one.orElse(0.0) * (bar.quantity() + allowed + extra);
        }
        int joints = kit.joints().stream().mapToInt(Joint::quantity).sum();
        double jointsMass = kit.joints().stream().mapToDouble(j -> j.massKg() * j.quantity()).sum();
        return new KitMass(bars, spareBars, known ? mass : null, joints, jointsMass, allowance);
    }

    /** The mass of the kit as a cutting plan makes it: bars.csv, the allowance and the spares the plan cuts. */
    public static KitMass of(Kit kit, CutPlan plan) {
        return of(kit, sparesCut(plan));
    }

    /** Spare bars a cutting plan cuts beyond the demand (quantity and allowance), per mark. */
    public static Map<String, Integer> sparesCut(CutPlan plan) {
        Map<String, Integer> spares = new LinkedHashMap<>();
        for (SectionCutPlan section : plan.sections()) {
            for (Spare spare : section.spares()) {
                spares.merge(spare.mark(), spare.count(), Integer::sum);
            }
        }
        return spares;
    }
}
