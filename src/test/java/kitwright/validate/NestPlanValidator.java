package kitwright.validate;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.SectionCutPlan;
import kitwright.model.Kit;
import kitwright.model.NestTolerance;
import kitwright.model.Section;
import kitwright.model.Status;
import kitwright.nesting.Bundle;
import kitwright.nesting.NestPlan;
import kitwright.nesting.NestedTube;

/**
 * Re-checks a nesting plan from first principles, without the nesting code: every cut piece appears exactly once
 * with the sizes the fit rule gives (recomputed here from EN 10219-2, see src/docs/sources.md); every guest's circle
 * lies inside its host's bore less the clearance (so outside + clearance &lt;= bore); no two guests of one host
 * overlap where their length ranges overlap; every guest lies within its host's length less the end allowances;
 * each bundle's length, envelope and mass add up; the mass limit holds; the bound and status agree. Throws an
 * AssertionError listing every problem found.
 */
public final class NestPlanValidator {
    private static final double EPS = 1e-6;

    /** One expected piece: what the plan must contain once. */
    public record Piece(String mark, double outerDiameterMm, double boreMm, double lengthMm, double massKg) {
    }

    private NestPlanValidator() {
    }

    /** Validates a plan made for a kit and its cutting plan. */
    public static void validate(Kit kit, CutPlan cutPlan, NestPlan plan) {
        var s = kit.settings();
        List<Piece> pieces = new ArrayList<>();
        for (SectionCutPlan sp : cutPlan.sections()) {
            Section section = kit.catalog().section(sp.section()).orElseThrow();
            double[] sizes = sizes(section, s.nestTolerance());
            double perMetre = kit.material(section)
                    .map(m -> Math.PI * (section.outerDiameterMm() - section.wallMm()) * section.wallMm()
                            * m.densityKgM3() * 1e-6)
                    .orElse(0.0);
            for (CutPattern p : sp.patterns()) {
                for (int i = 0; i < p.count(); i++) {
                    for (Cut c : p.cuts()) {
                        pieces.add(new Piece(c.mark(), sizes[0], sizes[1], c.lengthMm(), perMetre * c.lengthMm() / 1000));
                    }
                }
            }
        }
        if (plan.tolerance() != s.nestTolerance()) {
            throw new AssertionError("plan uses " + plan.tolerance() + ", kit asks " + s.nestTolerance());
        }
        validate(pieces, s.nestClearanceMm(), s.nestEndAllowanceMm(), s.maxBundleMassKg(), plan);
    }

    /** Outside diameter and bore by the rule: EN 10219-2 worst case for steel, catalog tolerances otherwise. */
    public static double[] sizes(Section section, NestTolerance tolerance) {
        double d = section.outerDiameterMm();
        double t = section.wallMm();
        if (tolerance == NestTolerance.NOMINAL) {
            return new double[] {d, d - 2 * t};
        }
        String m = section.material().toLowerCase(Locale.ROOT);
        boolean steel = !m.contains("stainless") && (m.contains("steel") || m.matches("s\\d{3}.*"));
        double od;
        double wall;
        double bead;
        if (steel) {
            od = Math.min(10, Math.max(0.5, d / 100));
            wall = d > 406.4 ? Math.min(2, t / 10) : t <= 5 ? t / 10 : 0.5;
            bead = section.weldBeadMm() == null ? 1.0 : section.weldBeadMm();
        } else {
            od = section.odToleranceMm() == null ? 0 : section.odToleranceMm();
            wall = section.wallTolerancePct() == null ? 0 : t * section.wallTolerancePct() / 100;
            bead = section.weldBeadMm() == null ? 0 : section.weldBeadMm();
        }
        return new double[] {d + od, d - od - 2 * (t + wall) - bead};
    }

    /** Validates a plan made for literal tubes (the sizes they carry are the rule's). */
    public static void validate(kitwright.nesting.NestingProblem problem, NestPlan plan) {
        List<Piece> pieces = problem.tubes().stream()
                .map(t -> new Piece(t.mark(), t.outerDiameterMm(), t.boreMm(), t.lengthMm(), t.massKg())).toList();
        validate(pieces, problem.clearanceMm(), problem.endAllowanceMm(), problem.maxBundleMassKg(), plan);
    }

