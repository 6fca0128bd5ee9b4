package kitwright.nesting;

import java.util.ArrayList;
import java.util.List;
import kitwright.model.NestTolerance;
import kitwright.model.Section;

/** Literal sections and tubes for the nesting tests. Sizes are EN 10219-2 CHS sizes; lengths are invented. */
final class NestingFixtures {
    static final double STEEL = 7850; // kg/m3, EN 1993-1-1 3.2.6

    private NestingFixtures() {
    }

    static Section steel(double d, double t) {
        return new Section("CHS " + d + "x" + t, "steel", d, t, null, null, null);
    }

    /** Tubes of a section under a rule: count pieces of one mark and length. */
    static List<Tube> tubes(List<Tube> into, FitRule rule, String mark, Section section, double lengthMm, int count) {
        List<Tube> out = new ArrayList<>(into);
        TubeEnvelope e = rule.envelope(section);
        double mass = section.massPerMetreKg(STEEL) * lengthMm / 1000;
        for (int i = 0; i < count; i++) {
            out.add(new Tube(out.size(), mark, section.name(), e.outerDiameterMm(), e.boreMm(), lengthMm, mass));
        }
        return out;
    }

    /** A tube with given effective sizes (for geometry tests). */
    static Tube tube(int id, String mark, double outer, double bore, double length, double mass) {
        return new Tube(id, mark, "S" + outer, outer, bore, length, mass);
    }

    static FitRule worstCase() {
        return new FitRule(NestTolerance.WORST_CASE, 2.0);
    }

    static FitRule nominal() {
        return new FitRule(NestTolerance.NOMINAL, 2.0);
    }

    static NestingOptions quick() {
        return new NestingOptions(0.5, 10, 50, 100, 3000, 8, 2e7, 1e9);
    }
}
