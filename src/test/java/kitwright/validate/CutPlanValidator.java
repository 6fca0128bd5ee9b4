package kitwright.validate;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import kitwright.cutting.Cut;
import kitwright.cutting.CutPattern;
import kitwright.cutting.CutPlan;
import kitwright.cutting.Demand;
import kitwright.cutting.SectionCutPlan;
import kitwright.cutting.SectionProblem;
import kitwright.cutting.Spare;
import kitwright.cutting.StockOption;
import kitwright.model.Bar;
import kitwright.model.Kit;
import kitwright.model.Origin;
import kitwright.model.Status;

/**
 * Re-checks a cutting plan from first principles, independent of the optimiser's code: every pattern fits the saw
 * model, offcuts and their kind are right, every mark is cut as often as demanded (plus the spares reported), rack
 * and limited stock are not overdrawn, the value is the sum of prices (or lengths), the bound is below the value and
 * the status agrees with the numbers. Throws AssertionError naming the first thing wrong.
 *
 * <p>Saw model (the issue's): a pattern fits when sum(length + kerf) &lt;= L - 2*trim + kerf; offcut =
 * L - 2*trim - sum(lengths) - n*kerf floored at 0; remnant when positive and at least the minimum remnant length.
 */
public final class CutPlanValidator {
    private static final double MM = 1e-6;
    private static final double OFFCUT_ROUNDING = 2e-3;

    private CutPlanValidator() {
    }

    /** Every section of a kit's plan, against the kit's bars and catalog (settings as given in the kit). */
    public static void validate(Kit kit, CutPlan plan) {
        List<String> sections = kit.usedSections();
        check(plan.sections().size() == sections.size(), "one plan per used section: " + sections);
        for (int s = 0; s < sections.size(); s++) {
            String name = sections.get(s);
            SectionCutPlan section = plan.sections().get(s);
            check(section.section().equals(name), "sections in catalog order: expected " + name);
            List<Demand> demands = kit.bars().stream().filter(b -> b.section().equals(name))
                    .map(b -> new Demand(b.mark(), b.lengthMm(), b.quantity())).toList();
            List<StockOption> stock = kit.catalog().stockFor(name).stream().map(StockOption::of).toList();
            validate(demands, stock, kit.settings().kerfMm(), kit.settings().trimMm(),
                    kit.settings().minRemnantMm(), section);
        }
        Set<String> marks = new HashSet<>();
        for (Bar b : kit.bars()) {
            marks.add(b.mark());
        }
        check(marks.size() == kit.bars().size(), "marks unique in the kit");
    }

    public static void validate(SectionProblem problem, SectionCutPlan plan) {
        validate(problem.demands(), problem.stock(), problem.kerfMm(), problem.trimMm(), problem.minRemnantMm(), plan);
    }