    /** Validates a plan against the pieces it must hold and the rules it must keep. */
    public static void validate(List<Piece> pieces, double clearanceMm, double endAllowanceMm, Double maxMassKg,
                                NestPlan plan) {
        List<String> problems = new ArrayList<>();
        if (Math.abs(plan.clearanceMm() - clearanceMm) > EPS) {
            problems.add("clearance " + plan.clearanceMm() + " but the rule says " + clearanceMm);
        }
        Map<String, List<Piece>> expected = new HashMap<>();
        for (Piece p : pieces) {
            expected.computeIfAbsent(key(p.mark(), p.lengthMm()), k -> new ArrayList<>()).add(p);
        }
        java.util.Set<String> ids = new java.util.HashSet<>();
        boolean singleTooHeavy = false;
        for (Bundle b : plan.bundles()) {
            if (!ids.add(b.id())) {
                problems.add("bundle id " + b.id() + " twice");
            }
            NestedTube h = b.host();
            if (h.centerXMm() != 0 || h.centerYMm() != 0 || h.offsetMm() != 0) {
                problems.add(b.id() + ": host centre and offset must be 0");
            }
            if (Math.abs(b.lengthMm() - h.lengthMm()) > EPS || Math.abs(b.envelopeDiameterMm() - h.outerDiameterMm()) > EPS) {
                problems.add(b.id() + ": length/envelope differ from the host's");
            }
            double[] mass = {0};
            int[] count = {0};
            walk(b.id(), h, clearanceMm, endAllowanceMm, expected, mass, count, problems);
            if (Math.abs(mass[0] - b.massKg()) > 1e-6 * Math.max(1, mass[0])) {
                problems.add(b.id() + ": mass " + b.massKg() + " but its tubes weigh " + mass[0]);
            }
            if (maxMassKg != null && b.massKg() > maxMassKg + 1e-9) {
                if (count[0] == 1) {
                    singleTooHeavy = true;
                } else {
                    problems.add(b.id() + ": " + b.massKg() + " kg above the limit " + maxMassKg);
                }
            }
        }
        expected.forEach((k, left) -> {
            if (!left.isEmpty()) {
                problems.add(left.size() + " piece(s) " + k + " missing from the plan");
            }
        });
        int bundles = plan.bundles().size();
        if (plan.lowerBound() > bundles + EPS) {
            problems.add("lower bound " + plan.lowerBound() + " above the " + bundles + " bundles");
        }
        if (plan.status() == Status.OPTIMAL && bundles != (int) Math.ceil(plan.lowerBound() - EPS)) {
            problems.add("OPTIMAL with " + bundles + " bundles but bound " + plan.lowerBound());
        }
        if (singleTooHeavy != (plan.status() == Status.INFEASIBLE)) {
            problems.add("status " + plan.status() + " but single bar above the mass limit: " + singleTooHeavy);
        }
        if (!problems.isEmpty()) {
            throw new AssertionError("nest plan invalid:\n  " + String.join("\n  ", problems));
        }
    }

    private static void walk(String bundle, NestedTube t, double clearance, double allowance,
                             Map<String, List<Piece>> expected, double[] mass, int[] count, List<String> problems) {
        count[0]++;
        List<Piece> left = expected.get(key(t.mark(), t.lengthMm()));
        Piece match = null;
        if (left != null) {
            for (Piece p : left) {
                if (Math.abs(p.outerDiameterMm() - t.outerDiameterMm()) <= 1e-3 && Math.abs(p.boreMm() - t.boreMm()) <= 1e-3) {
                    match = p;
                    break;
                }
            }
        }
        if (match == null) {
            problems.add(bundle + ": " + t.mark() + " " + t.lengthMm() + " mm (" + t.outerDiameterMm() + "/"
                    + t.boreMm() + ") is not an expected piece, or appears too often");
        } else {
            left.remove(match);
            mass[0] += match.massKg();
        }
        double room = (t.boreMm() - clearance) / 2;
        List<NestedTube> g = t.guests();
        for (int i = 0; i < g.size(); i++) {
            NestedTube a = g.get(i);
            String where = bundle + ": " + a.mark() + " in " + t.mark();
            if (a.outerDiameterMm() + clearance > t.boreMm() + EPS) {
                problems.add(where + ": outside + clearance above the bore");
            }
            if (Math.hypot(a.centerXMm(), a.centerYMm()) + a.outerDiameterMm() / 2 > room + EPS) {
                problems.add(where + ": circle leaves the bore less clearance");
            }
            if (a.offsetMm() < allowance - EPS || a.offsetMm() + a.lengthMm() > t.lengthMm() - allowance + EPS) {
                problems.add(where + ": from " + a.offsetMm() + " to " + (a.offsetMm() + a.lengthMm())
                        + " mm, outside the host's length less end allowances");
            }
            for (int j = i + 1; j < g.size(); j++) {
                NestedTube b = g.get(j);
                boolean alongOverlap = a.offsetMm() < b.offsetMm() + b.lengthMm() - EPS
                        && b.offsetMm() < a.offsetMm() + a.lengthMm() - EPS;
                double apart = Math.hypot(a.centerXMm() - b.centerXMm(), a.centerYMm() - b.centerYMm());
                if (alongOverlap && apart < (a.outerDiameterMm() + b.outerDiameterMm()) / 2 - EPS) {
                    problems.add(where + ": overlaps " + b.mark());
                }
            }
            walk(bundle, a, clearance, allowance, expected, mass, count, problems);
        }
    }

    private static String key(String mark, double lengthMm) {
        return mark + "@" + String.format(Locale.ROOT, "%.3f", lengthMm);
    }
}