    public static void validate(List<Demand> demands, List<StockOption> stock, double kerf, double trim,
                                double minRemnant, SectionCutPlan plan) {
        String where = "section " + plan.section() + ": ";
        check(plan.kerfMm() == kerf && plan.trimMm() == trim && plan.minRemnantMm() == minRemnant,
                where + "saw settings copied into the plan");
        boolean millPriced = stock.stream().filter(s -> s.origin() == Origin.MILL).allMatch(s -> s.price() != null);
        boolean somePrice = stock.stream().anyMatch(s -> s.price() != null && s.price() > 0);
        String objective = millPriced && somePrice ? "cost" : "length";
        check(objective.equals(plan.objective()), where + "objective " + objective + ", got " + plan.objective());
        check(plan.status() != null, where + "status present");
        if (plan.status() == Status.INFEASIBLE) {
            check(plan.reason() != null && !plan.reason().isBlank(), where + "INFEASIBLE needs a reason");
            check(plan.patterns().isEmpty(), where + "INFEASIBLE has no patterns");
            check(plan.value() == null && plan.lowerBound() == null && plan.gap() == null,
                    where + "INFEASIBLE has no value, bound or gap");
            check(plan.stockPieces() == 0, where + "INFEASIBLE uses no stock");
            return;
        }
        check(plan.reason() == null || (plan.status() == Status.FEASIBLE
                && plan.reason().equals(SectionCutPlan.STOPPED_BY_TIME_LIMIT)), where
                + "reason only when INFEASIBLE, or '" + SectionCutPlan.STOPPED_BY_TIME_LIMIT + "' when FEASIBLE");
        Map<String, Demand> byMark = new HashMap<>();
        for (Demand d : demands) {
            byMark.put(d.mark(), d);
        }
        Map<String, Integer> cut = new HashMap<>();
        Map<String, Integer> used = new HashMap<>();
        double value = 0;
        int pieces = 0;
        for (CutPattern p : plan.patterns()) {
            String at = where + p + ": ";
            check(p.count() >= 1, at + "count at least 1");
            check(!p.cuts().isEmpty(), at + "a pattern cuts something");
            StockOption row = stock.stream()
                    .filter(s -> s.lengthMm() == p.stockLengthMm() && s.origin() == p.origin())
                    .findFirst().orElseThrow(() -> new AssertionError(at + "no such stock row"));
            double lengths = 0;
            for (Cut c : p.cuts()) {
                Demand d = byMark.get(c.mark());
                check(d != null, at + "unknown mark " + c.mark());
                check(Math.abs(d.lengthMm() - c.lengthMm()) <= MM, at + "cut length of " + c.mark());
                lengths += c.lengthMm();
                cut.merge(c.mark(), p.count(), Integer::sum);
            }
            int n = p.cuts().size();
            double taken = lengths + n * kerf;
            check(taken <= p.stockLengthMm() - 2 * trim + kerf + MM, at + "does not fit: takes " + taken);
            double offcut = Math.max(0, p.stockLengthMm() - 2 * trim - lengths - n * kerf);
            check(Math.abs(offcut - p.offcutMm()) <= OFFCUT_ROUNDING, at + "offcut should be " + offcut);
            String kind = p.offcutMm() > 0 && p.offcutMm() >= minRemnant ? "remnant" : "scrap";
            check(kind.equals(p.offcutKind()), at + "offcut kind should be " + kind);
            used.merge(p.stockLengthMm() + "/" + p.origin(), p.count(), Integer::sum);
            double unit = objective.equals("cost") ? (row.price() == null ? 0 : row.price()) : p.stockLengthMm();
            value += unit * p.count();
            pieces += p.count();
        }
        Map<String, Integer> spares = new HashMap<>();
        for (Spare s : plan.spares()) {
            check(byMark.containsKey(s.mark()), where + "spare of unknown mark " + s.mark());
            check(s.count() > 0, where + "spare count positive");
            check(spares.put(s.mark(), s.count()) == null, where + "spares listed once per mark");
        }
        for (Demand d : demands) {
            int expected = d.quantity() + spares.getOrDefault(d.mark(), 0);
            check(cut.getOrDefault(d.mark(), 0) == expected,
                    where + "mark " + d.mark() + " cut " + cut.getOrDefault(d.mark(), 0) + " times, expected "
                            + expected);
        }
        for (Map.Entry<String, Integer> e : used.entrySet()) {
            long limit = 0;
            boolean unlimited = false;
            for (StockOption s : stock) {
                if ((s.lengthMm() + "/" + s.origin()).equals(e.getKey())) {
                    if (s.available() == null) {
                        unlimited = true;
                    } else {
                        limit += s.available();
                    }
                }
            }
            check(unlimited || e.getValue() <= limit, where + "stock " + e.getKey() + " used " + e.getValue()
                    + " times, only " + limit + " available");
        }
        check(plan.stockPieces() == pieces, where + "stockPieces " + plan.stockPieces() + " vs " + pieces);
        check(plan.value() != null && Math.abs(plan.value() - value) <= 1e-9 * Math.max(1, value),
                where + "value " + plan.value() + " should be " + value);
        check(plan.lowerBound() != null && plan.lowerBound() >= 0, where + "lower bound present");
        check(plan.lowerBound() <= plan.value() + 1e-9 * Math.max(1, value), where + "bound above value");
        double gap = plan.value() > 0 ? (plan.value() - plan.lowerBound()) / plan.value() : 0;
        check(plan.gap() != null && Math.abs(plan.gap() - gap) <= 1e-9, where + "gap should be " + gap);
        if (plan.status() == Status.OPTIMAL) {
            check(plan.gap() <= 1e-9, where + "OPTIMAL with a gap");
        } else {
            check(plan.gap() > 0, where + "FEASIBLE with no gap should be OPTIMAL");
        }
    }

    private static void check(boolean condition, String message) {
        if (!condition) {
            throw new AssertionError(message);
        }
    }
}
